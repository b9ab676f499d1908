import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitShockley, shockleyCurrent, shockleyVoltage, voltsPerDecade } from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

describe('shockley', () => {
  it('rises 59.5 mV per decade at 300 K for n = 1 (Sedra & Smith, diode forward characteristic), ±0.5 %', () => {
    expectRelClose(voltsPerDecade(1, 300), 0.0595, 0.005);
  });

  it.each([
    { n: 1, tK: 300, expected: 0.025852 * Math.LN10 },
    { n: 2, tK: 300, expected: 2 * 0.025852 * Math.LN10 },
    { n: 1, tK: 600, expected: 2 * 0.025852 * Math.LN10 },
  ])('n·VT·ln10 for n = $n at $tK K', ({ n, tK, expected }) => {
    expectRelClose(voltsPerDecade(n, tK), expected, 1e-6);
  });

  it('gives zero current at zero volts and −IS in deep reverse', () => {
    expect(shockleyCurrent(0, 1e-14, 1, 300)).toBe(0);
    expectRelClose(shockleyCurrent(-1, 1e-14, 1, 300), -1e-14, 1e-12);
  });

  it('gives ten times the current for one decade of voltage, once I ≫ IS', () => {
    const tK = 300;
    const v1 = 0.6;
    const ratio = shockleyCurrent(v1 + voltsPerDecade(1.5, tK), 1e-12, 1.5, tK) / shockleyCurrent(v1, 1e-12, 1.5, tK);
    // exactly (10·e^x − 1)/(e^x − 1) with x = V/(n·VT); the −1 shifts it by ≈ 9/e^x ≈ 2e-6 here
    const x = v1 / (1.5 * 0.025852);
    expectRelClose(ratio, (10 * Math.exp(x) - 1) / Math.expm1(x), 1e-5);
    expectRelClose(ratio, 10, 1e-5);
  });

  it('inverts exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-9, max: 10, noNaN: true }),
        fc.double({ min: 1e-15, max: 1e-6, noNaN: true }),
        fc.double({ min: 1, max: 2.5, noNaN: true }),
        fc.double({ min: 200, max: 450, noNaN: true }),
        (iA, saturationCurrentA, n, tK) => {
          const v = shockleyVoltage(iA, saturationCurrentA, n, tK);
          expectRelClose(shockleyCurrent(v, saturationCurrentA, n, tK), iA, 1e-9);
        },
      ),
    );
  });

  it('throws for a current at or below −IS', () => {
    expect(() => shockleyVoltage(-1e-14, 1e-14, 1, 300)).toThrow(RangeError);
  });

  it('fits IS and n back from two points generated with known values', () => {
    const tK = 298.15;
    const truth = { saturationCurrentA: 2.5e-9, n: 1.9 };
    const point = (ifA: number) => ({ ifA, vfV: shockleyVoltage(ifA, truth.saturationCurrentA, truth.n, tK) });
    const fit = fitShockley(point(1e-3), point(0.1), tK);
    expect(fit.ok).toBe(true);
    if (!fit.ok) return;
    expectRelClose(fit.ideality, truth.n, 1e-6);
    expectRelClose(fit.saturationCurrentA, truth.saturationCurrentA, 1e-5);
    expect(fit.method).toContain('= 1.9, IS = 2.5 nA');
  });

  it.each([
    { a: { vfV: 0.7, ifA: 0.01 }, b: { vfV: 0.8, ifA: 0.01 }, code: 'same-current' },
    { a: { vfV: 0.7, ifA: 0.01 }, b: { vfV: 0.65, ifA: 0.1 }, code: 'non-increasing-voltage' },
  ])('reports $code as a value', ({ a, b, code }) => {
    const fit = fitShockley(a, b, 300);
    expect(fit).toMatchObject({ ok: false, code });
  });
});
