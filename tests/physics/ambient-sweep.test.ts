import { describe, expect, it } from 'vitest';
import { maxAmbientForStability, sweepAmbient } from '../../src/physics/index.js';

const TJ_MAX_150 = 423.15;
const TJ_MAX_175 = 448.15;

describe('sweepAmbient', () => {
  it('tracks Ta + RθJA·P with constant power and flags ambients past Tj max', () => {
    const points = sweepAmbient(() => 0.5, 100, TJ_MAX_150, 273.15, 423.15, 6);
    expect(points).toHaveLength(7);
    expect(points.map((p) => p.isRunaway)).toEqual([false, false, false, false, false, true, true]);
    for (const p of points.filter((q) => !q.isRunaway)) {
      expect(p.tjK).toBeCloseTo(p.ambientK + 50, 9);
      expect(p.powerW).toBe(0.5);
    }
    expect(points[5]).toEqual({ ambientK: 398.15, tjK: null, powerW: null, isRunaway: true });
    expect(points[6]?.ambientK).toBe(423.15);
  });

  it('gives a Tj that rises faster than ambient with leakage feedback', () => {
    const lossAt = (tK: number) => 100 * 1e-6 * Math.exp(0.055 * (tK - 298.15));
    const points = sweepAmbient(lossAt, 100, TJ_MAX_175, 298.15, 398.15, 4);
    const rises = points.map((p) => (p.tjK ?? Number.NaN) - p.ambientK);
    expect(points.every((p) => !p.isRunaway)).toBe(true);
    for (let i = 1; i < rises.length; i++) expect(rises[i]).toBeGreaterThan(rises[i - 1]!);
  });

  it('throws on a non-integer step count (programmer error)', () => {
    expect(() => sweepAmbient(() => 1, 10, 400, 300, 350, 2.5)).toThrow(RangeError);
  });
});

describe('maxAmbientForStability', () => {
  it('is Tj max − RθJA·P with constant power', () => {
    const result = maxAmbientForStability(() => 0.5, 100, TJ_MAX_150, 233.15, TJ_MAX_150, 0.01);
    expect(result).toMatchObject({ kind: 'limit', limitedBy: 'exceeds-tj-max' });
    if (result.kind !== 'limit') return;
    expect(result.ambientK).toBeLessThanOrEqual(373.15 + 1e-9);
    expect(result.ambientK).toBeGreaterThan(373.15 - 0.01);
  });

  it('matches the tangency condition of §7 for exponential leakage', () => {
    // P = VR·I0·e^(c(T − T0)). Runaway starts where the balance line touches: RθJA·dP/dT = 1 at T*,
    // and Ta = T* − RθJA·P(T*) = T* − 1/c (derived from diode-formulas §7 [published physics]).
    const vrV = 100;
    const i0A = 1e-6;
    const t0K = 298.15;
    const c = 0.055;
    const rth = 100;
    const tStarK = t0K + Math.log(1 / (rth * vrV * i0A * c)) / c;
    const criticalAmbientK = tStarK - 1 / c; // ≈ 416.4 K (143 °C)
    const lossAt = (tK: number) => vrV * i0A * Math.exp(c * (tK - t0K));
    const result = maxAmbientForStability(lossAt, rth, TJ_MAX_175, 298.15, TJ_MAX_175, 0.01);
    expect(result).toMatchObject({ kind: 'limit', limitedBy: 'loop-gain-above-one' });
    if (result.kind !== 'limit') return;
    expect(Math.abs(result.ambientK - criticalAmbientK)).toBeLessThan(0.05);
    expect(result.tjK).toBeLessThan(tStarK);
  });

  it('reports a range that is stable throughout or runaway throughout', () => {
    expect(maxAmbientForStability(() => 0.1, 10, TJ_MAX_150, 300, 350)).toMatchObject({ kind: 'stable-throughout', ambientK: 350, tjK: 351 });
    expect(maxAmbientForStability(() => 10, 100, TJ_MAX_150, 300, 350)).toEqual({ kind: 'runaway-throughout' });
  });
});
