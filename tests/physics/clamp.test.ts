import { describe, expect, it } from 'vitest';
import {
  doubleExponentialPulseEnergy,
  scalePeakPulsePower,
  tvsClampEstimate,
  tvsDynamicResistance,
} from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

// Example TVS: VBR,max 14.3 V, VC 21.5 V at IPP 27.9 A (10/1000 µs rating)
const rdynOhm = tvsDynamicResistance(21.5, 14.3, 27.9);

describe('tvsDynamicResistance [common practice]', () => {
  it('is (21.5 − 14.3) V / 27.9 A ≈ 0.258 Ω, by hand', () => {
    expectRelClose(rdynOhm, 0.25806, 1e-4);
  });

  it('throws when VC is below VBR (programmer error)', () => {
    expect(() => tvsDynamicResistance(10, 14.3, 27.9)).toThrow(RangeError);
  });
});

describe('tvsClampEstimate [common practice]', () => {
  it('IEC 61000-4-5 combination wave at 1 kV through its effective 2 Ω (IEC 61000-4-5, clause 6.1 generator [published])', () => {
    // IPP = (1000 − 14.3)/(2 + 0.2581) = 436.5 A; VC = 14.3 + 436.5·0.2581 = 126.95 V (by hand)
    const estimate = tvsClampEstimate({ vocV: 1000, sourceOhm: 2, vbrMaxV: 14.3, rdynOhm });
    expectRelClose(estimate.ippA, 436.52, 1e-4);
    expectRelClose(estimate.vcV, 126.95, 1e-4);
    expect(estimate.method).toContain('IPP = (Voc − VBR,max)/(Zs + Rdyn)');
  });

  it('through the 42 Ω unshielded signal-line coupling network [published; value from memory]', () => {
    // (1000 − 14.3)/(42 + 0.2581) = 23.33 A (by hand)
    const estimate = tvsClampEstimate({ vocV: 1000, sourceOhm: 42, vbrMaxV: 14.3, rdynOhm });
    expectRelClose(estimate.ippA, 23.325, 1e-3);
  });

  it.each([5, 14.3])('does not conduct at Voc = %d V ≤ VBR,max', (vocV) => {
    expect(tvsClampEstimate({ vocV, sourceOhm: 2, vbrMaxV: 14.3, rdynOhm })).toMatchObject({ ippA: 0, vcV: vocV });
  });
});

describe('scalePeakPulsePower (Wunsch & Bell 1968 [from memory], ±30 %)', () => {
  it('600 W at 1 ms becomes 600·(1000/20)^0.5 ≈ 4243 W at 20 µs, ±30 % noted', () => {
    const estimate = scalePeakPulsePower(600, 1e-3, 20e-6);
    expectRelClose(estimate.value, 4242.64, 1e-5);
    expect(estimate.uncertainty).toBe(0.3);
    expect(estimate.method).toContain('±30 %');
  });

  it('is the identity at the rated width', () => {
    expect(scalePeakPulsePower(600, 1e-3, 1e-3).value).toBe(600);
  });
});

describe('doubleExponentialPulseEnergy [published physics]', () => {
  it('is VC·IPP·td/ln 2: 100 V · 5 A · 20 µs / ln 2 = 14.43 mJ, by hand', () => {
    expectRelClose(doubleExponentialPulseEnergy(100, 5, 20e-6), 14.42695e-3, 1e-6);
  });

  it('matches a numerical integral of the decay I = IPP·2^(−t/td) at constant VC', () => {
    const vcV = 126.95;
    const ippA = 436.5;
    const tdS = 20e-6;
    const stepS = 1e-9;
    let energyJ = 0;
    for (let t = 0; t < 40 * tdS; t += stepS) energyJ += vcV * ippA * 2 ** (-(t + stepS / 2) / tdS) * stepS;
    expectRelClose(doubleExponentialPulseEnergy(vcV, ippA, tdS), energyJ, 1e-6);
  });
});
