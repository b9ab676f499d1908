import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  estimateForwardVoltage,
  estimateLeakage,
  forwardVoltageValue,
  leakageValue,
  type ForwardVoltagePoint,
  type JunctionFamily,
  type LeakagePoint,
} from '../../src/physics/index.js';

// The ranking's loss model uses the value-only paths; the explanations use the full estimators.
// Both must give the same number for every input, or a shown explanation could contradict a rank.

const temperature = fc.constantFrom(233.15, 248.15, 298.15, 323.15, 373.15, 398.15, 423.15);
const vfPoint = fc.record({ vfV: fc.double({ min: 0.15, max: 3, noNaN: true }), ifA: fc.double({ min: 1e-4, max: 50, noNaN: true }), tjK: temperature });
const irPoint = fc.record({ irA: fc.double({ min: 1e-10, max: 1e-2, noNaN: true }), vrV: fc.double({ min: 1, max: 1200, noNaN: true }), tjK: temperature });

describe('value-only estimators', () => {
  it('forwardVoltageValue equals estimateForwardVoltage().value, NaN where it gives none', () => {
    fc.assert(
      fc.property(fc.array(vfPoint, { maxLength: 6 }), fc.double({ min: 1e-3, max: 60, noNaN: true }), fc.double({ min: 220, max: 480, noNaN: true }), (points, ifA, tjK) => {
        const full = estimateForwardVoltage(points as ForwardVoltagePoint[], ifA, tjK);
        const value = forwardVoltageValue(points as ForwardVoltagePoint[], ifA, tjK);
        if (full.ok) expect(value).toBe(full.value);
        else expect(value).toBeNaN();
      }),
      { numRuns: 500 },
    );
  });

  it('leakageValue equals estimateLeakage().value, NaN without points', () => {
    fc.assert(
      fc.property(
        fc.array(irPoint, { maxLength: 6 }),
        fc.double({ min: 0, max: 1500, noNaN: true }),
        fc.double({ min: 220, max: 480, noNaN: true }),
        fc.constantFrom<JunctionFamily>('pn', 'schottky', 'sic'),
        (points, vrV, tjK, family) => {
          const full = estimateLeakage(points as LeakagePoint[], vrV, tjK, family);
          const value = leakageValue(points as LeakagePoint[], vrV, tjK, family);
          if (full.ok) expect(value).toBe(full.value);
          else expect(value).toBeNaN();
        },
      ),
      { numRuns: 500 },
    );
  });

  it('repeated calls on one points array give the first answer again (the per-array caches)', () => {
    const points: ForwardVoltagePoint[] = [
      { vfV: 0.55, ifA: 1, tjK: 298.15 },
      { vfV: 0.45, ifA: 1, tjK: 398.15 },
      { vfV: 0.7, ifA: 3, tjK: 298.15 },
    ];
    const first = [350, 300, 420].map((t) => estimateForwardVoltage(points, 2, t));
    const again = [350, 300, 420].map((t) => estimateForwardVoltage(points, 2, t));
    expect(again.map((e) => (e.ok ? [e.value, e.method] : null))).toEqual(first.map((e) => (e.ok ? [e.value, e.method] : null)));
    // Tempco from the two 1 A points: (0.45 − 0.55) V / 100 K = −1 mV/K (hand computed).
    const at = estimateForwardVoltage(points, 1, 348.15);
    expect(at.ok && at.value).toBeCloseTo(0.5, 12);
  });
});
