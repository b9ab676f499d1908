import { thermalVoltage } from './constants.js';
import { formatNumber, formatSi } from './format.js';
import { requireFinite, requirePositive } from './guards.js';

/** One forward operating point at a single temperature. */
export interface ForwardOperatingPoint {
  readonly vfV: number;
  readonly ifA: number;
}

export type ShockleyFit =
  | {
      readonly ok: true;
      readonly saturationCurrentA: number;
      readonly ideality: number;
      readonly method: string;
    }
  | {
      readonly ok: false;
      readonly code: 'same-current' | 'non-increasing-voltage';
      readonly message: string;
    };

/** Shockley diode equation I = IS·(exp(V/(n·VT)) − 1), VT = kT/q. */
export function shockleyCurrent(vV: number, saturationCurrentA: number, ideality: number, tK: number): number {
  requireFinite('vV', vV);
  requirePositive('saturationCurrentA', saturationCurrentA);
  requirePositive('ideality', ideality);
  return saturationCurrentA * Math.expm1(vV / (ideality * thermalVoltage(tK)));
}

/** Inverse of the Shockley equation: V = n·VT·ln(1 + I/IS); defined for I > −IS. */
export function shockleyVoltage(iA: number, saturationCurrentA: number, ideality: number, tK: number): number {
  requireFinite('iA', iA);
  requirePositive('saturationCurrentA', saturationCurrentA);
  requirePositive('ideality', ideality);
  if (iA <= -saturationCurrentA) {
    throw new RangeError(`iA must be > −IS (${-saturationCurrentA} A), got ${iA}`);
  }
  return ideality * thermalVoltage(tK) * Math.log1p(iA / saturationCurrentA);
}

/** Forward-voltage rise per decade of current, n·VT·ln 10, in volts (59.5 mV at 300 K for n = 1). */
export function voltsPerDecade(ideality: number, tK: number): number {
  requirePositive('ideality', ideality);
  return ideality * thermalVoltage(tK) * Math.LN10;
}

/**
 * IS and n through two forward points at one temperature.
 * Neglects the −1 of the Shockley equation, as forward points have I ≫ IS.
 */
export function fitShockley(a: ForwardOperatingPoint, b: ForwardOperatingPoint, tK: number): ShockleyFit {
  requirePositive('a.ifA', a.ifA);
  requirePositive('b.ifA', b.ifA);
  requireFinite('a.vfV', a.vfV);
  requireFinite('b.vfV', b.vfV);
  const [low, high] = a.ifA <= b.ifA ? [a, b] : [b, a];
  const lnRatio = Math.log(high.ifA / low.ifA);
  if (lnRatio === 0) {
    return { ok: false, code: 'same-current', message: `Both points are at ${formatSi(low.ifA, 'A')}: the slope is undefined.` };
  }
  if (!(high.vfV > low.vfV)) {
    return {
      ok: false,
      code: 'non-increasing-voltage',
      message: `VF does not rise with current (${formatSi(low.vfV, 'V')} at ${formatSi(low.ifA, 'A')}, ${formatSi(high.vfV, 'V')} at ${formatSi(high.ifA, 'A')}).`,
    };
  }
  const vt = thermalVoltage(tK);
  const ideality = (high.vfV - low.vfV) / (vt * lnRatio);
  const saturationCurrentA = low.ifA * Math.exp(-low.vfV / (ideality * vt));
  return {
    ok: true,
    saturationCurrentA,
    ideality,
    method: `Shockley fit through two points: n = ΔV/(VT·ln(I2/I1)) = ${formatNumber(ideality)}, IS = ${formatSi(saturationCurrentA, 'A')}`,
  };
}
