import { describeKind, type QuantityKind } from './quantity-kinds.js';
import { FORMAT_PREFIXES } from './si-prefixes.js';
import { UNIT_TABLE } from './unit-table.js';

export interface FormatQuantityOptions {
  /** Significant figures, 1 to 17; default 3. */
  digits?: number;
}

const DEFAULT_DIGITS = 3;
const MAX_DIGITS = 17;
const CELSIUS_OFFSET = 273.15;

function clampDigits(digits: number | undefined): number {
  if (digits === undefined || !Number.isFinite(digits)) return DEFAULT_DIGITS;
  return Math.min(MAX_DIGITS, Math.max(1, Math.round(digits)));
}

/** |value| rounded to `digits` significant figures, as a digit string and a decimal exponent. */
function significant(value: number, digits: number): { digits: string; exponent: number } {
  const [mantissa = '0', exponent = '0'] = Math.abs(value).toExponential(digits - 1).split('e');
  return { digits: mantissa.replace('.', ''), exponent: Number(exponent) };
}

/** Writes a digit string with `integerDigits` digits before the point, padding with zeros. */
function placePoint(digits: string, integerDigits: number): string {
  if (integerDigits <= 0) return `0.${'0'.repeat(-integerDigits)}${digits}`;
  if (digits.length <= integerDigits) return digits.padEnd(integerDigits, '0');
  return `${digits.slice(0, integerDigits)}.${digits.slice(integerDigits)}`;
}

function sign(value: number): string {
  return value < 0 ? '-' : '';
}

/** Engineering notation: exponent a multiple of 3 shown as an SI prefix (f … G). */
function engineering(value: number, digits: number, unit: string): string {
  if (value === 0) return `0 ${unit}`;
  const rounded = significant(value, digits);
  const exponent3 = Math.floor(rounded.exponent / 3) * 3;
  const mantissa = `${sign(value)}${placePoint(rounded.digits, rounded.exponent - exponent3 + 1)}`;
  const prefix = FORMAT_PREFIXES.get(exponent3);
  if (prefix === undefined) return `${mantissa}e${exponent3} ${unit}`;
  return `${mantissa} ${prefix}${unit}`;
}

/** Significant figures without a prefix, in plain decimals while that stays short. */
function plain(value: number, digits: number, unit: string): string {
  if (value === 0) return `0 ${unit}`;
  const rounded = significant(value, digits);
  if (rounded.exponent >= -3 && rounded.exponent < 6) {
    return `${sign(value)}${placePoint(rounded.digits, rounded.exponent + 1)} ${unit}`;
  }
  return `${sign(value)}${placePoint(rounded.digits, 1)}e${rounded.exponent} ${unit}`;
}

function integerDigits(value: number): number {
  return Math.trunc(Math.abs(value)).toFixed(0).length;
}

/**
 * Celsius on an arbitrary zero, so significant figures would be misleading
 * near 0 °C: `digits` figures, but never fewer than the integer part needs
 * (125 °C, 25.0 °C, -40.0 °C, 0.00 °C).
 */
function celsius(kelvin: number, digits: number): string {
  const value = kelvin - CELSIUS_OFFSET;
  if (Math.abs(value) >= 1e15) return plain(value, digits, '°C');
  let decimals = Math.max(0, digits - integerDigits(value));
  let text = value.toFixed(decimals);
  const carried = Math.max(0, digits - integerDigits(Number(text)));
  if (carried < decimals) {
    decimals = carried;
    text = value.toFixed(decimals);
  }
  if (Number(text) === 0) text = text.replace('-', '');
  return `${text} °C`;
}

/** Shows an SI value in its quantity's display unit; no prefix for temperature, ratio, tempco. */
export function formatQuantity(valueSi: number, kind: QuantityKind, options: FormatQuantityOptions = {}): string {
  const digits = clampDigits(options.digits);
  const { unit } = describeKind(kind);
  if (Number.isNaN(valueSi)) return `NaN ${unit}`;
  if (!Number.isFinite(valueSi)) return `${sign(valueSi)}∞ ${unit}`;
  switch (kind) {
    case 'temperature':
      return celsius(valueSi, digits);
    case 'ratio':
    case 'tempco':
      return plain(valueSi * 100, digits, unit);
    default:
      return UNIT_TABLE[kind].bare.prefixable ? engineering(valueSi, digits, unit) : plain(valueSi, digits, unit);
  }
}
