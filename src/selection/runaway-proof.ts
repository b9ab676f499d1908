import type { LossModel } from './loss-model.js';

/** Cells the range from ambient to Tj max is cut into, on top of the model's own breakpoints. */
const CELLS = 48;
/** How far a cell of the walk can reach past a breakpoint: cuts closer than 1e-9 K are merged. */
const REACH_K = 2e-9;
/** Room for rounding (Math.exp need not be monotone to the last bit). */
const ROUNDING = 1e-12;

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
  if (provesByStretches(model, ambientK, rthJaKPerW, tjMaxK)) return true;
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

/**
 * The same proof with one cell per stretch between breakpoints, tried first: most parts that run
 * away are proved with a few bounds instead of about fifty, which matters while the code is cold.
 * True only when the walk would prove it too: every cell of the walk lies within one stretch (give
 * or take REACH_K), and on one line of the model a bound over a wider interval is never above the
 * bound over a narrower one, so each cell's bound is at least its stretch's.
 */
function provesByStretches(model: LossModel, ambientK: number, rthJaKPerW: number, tjMaxK: number): boolean {
  const above = (t1: number, t2: number) => ambientK + rthJaKPerW * (model.lowerBound(t1 - REACH_K, t2 + REACH_K) * (1 - ROUNDING)) > t2 + REACH_K;
  let t1 = ambientK;
  for (const t2 of model.breakpoints) {
    if (t2 <= ambientK) continue;
    if (t2 >= tjMaxK) break;
    if (!above(t1, t2)) return false;
    t1 = t2;
  }
  return above(t1, tjMaxK);
}
