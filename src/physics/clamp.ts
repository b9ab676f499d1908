import { formatSi } from './format.js';
import { requireNonNegative, requirePositive } from './guards.js';

export interface ClampInput {
  /** Open-circuit surge voltage. */
  readonly vocV: number;
  /** Source impedance, e.g. 2 Ω for the IEC 61000-4-5 combination wave generator. */
  readonly sourceOhm: number;
  readonly vbrMaxV: number;
  readonly rdynOhm: number;
}

export interface ClampEstimate {
  readonly ippA: number;
  readonly vcV: number;
  readonly method: string;
}

export interface PulsePowerEstimate {
  readonly value: number;
  /** Relative uncertainty of the rule (±30 %): datasheet derating curves rule. */
  readonly uncertainty: number;
  readonly method: string;
}

const CLAMP_SOURCE = '[common practice]';

/** TVS dynamic resistance from its rated clamp point: Rdyn = (VC − VBR,max)/IPP. */
export function tvsDynamicResistance(vcRatedV: number, vbrMaxV: number, ippRatedA: number): number {
  requirePositive('ippRatedA', ippRatedA);
  requirePositive('vbrMaxV', vbrMaxV);
  if (!(vcRatedV >= vbrMaxV)) throw new RangeError(`vcRatedV (${vcRatedV}) must be ≥ vbrMaxV (${vbrMaxV})`);
  return (vcRatedV - vbrMaxV) / ippRatedA;
}

/**
 * Surge through a TVS modelled as VBR,max + Rdyn·I: IPP = (Voc − VBR,max)/(Zs + Rdyn), VC = VBR,max + IPP·Rdyn.
 * Below VBR the TVS does not conduct: IPP = 0, VC = Voc.
 */
export function tvsClampEstimate(input: ClampInput): ClampEstimate {
  const { vocV, sourceOhm, vbrMaxV, rdynOhm } = input;
  requireNonNegative('vocV', vocV);
  requireNonNegative('sourceOhm', sourceOhm);
  requirePositive('vbrMaxV', vbrMaxV);
  requireNonNegative('rdynOhm', rdynOhm);
  if (vocV <= vbrMaxV) {
    return { ippA: 0, vcV: vocV, method: `Voc ${formatSi(vocV, 'V')} ≤ VBR,max ${formatSi(vbrMaxV, 'V')}: the TVS does not conduct` };
  }
  if (sourceOhm + rdynOhm === 0) throw new RangeError('sourceOhm + rdynOhm must be > 0 when Voc exceeds VBR');
  const ippA = (vocV - vbrMaxV) / (sourceOhm + rdynOhm);
  return {
    ippA,
    vcV: vbrMaxV + ippA * rdynOhm,
    method: `IPP = (Voc − VBR,max)/(Zs + Rdyn) = (${formatSi(vocV, 'V')} − ${formatSi(vbrMaxV, 'V')})/(${formatSi(sourceOhm, 'Ω')} + ${formatSi(rdynOhm, 'Ω')}); VC = VBR,max + IPP·Rdyn ${CLAMP_SOURCE}`,
  };
}

/** Peak pulse power at another pulse width: P(t2) = P(t1)·(t1/t2)^0.5 (Wunsch & Bell 1968 [from memory]), ±30 %. */
export function scalePeakPulsePower(powerW: number, fromWidthS: number, toWidthS: number): PulsePowerEstimate {
  requireNonNegative('powerW', powerW);
  requirePositive('fromWidthS', fromWidthS);
  requirePositive('toWidthS', toWidthS);
  return {
    value: powerW * Math.sqrt(fromWidthS / toWidthS),
    uncertainty: 0.3,
    method: `P(t2) = P(t1)·(t1/t2)^0.5 from ${formatSi(powerW, 'W')} at ${formatSi(fromWidthS, 's')} to ${formatSi(toWidthS, 's')} (Wunsch & Bell 1968 [from memory]; ±30 %, datasheet curves rule)`,
  };
}

/** Energy of a double-exponential pulse (decay part): E ≈ VC·IPP·td/ln 2, td the time to half value [published physics]. */
export function doubleExponentialPulseEnergy(vcV: number, ippA: number, halfValueTimeS: number): number {
  requireNonNegative('vcV', vcV);
  requireNonNegative('ippA', ippA);
  requirePositive('halfValueTimeS', halfValueTimeS);
  return (vcV * ippA * halfValueTimeS) / Math.LN2;
}
