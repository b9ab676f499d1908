import type { Caution } from '../caution.js';
import { q } from '../derivation.js';

/*
 * Cautions shared by the hard-switched roles (buck, boost, flyback, PWM coil); a companion of
 * common-limits.ts, free for any role to use.
 */

export const ERICKSON = 'Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed. (chapter from memory)';

/** Recovery and capacitive loss need the part's Qrr and Cj: selection evaluates them per part. */
export function switchingLossNote(reverseV: number, frequencyHz: number): Caution {
  const perNanocoulomb = reverseV * frequencyHz * 1e-9;
  const per100pF = 0.5 * 100e-12 * reverseV * reverseV * frequencyHz;
  return {
    level: 'note',
    text:
      `Recovery loss Qrr·VR·fs and capacitive loss ½·Cj·VR²·fs depend on the part; selection evaluates them at VR = ${q(reverseV, 'voltage')} ` +
      `and fs = ${q(frequencyHz, 'frequency')}. Here each nC of Qrr costs ${q(perNanocoulomb, 'power')} and each 100 pF of Cj ${q(per100pF, 'power')} (common practice).`,
  };
}

export function allowanceNote(allowance: number, what: string): Caution {
  return {
    level: 'note',
    text: `The ${q(allowance, 'ratio')} ${what} allowance on the reverse voltage is an assumption (common practice 20–50 %); measure the diode voltage on the board and replace it.`,
  };
}

/** Schottky leakage grows about 2× per 12.6 °C, so a hot Schottky can heat itself into runaway. */
export function schottkyLeakageNote(kinds: readonly string[], ambientMaxK: number): Caution[] {
  if (!kinds.includes('schottky')) return [];
  return [
    {
      level: 'design',
      text: `A Schottky's leakage roughly doubles every 12.6 °C and adds to its own heating; at ${q(ambientMaxK, 'temperature')} ambient selection checks that each part's heat balance is stable (diode-formulas §7).`,
    },
  ];
}
