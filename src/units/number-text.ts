/** A decimal number as written, kept as digits so prefixes shift it exactly. */
export interface DecimalText {
  negative: boolean;
  integer: string;
  fraction: string;
  exponent: number;
}

export interface ScannedNumber {
  number: DecimalText;
  /** What follows the number, untrimmed. */
  rest: string;
}

const NUMBER = /^([+-]?)(?:(\d+)(?:\.(\d*))?|\.(\d+))(?:[eE]([+-]?\d+))?/;

// Far beyond any double, so Number() saturates to Infinity or 0 instead of
// choking on an exponent too long to print.
const EXPONENT_LIMIT = 100_000;

function clampExponent(exponent: number): number {
  return Math.max(-EXPONENT_LIMIT, Math.min(EXPONENT_LIMIT, exponent));
}

export function scanNumber(text: string): ScannedNumber | undefined {
  const match = NUMBER.exec(text);
  if (!match) return undefined;
  const [whole, sign, integer, fraction, bareFraction, exponent] = match;
  return {
    number: {
      negative: sign === '-',
      integer: integer ?? '',
      fraction: fraction ?? bareFraction ?? '',
      exponent: clampExponent(Number.parseInt(exponent ?? '0', 10)),
    },
    rest: text.slice(whole.length),
  };
}

/** The value of `number × 10^shift + offset`, rounded once, as Number() rounds a literal. */
export function decimalValue(number: DecimalText, shift: number, offset = 0): number {
  const exponent = clampExponent(number.exponent + shift);
  if (offset !== 0 && Math.abs(exponent) <= EXACT_SUM_EXPONENT_LIMIT) {
    return exactSum(number, exponent, offset);
  }
  const sign = number.negative ? '-' : '';
  const value = Number(`${sign}${number.integer || '0'}.${number.fraction || '0'}e${exponent}`) + offset;
  return value === 0 ? 0 : value; // no -0
}

// Beyond this the offset (273.15) is lost in rounding or the sum overflows anyway.
const EXACT_SUM_EXPONENT_LIMIT = 400;

interface Scaled {
  coefficient: bigint;
  /** The value is coefficient × 10^−scale. */
  scale: number;
}

function scaled(number: DecimalText, exponent: number): Scaled {
  const magnitude = BigInt(`${number.integer}${number.fraction}` || '0');
  const coefficient = number.negative ? -magnitude : magnitude;
  const scale = number.fraction.length - exponent;
  return scale >= 0 ? { coefficient, scale } : { coefficient: coefficient * 10n ** BigInt(-scale), scale: 0 };
}

function rescale(value: Scaled, scale: number): bigint {
  return value.coefficient * 10n ** BigInt(scale - value.scale);
}

/**
 * Adds in decimal so "-40 °C" is exactly the double nearest 233.15 K, not the
 * 233.14999999999998 that binary -40 + 273.15 gives.
 */
function exactSum(number: DecimalText, exponent: number, offset: number): number {
  const offsetText = scanNumber(String(offset));
  if (!offsetText) return Number.NaN;
  const a = scaled(number, exponent);
  const b = scaled(offsetText.number, offsetText.number.exponent);
  const scale = Math.max(a.scale, b.scale);
  const sum = rescale(a, scale) + rescale(b, scale);
  const digits = (sum < 0n ? -sum : sum).toString().padStart(scale + 1, '0');
  const text = `${sum < 0n ? '-' : ''}${digits.slice(0, digits.length - scale)}.${digits.slice(digits.length - scale) || '0'}`;
  const value = Number(text);
  return value === 0 ? 0 : value;
}

/** The number as the user meant it, for notes: "4.7", "-40", "6e-4". */
export function decimalText(number: DecimalText): string {
  const sign = number.negative ? '-' : '';
  const integer = number.integer || '0';
  const mantissa = number.fraction ? `${integer}.${number.fraction}` : integer;
  return number.exponent === 0 ? `${sign}${mantissa}` : `${sign}${mantissa}e${number.exponent}`;
}

/** "NaN", "inf", "Infinity", "∞", optionally signed: a number, but never a finite one. */
export function looksNonFinite(text: string): boolean {
  return /^[+-]?\s*(?:nan|inf(?:inity)?|∞)/i.test(text);
}

/**
 * Why a number with separators is refused, with the corrected text to type.
 * Commas are refused outright because "1,500" means 1.5 in half the world and
 * 1500 in the other; separators between digit groups are refused likewise.
 */
export function separatorAdvice(text: string): string | undefined {
  const commas = /\d,\d/.test(text) ? (text.match(/,/g) ?? []).length : 0;
  const hasDot = text.includes('.');
  if (commas === 1 && !hasDot) {
    const asDecimal = `"${text.replace(',', '.')}"`;
    if (/\d,\d{3}(?!\d)/.test(text)) {
      return `use a dot as the decimal point and no thousands separators, e.g. ${asDecimal} or "${text.replace(',', '')}"`;
    }
    return `use a dot as the decimal point, e.g. ${asDecimal}`;
  }
  if (commas > 0) return `leave out thousands separators, e.g. "${text.replace(/,/g, '')}"`;
  const grouped = /\d[\s'’_]+\d/;
  if (grouped.test(text)) {
    return `leave out thousands separators, e.g. "${text.replace(/(\d)[\s'’_]+(?=\d)/g, '$1')}"`;
  }
  return undefined;
}
