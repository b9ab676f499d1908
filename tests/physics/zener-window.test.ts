import { describe, expect, it } from 'vitest';
import { alphaFromTempco, zenerDynamicShift, zenerVoltageAt, zenerWindow } from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

describe('zenerWindow', () => {
  it.each([
    {
      // 5.1 V ±5 %, α = −3e-4 /K, −40…125 °C: T − 25 °C = −65 K or +100 K
      name: '5.1 V ±5 %, α = −300 ppm/K, −40…125 °C',
      input: { vzNominalV: 5.1, tolerance: 0.05, alphaPerK: -3e-4, tMinK: 233.15, tMaxK: 398.15 },
      minV: 5.1 * 0.95 * (1 - 3e-4 * 100), // 4.69965 V, hot
      maxV: 5.1 * 1.05 * (1 + 3e-4 * 65), // 5.4594225 V, cold
      minAtK: 398.15,
      maxAtK: 233.15,
    },
    {
      // 12 V ±5 %, α = +8e-4 /K, 0…70 °C: T − 25 °C = −25 K or +45 K
      name: '12 V ±5 %, α = +800 ppm/K, 0…70 °C',
      input: { vzNominalV: 12, tolerance: 0.05, alphaPerK: 8e-4, tMinK: 273.15, tMaxK: 343.15 },
      minV: 11.172,
      maxV: 13.0536,
      minAtK: 273.15,
      maxAtK: 343.15,
    },
  ])('$name', ({ input, minV, maxV, minAtK, maxAtK }) => {
    const window = zenerWindow(input);
    expectRelClose(window.minV, minV, 1e-12);
    expectRelClose(window.maxV, maxV, 1e-12);
    expect(window).toMatchObject({ minAtK, maxAtK });
  });

  it('spells out the rule', () => {
    const window = zenerWindow({ vzNominalV: 5.1, tolerance: 0.05, alphaPerK: -3e-4, tMinK: 233.15, tMaxK: 398.15 });
    expect(window.method).toContain('(1 ± 5 %)');
    expect(window.method).toContain('-300 ppm/K');
    expect(window.method).toContain('-40 °C … 125 °C');
  });

  it('is VZ25 at 25 °C whatever the tempco', () => {
    expect(zenerVoltageAt(6.2, 5e-4, 298.15)).toBe(6.2);
  });

  it('throws on a reversed temperature range (programmer error)', () => {
    expect(() => zenerWindow({ vzNominalV: 5.1, tolerance: 0.05, alphaPerK: 0, tMinK: 350, tMaxK: 300 })).toThrow(RangeError);
  });
});

describe('zener helpers', () => {
  it('converts a tempco in V/K to α: +2 mV/K at 6.2 V is 322.6 ppm/K', () => {
    expectRelClose(alphaFromTempco(0.002, 6.2), 3.2258e-4, 1e-4);
  });

  it.each([
    // a typical 1 W 5.1 V Zener: VZ 5.1 V at IZT 49 mA, ZZT 7 Ω [from memory]; at 10 mA: (0.010 − 0.049)·7 = −0.273 V
    { izA: 0.01, iztA: 0.049, zztOhm: 7, shiftV: -0.273 },
    { izA: 0.049, iztA: 0.049, zztOhm: 7, shiftV: 0 },
    { izA: 0.1, iztA: 0.02, zztOhm: 10, shiftV: 0.8 },
  ])('shifts VZ by (IZ − IZT)·ZZT: $izA A vs $iztA A at $zztOhm Ω → $shiftV V', ({ izA, iztA, zztOhm, shiftV }) => {
    expect(zenerDynamicShift(izA, iztA, zztOhm)).toBeCloseTo(shiftV, 12);
  });
});
