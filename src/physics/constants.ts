import { requirePositive } from './guards.js';

/** Boltzmann constant k, exact since the 2019 SI redefinition (SI Brochure, 9th ed.). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Elementary charge q, exact since the 2019 SI redefinition (SI Brochure, 9th ed.). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

/** 0 °C in kelvin. */
export const ZERO_C_K = 273.15;

/** 25 °C in kelvin: the usual datasheet reference temperature. */
export const T25C_K = 298.15;

/** Silicon bandgap at 300 K (Sze & Ng, 3rd ed., appendix) [published]. */
export const SILICON_BANDGAP_EV = 1.12;

/** Vacuum permittivity ε0, CODATA 2018 (measured, no longer exact after 2019). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;

/** Relative permittivity of silicon. */
export const SILICON_RELATIVE_PERMITTIVITY = 11.7;

/** Permittivity of silicon εSi = 11.7·ε0. */
export const SILICON_PERMITTIVITY_F_PER_M = SILICON_RELATIVE_PERMITTIVITY * VACUUM_PERMITTIVITY_F_PER_M;

/** Thermal voltage VT = k·T/q in volts (25.852 mV at 300 K). */
export function thermalVoltage(tK: number): number {
  requirePositive('tK', tK);
  return (BOLTZMANN_J_PER_K * tK) / ELEMENTARY_CHARGE_C;
}

export function celsiusToKelvin(tC: number): number {
  return tC + ZERO_C_K;
}

export function kelvinToCelsius(tK: number): number {
  return tK - ZERO_C_K;
}
