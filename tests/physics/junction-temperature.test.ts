import { describe, expect, it } from 'vitest';
import { runawayLeakageThreshold, solveJunctionTemperature } from '../../src/physics/index.js';
import { bisect, expectRelClose } from './expect-close.js';

const T25 = 298.15;
const TJ_MAX_150 = 423.15;

/** Reverse loss VR·IR(T)·(1 − δ) with IR = I0·exp(c·(T − T0)). */
function reverseLoss(vrV: number, i0A: number, t0K: number, c: number, duty: number) {
  return (tK: number) => vrV * i0A * Math.exp(c * (tK - t0K)) * (1 - duty);
}

describe('solveJunctionTemperature', () => {
  it('with constant power equals Ta + RθJA·P exactly', () => {
    const result = solveJunctionTemperature({ lossAt: () => 0.5, ambientK: 313.15, rthJaKPerW: 60, tjMaxK: TJ_MAX_150 });
    expect(result).toMatchObject({ kind: 'stable', tjK: 313.15 + 60 * 0.5, powerW: 0.5, stabilityMargin: 1 });
  });

  it('with zero thermal resistance sits at ambient', () => {
    const result = solveJunctionTemperature({ lossAt: () => 3, ambientK: 300, rthJaKPerW: 0, tjMaxK: TJ_MAX_150 });
    expect(result).toMatchObject({ kind: 'stable', tjK: 300 });
  });

  it('matches an independent bisection for exponential reverse leakage, with the §7 stability margin', () => {
    const vrV = 30;
    const duty = 0.5;
    const c = 0.055;
    const rthJaKPerW = 50;
    const ambientK = 348.15;
    const lossAt = reverseLoss(vrV, 100e-6, T25, c, duty);
    const expectedK = bisect((tK) => ambientK + rthJaKPerW * lossAt(tK) - tK, ambientK, ambientK + 50);

    const result = solveJunctionTemperature({ lossAt, ambientK, rthJaKPerW, tjMaxK: TJ_MAX_150 });
    expect(result.kind).toBe('stable');
    if (result.kind !== 'stable') return;
    expect(result.tjK).toBeCloseTo(expectedK, 7);
    expectRelClose(result.powerW, lossAt(expectedK), 1e-9);
    // §7 [published physics]: margin = 1 − RθJA·dP/dTj = 1 − IR(Tj)/IR,threshold
    const irA = 100e-6 * Math.exp(c * (expectedK - T25));
    const threshold = runawayLeakageThreshold(vrV, duty, c, rthJaKPerW);
    expect(result.stabilityMargin).toBeCloseTo(1 - irA / threshold, 6);
    expect(result.stabilityMargin).toBeCloseTo(1 - rthJaKPerW * vrV * (1 - duty) * c * irA, 6);
  });

  it('damps an oscillating iteration (loss falling steeply with Tj) and matches bisection', () => {
    // P = e^(−0.05·(T − Ta)) W, RθJA = 100 K/W: plain iteration has slope −1.3 at the solution and diverges
    const ambientK = 300;
    const lossAt = (tK: number) => Math.exp(-0.05 * (tK - ambientK));
    const expectedK = bisect((tK) => ambientK + 100 * lossAt(tK) - tK, ambientK, ambientK + 100);
    const result = solveJunctionTemperature({ lossAt, ambientK, rthJaKPerW: 100, tjMaxK: TJ_MAX_150 });
    expect(result.kind).toBe('stable');
    if (result.kind !== 'stable') return;
    expect(result.tjK).toBeCloseTo(expectedK, 7);
    // rise x solves x = 100·e^(−0.05x): x = W(5)/0.05 ≈ 26.53 K; margin 1 + 0.05·x
    expect(result.tjK - ambientK).toBeCloseTo(26.534, 2);
    expect(result.stabilityMargin).toBeCloseTo(1 + 0.05 * (expectedK - ambientK), 6);
  });

  it('reports runaway when VR·IR·c·RθJA > 1 everywhere (§7 [published physics])', () => {
    const vrV = 100;
    const c = 0.055;
    const rthJaKPerW = 100;
    const ambientK = 323.15;
    const i0A = 2e-3; // at ambient: 100 V · 2 mA · 0.055 /K · 100 K/W = 1.1
    expect(i0A).toBeGreaterThan(runawayLeakageThreshold(vrV, 0, c, rthJaKPerW));
    const result = solveJunctionTemperature({
      lossAt: reverseLoss(vrV, i0A, ambientK, c, 0),
      ambientK,
      rthJaKPerW,
      tjMaxK: TJ_MAX_150,
    });
    expect(result).toMatchObject({ kind: 'runaway', reason: 'loop-gain-above-one', lastTjK: TJ_MAX_150 });
    expect(result.kind === 'runaway' && result.message).toContain('Thermal runaway');
  });

  // Derived from §7: with P ∝ e^(c·T) the heat balance exists only while the loop gain at ambient is ≤ 1/e.
  it.each([
    { gainAtAmbient: 0.3, kind: 'stable' },
    { gainAtAmbient: 0.5, kind: 'runaway' },
  ])('loop gain $gainAtAmbient at ambient (1/e ≈ 0.368 is the limit) → $kind', ({ gainAtAmbient, kind }) => {
    const c = 0.05;
    const ambientK = 300;
    const lossAt = (tK: number) => (gainAtAmbient / (c * 10)) * Math.exp(c * (tK - ambientK));
    const result = solveJunctionTemperature({ lossAt, ambientK, rthJaKPerW: 10, tjMaxK: 600 });
    expect(result.kind).toBe(kind);
    if (result.kind === 'stable') {
      const expectedK = bisect((tK) => ambientK + 10 * lossAt(tK) - tK, ambientK, ambientK + 1 / c);
      expect(result.tjK).toBeCloseTo(expectedK, 7);
    }
  });

  it('reports a plain Tj max overrun separately from runaway', () => {
    const result = solveJunctionTemperature({ lossAt: () => 1, ambientK: 358.15, rthJaKPerW: 100, tjMaxK: TJ_MAX_150 });
    expect(result).toMatchObject({ kind: 'runaway', reason: 'exceeds-tj-max' });
  });

  it('reports an ambient at Tj max', () => {
    const result = solveJunctionTemperature({ lossAt: () => 0, ambientK: TJ_MAX_150, rthJaKPerW: 10, tjMaxK: TJ_MAX_150 });
    expect(result).toMatchObject({ kind: 'runaway', reason: 'ambient-at-or-above-tj-max', lastTjK: TJ_MAX_150 });
  });

  it.each([
    { name: 'negative RθJA', input: { lossAt: () => 1, ambientK: 300, rthJaKPerW: -1, tjMaxK: 400 } },
    { name: 'a NaN loss', input: { lossAt: () => Number.NaN, ambientK: 300, rthJaKPerW: 1, tjMaxK: 400 } },
    { name: 'a negative loss', input: { lossAt: () => -1, ambientK: 300, rthJaKPerW: 1, tjMaxK: 400 } },
  ])('throws on $name (programmer error)', ({ input }) => {
    expect(() => solveJunctionTemperature(input)).toThrow(RangeError);
  });
});

describe('runawayLeakageThreshold', () => {
  it('is 1/(VR·(1 − δ)·c·RθJA) (diode-formulas §7 [published physics])', () => {
    // 1/(100 V · 0.5 · (ln 2/10 /K) · 50 K/W) = 1/173.29 A ≈ 5.771 mA, by hand
    expectRelClose(runawayLeakageThreshold(100, 0.5, Math.LN2 / 10, 50), 5.7708e-3, 1e-4);
  });

  it('is unbounded when the diode never sees reverse voltage', () => {
    expect(runawayLeakageThreshold(100, 1, 0.07, 50)).toBe(Number.POSITIVE_INFINITY);
  });

  it.each([
    { duty: 1.5, c: 0.07, rth: 50 },
    { duty: 0.5, c: 0, rth: 50 },
    { duty: 0.5, c: 0.07, rth: -50 },
  ])('throws on duty $duty, c $c, RθJA $rth (programmer error)', ({ duty, c, rth }) => {
    expect(() => runawayLeakageThreshold(100, duty, c, rth)).toThrow(RangeError);
  });
});
