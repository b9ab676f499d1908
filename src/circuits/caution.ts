/** Something the engineer must know about a result; 'safety' is shown wherever the position is shown. */
export interface Caution {
  readonly level: 'safety' | 'design' | 'note';
  readonly text: string;
}

/** Above these the circuit is hazardous: the extra-low-voltage limits, 50 V AC rms and 120 V ripple-free DC (IEC 60449 band I, from memory). */
export const HAZARDOUS_AC_RMS_V = 50;
export const HAZARDOUS_DC_V = 120;

export const SAFETY_CAUTION: Caution = {
  level: 'safety',
  text:
    'Hazardous voltage or surge protection: these results are an engineering aid only. Verify them against the ' +
    'datasheets, the applicable safety standards and local codes; the design must be reviewed by qualified people.',
};

/** Adds the safety caution once when a position involves hazardous voltage or surge/mains protection. */
export function safetyCautions(options: { acRmsV?: number; dcV?: number; isSurgeProtection?: boolean }): Caution[] {
  const hazardous =
    (options.acRmsV !== undefined && options.acRmsV > HAZARDOUS_AC_RMS_V) ||
    (options.dcV !== undefined && options.dcV > HAZARDOUS_DC_V) ||
    options.isSurgeProtection === true;
  return hazardous ? [SAFETY_CAUTION] : [];
}
