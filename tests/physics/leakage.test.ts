import { describe, expect, it } from 'vitest';
import {
  LEAKAGE_RULES,
  estimateLeakage,
  fitLeakageCoefficient,
  leakageAtTemperature,
  type JunctionFamily,
  type LeakagePoint,
} from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

const T25 = 298.15;
const T75 = 348.15;
const T125 = 398.15;

/** Glass-passivated rectifier: ×10 over 100 K (diode-formulas §7), both points at rated 100 V. */
const twoTemperatures: readonly LeakagePoint[] = [
  { irA: 5e-6, vrV: 100, tjK: T25 },
  { irA: 50e-6, vrV: 100, tjK: T125 },
];

describe('leakage rules of thumb', () => {
  it('silicon PN doubling every 10 K gives ×2^10 = 1024 over 100 K [common practice]', () => {
    const estimate = estimateLeakage([{ irA: 1e-6, vrV: 100, tjK: T25 }], 100, T125, 'pn');
    expect(estimate).toMatchObject({ ok: true, isExtrapolated: true });
    if (!estimate.ok) return;
    expectRelClose(estimate.value, 1.024e-3, 1e-12);
    expect(estimate.method).toContain('doubles every 10 K [common practice]');
  });

  it.each<{ family: JunctionFamily; c: number; doublingK: number }>([
    { family: 'pn', c: Math.LN2 / 10, doublingK: 10 },
    // c ≈ 0.055 /K, doubling every ≈ 12.6 K (diode-formulas §7 [common practice])
    { family: 'schottky', c: 0.055, doublingK: 12.6 },
    { family: 'sic', c: Math.LN2 / 25, doublingK: 25 },
  ])('$family: c = $c /K, doubling every $doublingK K', ({ family, c, doublingK }) => {
    expect(LEAKAGE_RULES[family].c).toBeCloseTo(c, 12);
    expectRelClose(Math.LN2 / LEAKAGE_RULES[family].c, doublingK, 0.01);
    const estimate = estimateLeakage([{ irA: 1e-6, vrV: 40, tjK: T25 }], 40, T75, family);
    expect(estimate.ok && estimate.c).toBe(LEAKAGE_RULES[family].c);
    expect(estimate.ok && estimate.value).toBeCloseTo(1e-6 * Math.exp(c * 50), 15);
  });
});

describe('two-point exponential fit', () => {
  it('reproduces both points exactly', () => {
    for (const p of twoTemperatures) {
      const estimate = estimateLeakage(twoTemperatures, 100, p.tjK, 'pn');
      expect(estimate.ok).toBe(true);
      if (!estimate.ok) return;
      expectRelClose(estimate.value, p.irA, 1e-12);
      expect(estimate.isExtrapolated).toBe(false);
    }
  });

  it('interpolates exponentially: the geometric mean halfway, 5 µA·√10 at 75 °C', () => {
    const estimate = estimateLeakage(twoTemperatures, 100, T75, 'pn');
    expect(estimate.ok).toBe(true);
    if (!estimate.ok) return;
    expectRelClose(estimate.value, 5e-6 * Math.sqrt(10), 1e-12);
    expectRelClose(estimate.c, Math.LN10 / 100, 1e-12);
    expect(estimate.method).toContain('two-point exponential fit');
  });

  it('extrapolates with the fitted c, not the rule', () => {
    const estimate = estimateLeakage(twoTemperatures, 100, T125 + 25, 'pn');
    expect(estimate).toMatchObject({ ok: true, isExtrapolated: true });
    expect(estimate.ok && estimate.value).toBeCloseTo(5e-6 * 10 ** 1.25, 15);
  });

  it('uses the bracketing pair when three temperatures exist', () => {
    const points = [...twoTemperatures, { irA: 500e-6, vrV: 100, tjK: T125 + 50 }];
    const estimate = estimateLeakage(points, 100, T125 + 25, 'pn');
    expect(estimate.ok && estimate.value).toBeCloseTo(50e-6 * Math.sqrt(10), 15);
  });

  it('falls back to the rule when the points fall with temperature, and says so', () => {
    const points = [
      { irA: 5e-6, vrV: 100, tjK: T25 },
      { irA: 1e-6, vrV: 100, tjK: T125 },
    ];
    const estimate = estimateLeakage(points, 100, T125, 'pn');
    expect(estimate).toMatchObject({ ok: true, value: 1e-6, c: Math.LN2 / 10 });
    expect(estimate.ok && estimate.method).toContain('do not rise with temperature');
  });

  it('fitLeakageCoefficient and leakageAtTemperature agree with the closed form', () => {
    const [a, b] = twoTemperatures as [LeakagePoint, LeakagePoint];
    const c = fitLeakageCoefficient(a, b);
    expectRelClose(c, Math.log(10) / 100, 1e-12);
    expectRelClose(leakageAtTemperature(a.irA, a.tjK, c, b.tjK), b.irA, 1e-12);
  });
});

describe('voltage dependence', () => {
  it('uses a point at higher VR unscaled, as an upper bound', () => {
    const estimate = estimateLeakage(twoTemperatures, 50, T25, 'pn');
    expect(estimate).toMatchObject({ ok: true, value: 5e-6, isExtrapolated: false });
    expect(estimate.ok && estimate.method).toContain('upper bound for 50 V');
  });

  it('scales a point at lower VR up linearly and flags the extrapolation', () => {
    const estimate = estimateLeakage(twoTemperatures, 200, T25, 'pn');
    expect(estimate).toMatchObject({ ok: true, isExtrapolated: true });
    expect(estimate.ok && estimate.value).toBeCloseTo(10e-6, 15);
  });

  it('picks the lowest VR not below the requested one', () => {
    const points = [
      { irA: 1e-6, vrV: 20, tjK: T25 },
      { irA: 3e-6, vrV: 60, tjK: T25 },
      { irA: 9e-6, vrV: 100, tjK: T25 },
    ];
    const estimate = estimateLeakage(points, 50, T25, 'schottky');
    expect(estimate).toMatchObject({ ok: true, value: 3e-6 });
  });
});

describe('failures', () => {
  it('reports no points as a value', () => {
    expect(estimateLeakage([], 10, T25, 'pn')).toMatchObject({ ok: false, code: 'no-points' });
  });

  it('throws on a non-positive leakage point (programmer error)', () => {
    expect(() => estimateLeakage([{ irA: 0, vrV: 10, tjK: T25 }], 10, T25, 'pn')).toThrow(RangeError);
  });
});
