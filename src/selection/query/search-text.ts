/**
 * How typed text and part text are compared. The same rules are written in SQL in
 * migrations/004-search-index.sql (search_key, search_text); a test holds the two together.
 */

/** Characters that never matter to a match: "SOD-123", "SOD 123" and "sod123" are one text. */
export const SEPARATORS = ' \t\n\r-,./_()#+:;\'"±%&*[]';
const SEPARATOR_PATTERN = new RegExp(`[${SEPARATORS.replace(/[\]\\^-]/g, '\\$&')}]`, 'g');

export function squash(text: string): string {
  return text.replace(SEPARATOR_PATTERN, '');
}

/** Upper case for ASCII only, as SQLite's upper() does. */
function upperAscii(text: string): string {
  return text.replace(/[a-z]+/g, (s) => s.toUpperCase());
}

/** Part-number key: "KTR-1A1000-L" → "KTR1A1000L". Ordered by this, a typed prefix is a range. */
export function searchKey(partNumber: string): string {
  return upperAscii(squash(partNumber));
}

/** The text a word may appear in besides the part number, squashed like the key. */
export function searchText(part: { manufacturer: string; package: string; kind: string; description: string }): string {
  return squash(`${part.manufacturer} ${part.package} ${part.kind} ${part.description}`);
}

/** Case-insensitive containment, as the trigram index compares (ASCII folding is enough here). */
export function containsFolded(haystack: string, needle: string): boolean {
  return haystack.toLowerCase().includes(needle.toLowerCase());
}

/** Shorter words than this cannot use the trigram index; alone they match part-number starts. */
export const MIN_INDEXED_WORD = 3;
