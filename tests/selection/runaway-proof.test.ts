import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { LossModel } from '../../src/selection/loss-model.js';
import { provesRunaway } from '../../src/selection/runaway-proof.js';
import { kinkedLoss } from '../helpers/kinked-loss.js';

// The cell walk as first written (sorted array of every cut), kept as the reference for the
// allocation-free walk the ranking uses.
function reference(model: LossModel, ambientK: number, rth: number, tjMaxK: number): boolean {
  if (!(tjMaxK > ambientK)) return true;
  if (ambientK + rth * model.totalAt(tjMaxK) <= tjMaxK) return false;
  const step = (tjMaxK - ambientK) / 48;
  const cuts = [ambientK, tjMaxK, ...model.breakpoints.filter((t) => t > ambientK && t < tjMaxK)];
  for (let i = 1; i < 48; i++) cuts.push(ambientK + i * step);
  cuts.sort((a, b) => a - b);
  for (let i = 1; i < cuts.length; i++) {
    const t1 = cuts[i - 1]!;
    const t2 = cuts[i]!;
    if (t2 - t1 < 1e-9) continue;
    if (ambientK + rth * model.lowerBound(t1, t2) <= t2) return false;
  }
  return true;
}

/** A loss that grows exponentially with temperature (leakage-like), with steps at the breakpoints. */
function model(breakpoints: number[], p0: number, c: number, stepW: number): LossModel {
  const sorted = [...new Set(breakpoints)].sort((a, b) => a - b);
  const at = (t: number) => p0 * Math.exp(c * (t - 300)) + stepW * sorted.filter((b) => b < t).length;
  return {
    totalAt: at,
    lowerBound: (t1) => at(t1),
    breakpoints: sorted,
    describe: () => [],
    at: (t) => ({ conductionW: 0, reverseW: at(t), switchingW: 0, totalW: at(t) }),
  };
}

describe('provesRunaway', () => {
  it('agrees with the plain cell walk on generated loss curves', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 250, max: 480, noNaN: true }), { maxLength: 8 }),
        fc.double({ min: 1e-4, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 0.08, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 233, max: 400, noNaN: true }),
        fc.double({ min: 5, max: 300, noNaN: true }),
        fc.double({ min: 300, max: 470, noNaN: true }),
        (bps, p0, c, stepW, ambientK, rth, tjMaxK) => {
          const m = model(bps, p0, c, stepW);
          expect(provesRunaway(m, ambientK, rth, tjMaxK)).toBe(reference(m, ambientK, rth, tjMaxK));
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('proves a runaway where leakage heating outgrows the board, and not where it balances', () => {
    // Ta 70 °C, RθJA 60 K/W: 0.05 W at 300 K doubling every 10 K has no balance below 150 °C;
    // 0.05 W flat settles 3 K above ambient (hand computed).
    const hot = model([], 0.05, Math.LN2 / 10, 0);
    const steady = model([], 0.05, 0, 0);
    expect(provesRunaway(hot, 343.15, 60, 423.15)).toBe(true);
    expect(provesRunaway(steady, 343.15, 60, 423.15)).toBe(false);
  });

  it('agrees with the plain cell walk on compiled loss functions, whose stretches it tries first', () => {
    let proved = 0;
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 250, max: 480, noNaN: true }), { maxLength: 6 }),
        fc.array(fc.double({ min: 250, max: 480, noNaN: true }), { maxLength: 6 }),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: -0.003, max: 0.001, noNaN: true }),
        fc.double({ min: 0.02, max: 0.12, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 253, max: 400, noNaN: true }),
        fc.double({ min: 5, max: 300, noNaN: true }),
        fc.double({ min: 300, max: 470, noNaN: true }),
        (vfBreaks, irBreaks, avgA, ripple, tempcoVPerK, lnSlope, switchingW, ambientK, rth, tjMaxK) => {
          // Kinks at the breakpoints, as the datasheet estimates have; the compiled loss fits each stretch.
          const f = kinkedLoss({ vf0V: 0.3, vfKinkV: 0.01, ir0A: 1e-5, lnIrKink: 0.2 }, vfBreaks, irBreaks, avgA, ripple, tempcoVPerK, lnSlope, switchingW);
          const m: LossModel = { ...f, describe: () => [], at: (t) => ({ conductionW: 0, reverseW: 0, switchingW: 0, totalW: f.totalAt(t) }) };
          const expected = reference(m, ambientK, rth, tjMaxK);
          if (expected && tjMaxK > ambientK) proved++;
          expect(provesRunaway(m, ambientK, rth, tjMaxK)).toBe(expected);
        },
      ),
      { numRuns: 3000 },
    );
    // Enough runaways among the cases for the comparison to mean something.
    expect(proved).toBeGreaterThan(300);
  });
});
