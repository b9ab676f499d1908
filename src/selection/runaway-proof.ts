import type { LossModel } from './loss-model.js';

/** Cells the range from ambient to Tj max is cut into, on top of the model's own breakpoints. */
const CELLS = 48;

/**
 * True when the heat balance Tj = Ta + RθJA·P(Tj) provably has no solution up to Tj max: on every
 * cell [t1, t2] the lowest possible Ta + RθJA·P stays above t2. Then the physics solver could only
 * report a runaway too, so a ranking skips it; shown parts are still solved for the solver's words.
 * False means "not proven", never "stable".
 */
export function provesRunaway(model: LossModel, ambientK: number, rthJaKPerW: number, tjMaxK: number): boolean {
  if (!(tjMaxK > ambientK)) return true;
  // Most parts hold at Tj max itself (Ta + RθJA·P(Tj max) ≤ Tj max), so a balance lies at or below
  // it: nothing to prove, and one evaluation instead of a cell walk. "Not proven" is always safe.
  if (ambientK + rthJaKPerW * model.totalAt(tjMaxK) <= tjMaxK) return false;
  const step = (tjMaxK - ambientK) / CELLS;
  // Cells of the uniform grid, each split at the model's breakpoints (sorted) inside it; walked
  // without building arrays, since ranking proves this for every part it reads.
  const breakpoints = model.breakpoints;
  let next = 0;
  while (next < breakpoints.length && breakpoints[next]! <= ambientK) next++;
  let t1 = ambientK;
  const holds = (t2: number) => ambientK + rthJaKPerW * model.lowerBound(t1, t2) <= t2;
  for (let i = 1; i <= CELLS; i++) {
    const end = i === CELLS ? tjMaxK : ambientK + i * step;
    while (next < breakpoints.length && breakpoints[next]! < end) {
      const t2 = breakpoints[next++]!;
      if (t2 - t1 < 1e-9) continue;
      if (holds(t2)) return false;
      t1 = t2;
    }
    if (end - t1 < 1e-9) continue;
    if (holds(end)) return false;
    t1 = end;
  }
  return true;
}
