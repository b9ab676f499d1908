import { describe, expect, it } from 'vitest';
import {
  abruptJunctionBreakdown,
  breakdownMechanism,
  criticalFieldVPerM,
  depletionWidthM,
  gradedJunctionBreakdown,
  perCm3ToPerM3,
  perCm4ToPerM4,
  perM3ToPerCm3,
} from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

const perCm3 = perCm3ToPerM3;

describe('breakdownMechanism (Sze & Ng 3rd ed. §2.4.3 [published; from memory]), sign only, away from the crossover', () => {
  it.each([
    { vzV: 2.4, mechanism: 'zener', tempcoSign: 'negative' },
    { vzV: 3.3, mechanism: 'zener', tempcoSign: 'negative' },
    { vzV: 5.6, mechanism: 'mixed', tempcoSign: 'near-zero' },
    { vzV: 12, mechanism: 'avalanche', tempcoSign: 'positive' },
    { vzV: 24, mechanism: 'avalanche', tempcoSign: 'positive' },
  ])('$vzV V → $mechanism, $tempcoSign tempco', ({ vzV, mechanism, tempcoSign }) => {
    expect(breakdownMechanism(vzV)).toMatchObject({ mechanism, tempcoSign });
  });

  it('states its bounds 4·Eg/q and 6·Eg/q with Eg = 1.12 eV', () => {
    expect(breakdownMechanism(3.3).method).toContain('4·Eg/q = 4.48 V, 6·Eg/q = 6.72 V');
  });
});

describe('abruptJunctionBreakdown (Sze & Gibbons 1966)', () => {
  it("gives the fit's own 60 V at 1e16 cm⁻³ with Eg = 1.1 eV", () => {
    expectRelClose(abruptJunctionBreakdown(perCm3(1e16), 1.1).value, 60, 1e-12);
  });

  it('gives 60·(1.12/1.1)^1.5 ≈ 61.64 V at 1e16 cm⁻³ with the default Eg = 1.12 eV', () => {
    const estimate = abruptJunctionBreakdown(perCm3(1e16));
    expectRelClose(estimate.value, 61.6438, 1e-5);
    expect(estimate.method).toContain('Eg = 1.12 eV');
  });

  it('scales by 10^0.75 ≈ 5.623 per decade of lower doping', () => {
    const ratio = abruptJunctionBreakdown(perCm3(1e15)).value / abruptJunctionBreakdown(perCm3(1e16)).value;
    expectRelClose(ratio, 5.6234, 1e-4);
  });

  it.each([
    // Sze & Ng 3rd ed., breakdown voltage vs doping, one-sided abrupt Si [published; values read from memory], ±20 %
    { dopingPerCm3: 1e15, ballparkV: 300 },
    { dopingPerCm3: 1e16, ballparkV: 60 },
  ])('lands near the published curve: ≈ $ballparkV V at $dopingPerCm3 cm⁻³ (from memory, ±20 %)', ({ dopingPerCm3, ballparkV }) => {
    expectRelClose(abruptJunctionBreakdown(perCm3(dopingPerCm3)).value, ballparkV, 0.2);
  });

  it.each([
    { dopingPerCm3: 1e16, isWithinValidity: true },
    { dopingPerCm3: 5e17, isWithinValidity: true },
    { dopingPerCm3: 1e18, isWithinValidity: false },
  ])('flags doping above 5e17 cm⁻³: $dopingPerCm3 → within validity $isWithinValidity', ({ dopingPerCm3, isWithinValidity }) => {
    const estimate = abruptJunctionBreakdown(perCm3(dopingPerCm3));
    expect(estimate.isWithinValidity).toBe(isWithinValidity);
    if (isWithinValidity) expect(estimate.caution).toBeNull();
    else expect(estimate.caution).toContain('tunnelling');
  });
});

describe('gradedJunctionBreakdown (Sze & Gibbons 1966)', () => {
  it("gives the fit's own 60 V at a = 3e20 cm⁻⁴ with Eg = 1.1 eV", () => {
    expectRelClose(gradedJunctionBreakdown(perCm4ToPerM4(3e20), 1.1).value, 60, 1e-12);
  });

  it('scales by 10^−0.4 ≈ 0.398 per decade of steeper grading', () => {
    const ratio = gradedJunctionBreakdown(perCm4ToPerM4(3e21)).value / gradedJunctionBreakdown(perCm4ToPerM4(3e20)).value;
    expectRelClose(ratio, 0.39811, 1e-4);
  });

  it('flags results below 4·Eg/q, where tunnelling dominates', () => {
    expect(gradedJunctionBreakdown(perCm4ToPerM4(3e20)).isWithinValidity).toBe(true);
    expect(gradedJunctionBreakdown(perCm4ToPerM4(3e24)).isWithinValidity).toBe(false);
  });
});

describe('field and depletion width of a one-sided abrupt junction', () => {
  const dopingPerM3 = perCm3(1e16);

  it('critical field ≈ 4e5 V/cm at 1e16 cm⁻³ (Sze & Ng, critical field vs doping, Si [from memory], ±20 %)', () => {
    const vbV = abruptJunctionBreakdown(dopingPerM3).value;
    expectRelClose(criticalFieldVPerM(dopingPerM3, vbV) / 100, 4e5, 0.2);
  });

  it('depletion width at 60 V and 1e16 cm⁻³ is 2.785 µm (hand-computed with εSi = 11.7·ε0)', () => {
    expectRelClose(depletionWidthM(dopingPerM3, 60), 2.7855e-6, 1e-4);
  });

  it('field and width satisfy Ec·W = 2·VB (triangular field profile)', () => {
    const vbV = 60;
    expectRelClose(criticalFieldVPerM(dopingPerM3, vbV) * depletionWidthM(dopingPerM3, vbV), 2 * vbV, 1e-12);
  });

  it('converts doping units', () => {
    expect(perCm3ToPerM3(1e16)).toBe(1e22);
    expect(perM3ToPerCm3(1e22)).toBe(1e16);
    expect(perCm4ToPerM4(3e20)).toBe(3e28);
  });
});
