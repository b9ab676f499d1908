import { describe, expect, it } from 'vitest';
import {
  BOLTZMANN_J_PER_K,
  ELEMENTARY_CHARGE_C,
  SILICON_PERMITTIVITY_F_PER_M,
  celsiusToKelvin,
  kelvinToCelsius,
  thermalVoltage,
} from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

describe('constants', () => {
  it('uses the exact SI 2019 values of k and q (SI Brochure, 9th ed.)', () => {
    expect(BOLTZMANN_J_PER_K).toBe(1.380649e-23);
    expect(ELEMENTARY_CHARGE_C).toBe(1.602176634e-19);
  });

  it('kT/q at 300 K is 25.852 mV (CODATA 2018 / SI Brochure 9th ed.)', () => {
    expect(thermalVoltage(300)).toBeCloseTo(0.025852, 8);
  });

  it('kT/q scales linearly with temperature', () => {
    expectRelClose(thermalVoltage(600) / thermalVoltage(300), 2, 1e-15);
  });

  it('εSi = 11.7·ε0 ≈ 1.0359e-10 F/m (ε0 = 8.8541878128e-12 F/m, CODATA 2018)', () => {
    expectRelClose(SILICON_PERMITTIVITY_F_PER_M, 1.03594e-10, 1e-5);
  });

  it.each([
    [25, 298.15],
    [-40, 233.15],
    [125, 398.15],
  ])('%d °C is %d K', (tC, tK) => {
    expect(celsiusToKelvin(tC)).toBeCloseTo(tK, 12);
    expect(kelvinToCelsius(tK)).toBeCloseTo(tC, 12);
  });

  it('throws on a non-positive temperature (programmer error)', () => {
    expect(() => thermalVoltage(0)).toThrow(RangeError);
    expect(() => thermalVoltage(Number.NaN)).toThrow(RangeError);
  });
});
