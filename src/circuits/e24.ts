/**
 * The E24 series of IEC 60063, one decade. Hard-coded on purpose: the standard fixed these values
 * before the geometric rule, and rounding 10^(i/24) gets eight of them wrong (2.7, 3.0, 3.3, 3.6,
 * 3.9, 4.3, 4.7 and 8.2).
 */
export const E24 = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
] as const;

export const E24_SOURCE = 'IEC 60063, E24 series [published]';

// Relative slack for values typed in decimal that are not exact in binary (4.7e-3, 0.0082 …).
const SLACK = 1e-9;

/** m·10^d as the nearest double to the decimal (8.2·10⁻³ → 0.0082, not 0.008199999999999999). */
function compose(mantissa: number, decade: number): number {
  return Number((mantissa * 10 ** decade).toPrecision(2));
}

/** Every E24 value of the decade below, of the value's decade and of the decade above, ascending. */
function around(value: number): number[] {
  const decade = Math.floor(Math.log10(value));
  return [decade - 1, decade, decade + 1].flatMap((d) => E24.map((m) => compose(m, d)));
}

function requirePositiveFinite(value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`E24 values are positive and finite, got ${value}`);
}

/** The largest E24 value ≤ value, over all decades. */
export function e24AtOrBelow(value: number): number {
  requirePositiveFinite(value);
  const below = around(value).filter((v) => v <= value * (1 + SLACK));
  return below[below.length - 1]!;
}

/** The smallest E24 value ≥ value, over all decades. */
export function e24AtOrAbove(value: number): number {
  requirePositiveFinite(value);
  return around(value).find((v) => v >= value * (1 - SLACK))!;
}

/** The E24 value nearest on a log scale (the series is geometric, so ratios, not differences, compare). */
export function nearestE24(value: number): number {
  const low = e24AtOrBelow(value);
  const high = e24AtOrAbove(value);
  return Math.log(value / low) <= Math.log(high / value) ? low : high;
}

/** True when value is an E24 value of some decade (5.1, 5V1 = 5.1, 820, 0.0047 …). */
export function isE24(value: number): boolean {
  if (!(value > 0) || !Number.isFinite(value)) return false;
  const low = e24AtOrBelow(value);
  return Math.abs(value - low) <= SLACK * value;
}
