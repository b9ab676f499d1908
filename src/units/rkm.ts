import type { DecimalText } from './number-text.js';

/**
 * IEC 60062 (RKM code): a letter stands where the decimal point would be,
 * as printed on small parts: 4k7 = 4.7 k, R47 = 0.47 Ω, 1p5 = 1.5 p, 2M2.
 * Zener voltages use the unit symbol the same way (4V7, 5V1), so the unit
 * letters of each quantity are accepted as markers too.
 */
const RKM = /^([+-]?)(\d*)([pnuµmkKMGRVAFHCJWsΩ])(\d+)(?!\s*[\d.,])\s*([\s\S]*)$/;

export interface RkmReading {
  number: DecimalText;
  /** The marker letter followed by any unit written after the code: "k", "kΩ", "V". */
  unitText: string;
}

export function readRkm(text: string): RkmReading | undefined {
  const match = RKM.exec(text);
  if (!match) return undefined;
  const [, sign, integer, marker, fraction, rest] = match;
  return {
    number: { negative: sign === '-', integer: integer ?? '', fraction: fraction ?? '', exponent: 0 },
    unitText: `${marker ?? ''}${rest ?? ''}`,
  };
}
