// Number formatting for the human-readable `method` strings (not for display tables).
import { ZERO_C_K } from './constants.js';

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
];

/** `0.0595, 'V/decade'` → `59.5 mV/decade` (three significant digits). */
export function formatSi(value: number, unit: string): string {
  if (value === 0 || !Number.isFinite(value)) return `${value} ${unit}`;
  const magnitude = Math.abs(value);
  const [scale, prefix] = PREFIXES.find(([s]) => magnitude >= s * 0.9995) ?? [1e-12, 'p'];
  return `${Number((value / scale).toPrecision(3))} ${prefix}${unit}`;
}

/** Kelvin shown as Celsius, to 0.1 °C: `398.15` → `125 °C`. */
export function formatCelsius(tK: number): string {
  return `${Number((tK - ZERO_C_K).toFixed(1))} °C`;
}

export function formatNumber(value: number): string {
  return String(Number(value.toPrecision(3)));
}
