import { ELEMENTARY_CHARGE_C, SILICON_BANDGAP_EV, SILICON_PERMITTIVITY_F_PER_M } from './constants.js';
import { formatSi } from './format.js';
import { requirePositive } from './guards.js';

export type BreakdownMechanism = 'zener' | 'mixed' | 'avalanche';
export type TempcoSign = 'negative' | 'near-zero' | 'positive';

export interface MechanismEstimate {
  readonly mechanism: BreakdownMechanism;
  readonly tempcoSign: TempcoSign;
  readonly method: string;
}

export interface BreakdownEstimate {
  /** Breakdown voltage in volts. */
  readonly value: number;
  /** False outside the fit's range, where tunnelling takes over. */
  readonly isWithinValidity: boolean;
  readonly caution: string | null;
  readonly method: string;
}

/** Highest doping for the avalanche fit of an abrupt junction, 5e17 cm⁻³ (tunnelling above). */
export const ABRUPT_MAX_DOPING_PER_M3 = 5e17 * 1e6;

const SOURCE = 'Sze & Gibbons 1966; Sze & Ng 3rd ed. §2.4.3 [published; from memory]';

export function perCm3ToPerM3(perCm3: number): number {
  return perCm3 * 1e6;
}

export function perM3ToPerCm3(perM3: number): number {
  return perM3 / 1e6;
}

/** Grading constant a: cm⁻⁴ → m⁻⁴. */
export function perCm4ToPerM4(perCm4: number): number {
  return perCm4 * 1e8;
}

/**
 * Breakdown mechanism in silicon from the breakdown voltage: tunnelling below 4·Eg/q (≈ 4.5 V, negative tempco),
 * avalanche above 6·Eg/q (≈ 6.7 V, positive tempco), mixed between (near-zero tempco around 5–6 V).
 */
export function breakdownMechanism(vzV: number, bandgapEv: number = SILICON_BANDGAP_EV): MechanismEstimate {
  requirePositive('vzV', vzV);
  requirePositive('bandgapEv', bandgapEv);
  const zenerBelowV = 4 * bandgapEv;
  const avalancheAboveV = 6 * bandgapEv;
  const bounds = `4·Eg/q = ${formatSi(zenerBelowV, 'V')}, 6·Eg/q = ${formatSi(avalancheAboveV, 'V')} (Sze & Ng 3rd ed. §2.4.3 [published; from memory])`;
  if (vzV < zenerBelowV) return { mechanism: 'zener', tempcoSign: 'negative', method: `tunnelling below ${bounds}` };
  if (vzV > avalancheAboveV) return { mechanism: 'avalanche', tempcoSign: 'positive', method: `avalanche above ${bounds}` };
  return { mechanism: 'mixed', tempcoSign: 'near-zero', method: `mixed between ${bounds}` };
}

/**
 * One-sided abrupt junction: VB ≈ 60·(Eg/1.1)^1.5·(NB/1e16 cm⁻³)^−0.75 V. NB is the lightly doped side, in m⁻³.
 * Eg defaults to 1.12 eV (silicon at 300 K); pass 1.1 for the fit's own 60 V at 1e16 cm⁻³.
 */
export function abruptJunctionBreakdown(dopingPerM3: number, bandgapEv: number = SILICON_BANDGAP_EV): BreakdownEstimate {
  requirePositive('dopingPerM3', dopingPerM3);
  requirePositive('bandgapEv', bandgapEv);
  const value = 60 * (bandgapEv / 1.1) ** 1.5 * (perM3ToPerCm3(dopingPerM3) / 1e16) ** -0.75;
  const isWithinValidity = dopingPerM3 <= ABRUPT_MAX_DOPING_PER_M3;
  return {
    value,
    isWithinValidity,
    caution: isWithinValidity ? null : `NB = ${perM3ToPerCm3(dopingPerM3).toExponential(2)} cm⁻³ is above 5e17 cm⁻³: tunnelling takes over and the avalanche fit no longer applies.`,
    method: `abrupt junction VB ≈ 60·(Eg/1.1)^1.5·(NB/1e16 cm⁻³)^−0.75 with Eg = ${bandgapEv} eV (${SOURCE})`,
  };
}

/**
 * Linearly graded junction: VB ≈ 60·(Eg/1.1)^1.2·(a/3e20 cm⁻⁴)^−0.4 V, grading constant a in m⁻⁴.
 * Validity (our choice, matching breakdownMechanism): VB ≥ 4·Eg/q, below which tunnelling dominates.
 */
export function gradedJunctionBreakdown(gradientPerM4: number, bandgapEv: number = SILICON_BANDGAP_EV): BreakdownEstimate {
  requirePositive('gradientPerM4', gradientPerM4);
  requirePositive('bandgapEv', bandgapEv);
  const value = 60 * (bandgapEv / 1.1) ** 1.2 * (gradientPerM4 / perCm4ToPerM4(3e20)) ** -0.4;
  const isWithinValidity = value >= 4 * bandgapEv;
  return {
    value,
    isWithinValidity,
    caution: isWithinValidity ? null : `VB = ${formatSi(value, 'V')} is below 4·Eg/q: tunnelling dominates and the avalanche fit no longer applies.`,
    method: `linearly graded junction VB ≈ 60·(Eg/1.1)^1.2·(a/3e20 cm⁻⁴)^−0.4 with Eg = ${bandgapEv} eV (${SOURCE})`,
  };
}

/** Peak field of a one-sided abrupt junction at breakdown: Ec = √(2·q·NB·VB/εs), V/m. */
export function criticalFieldVPerM(dopingPerM3: number, breakdownV: number, permittivityFPerM = SILICON_PERMITTIVITY_F_PER_M): number {
  requirePositive('dopingPerM3', dopingPerM3);
  requirePositive('breakdownV', breakdownV);
  return Math.sqrt((2 * ELEMENTARY_CHARGE_C * dopingPerM3 * breakdownV) / permittivityFPerM);
}

/** Depletion width of a one-sided abrupt junction at reverse voltage vV (built-in potential neglected): W = √(2·εs·V/(q·NB)), m. */
export function depletionWidthM(dopingPerM3: number, vV: number, permittivityFPerM = SILICON_PERMITTIVITY_F_PER_M): number {
  requirePositive('dopingPerM3', dopingPerM3);
  requirePositive('vV', vV);
  return Math.sqrt((2 * permittivityFPerM * vV) / (ELEMENTARY_CHARGE_C * dopingPerM3));
}
