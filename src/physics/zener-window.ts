import { T25C_K } from './constants.js';
import { formatCelsius, formatSi } from './format.js';
import { requireFinite, requireNonNegative, requirePositive } from './guards.js';

export interface ZenerWindowInput {
  /** Nominal VZ at 25 °C and IZT. */
  readonly vzNominalV: number;
  /** Tolerance as a fraction: 0.05 for ±5 %. */
  readonly tolerance: number;
  /** Fractional tempco per kelvin: −3e-4 for −0.03 %/K (see alphaFromTempco for mV/K). */
  readonly alphaPerK: number;
  /** Junction (or ambient) temperature range, kelvin. */
  readonly tMinK: number;
  readonly tMaxK: number;
}

export interface ZenerWindow {
  readonly minV: number;
  readonly maxV: number;
  readonly minAtK: number;
  readonly maxAtK: number;
  readonly method: string;
}

/** VZ(T) = VZ25·(1 + α·(T − 298.15 K)). */
export function zenerVoltageAt(vz25V: number, alphaPerK: number, tK: number): number {
  return vz25V * (1 + alphaPerK * (tK - T25C_K));
}

/** Fractional tempco α from a datasheet tempco in V/K at VZ: α = (dVZ/dT)/VZ. */
export function alphaFromTempco(tempcoVPerK: number, vzV: number): number {
  requirePositive('vzV', vzV);
  return tempcoVPerK / vzV;
}

/** VZ window over the tolerance band and the temperature range (VZ is linear in T, so the extremes sit at the corners). */
export function zenerWindow(input: ZenerWindowInput): ZenerWindow {
  const { vzNominalV, tolerance, alphaPerK, tMinK, tMaxK } = input;
  requirePositive('vzNominalV', vzNominalV);
  requireNonNegative('tolerance', tolerance);
  requireFinite('alphaPerK', alphaPerK);
  requirePositive('tMinK', tMinK);
  if (!(tMaxK >= tMinK)) throw new RangeError(`tMaxK must be ≥ tMinK, got ${tMinK} → ${tMaxK}`);
  const corners = [vzNominalV * (1 - tolerance), vzNominalV * (1 + tolerance)].flatMap((vz25V) =>
    [tMinK, tMaxK].map((tK) => ({ tK, vzV: zenerVoltageAt(vz25V, alphaPerK, tK) })),
  );
  const low = corners.reduce((a, b) => (b.vzV < a.vzV ? b : a));
  const high = corners.reduce((a, b) => (b.vzV > a.vzV ? b : a));
  return {
    minV: low.vzV,
    maxV: high.vzV,
    minAtK: low.tK,
    maxAtK: high.tK,
    method: `VZ25·(1 ± ${Number((tolerance * 100).toPrecision(3))} %)·(1 + α·(T − 25 °C)), α = ${formatSi(alphaPerK * 1e6, 'ppm/K')}, over ${formatCelsius(tMinK)} … ${formatCelsius(tMaxK)}`,
  };
}

/** Small-signal VZ shift away from the test current: ΔVZ = (IZ − IZT)·ZZT, in volts. */
export function zenerDynamicShift(izA: number, iztA: number, zztOhm: number): number {
  requireNonNegative('izA', izA);
  requirePositive('iztA', iztA);
  requireNonNegative('zztOhm', zztOhm);
  return (izA - iztA) * zztOhm;
}
