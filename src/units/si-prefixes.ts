/** An SI prefix: its symbol and the power of ten it stands for. */
export interface SiPrefix {
  symbol: string;
  exponent: number;
}

/**
 * Prefixes accepted when parsing. Case matters as SI says (m milli, M mega);
 * `u` is the ASCII stand-in for µ. Uppercase `K` is read as kilo because every
 * prefixable quantity here is kelvin-free, so it cannot be mistaken for kelvin
 * ("10K" in a resistance field is how resistors are often written).
 */
export const PARSE_PREFIXES: readonly SiPrefix[] = [
  { symbol: 'f', exponent: -15 },
  { symbol: 'p', exponent: -12 },
  { symbol: 'n', exponent: -9 },
  { symbol: 'µ', exponent: -6 },
  { symbol: 'u', exponent: -6 },
  { symbol: 'm', exponent: -3 },
  { symbol: 'k', exponent: 3 },
  { symbol: 'K', exponent: 3 },
  { symbol: 'M', exponent: 6 },
  { symbol: 'G', exponent: 9 },
];

/** Output prefix for each engineering exponent, f through G; µ is the micro sign U+00B5. */
export const FORMAT_PREFIXES: ReadonlyMap<number, string> = new Map([
  [-15, 'f'],
  [-12, 'p'],
  [-9, 'n'],
  [-6, 'µ'],
  [-3, 'm'],
  [0, ''],
  [3, 'k'],
  [6, 'M'],
  [9, 'G'],
]);

/** Display symbol for a power of ten, used in notes such as "read as 4.7 kΩ". */
export function prefixSymbol(exponent: number): string {
  return FORMAT_PREFIXES.get(exponent) ?? '';
}
