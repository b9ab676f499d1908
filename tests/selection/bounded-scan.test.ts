import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveJunctionTemperature } from '../../src/physics/index.js';
import { kinkedLoss } from '../helpers/kinked-loss.js';

const SHAPE = { vf0V: 0.6, vfKinkV: 0.02, ir0A: 1e-6, lnIrKink: 0.3 };
const loss = (vfBreaks: number[], irBreaks: number[], avgA: number, ripple: number, tempcoVPerK: number, lnSlope: number, switchingW: number) =>
  kinkedLoss(SHAPE, vfBreaks, irBreaks, avgA, ripple, tempcoVPerK, lnSlope, switchingW);

describe('the bracketing scan with a loss bound', () => {
  it('gives exactly the plain scan answer, iteration count included', () => {
    let bracketed = 0;
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 250, max: 480, noNaN: true }), { maxLength: 5 }),
        fc.array(fc.double({ min: 250, max: 480, noNaN: true }), { maxLength: 5 }),
        fc.double({ min: 0.05, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: -0.004, max: 0.001, noNaN: true }),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 253, max: 400, noNaN: true }),
        fc.double({ min: 5, max: 300, noNaN: true }),
        fc.double({ min: 300, max: 470, noNaN: true }),
        (vfBreaks, irBreaks, avgA, ripple, tempco, lnSlope, switchingW, ambientK, rthJaKPerW, tjMaxK) => {
          fc.pre(tjMaxK > ambientK);
          const f = loss(vfBreaks, irBreaks, avgA, ripple, tempco, lnSlope, switchingW);
          const plain = solveJunctionTemperature({ lossAt: f.totalAt, ambientK, rthJaKPerW, tjMaxK });
          const bounded = solveJunctionTemperature({ lossAt: f.totalAt, lossBound: f, ambientK, rthJaKPerW, tjMaxK });
          expect(bounded).toEqual(plain);
          if ((plain.kind === 'stable' && plain.solver === 'bracketing') || plain.kind === 'runaway') bracketed++;
        },
      ),
      { numRuns: 3000 },
    );
    // Enough of the cases reach the scan for the comparison to mean something.
    expect(bracketed).toBeGreaterThan(300);
  });

  it('finds a balance where the loss falls with temperature past Tj max from ambient, with far fewer losses', () => {
    // Hand-made case like a buck freewheel diode at 70 °C ambient: hot enough at ambient to pass
    // Tj max, cooler there; the crossing lies high, so the plain scan computes over a thousand losses.
    const f = loss([348.15, 398.15], [], 1.2, 0.3, -0.0035, 0, 0);
    let plainCalls = 0;
    let boundedCalls = 0;
    const input = { ambientK: 343.15, rthJaKPerW: 150, tjMaxK: 423.15 };
    const plain = solveJunctionTemperature({ ...input, lossAt: (t) => (plainCalls++, f.totalAt(t)) });
    const bounded = solveJunctionTemperature({ ...input, lossAt: (t) => (boundedCalls++, f.totalAt(t)), lossBound: f });
    expect(plain).toMatchObject({ kind: 'stable', solver: 'bracketing' });
    expect(bounded).toEqual(plain);
    expect(boundedCalls).toBeLessThan(plainCalls / 5);
  });
});
