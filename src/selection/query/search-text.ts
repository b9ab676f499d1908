/**
 * How typed text and part text are compared. The key's rule is also written in SQL, in the
 * triggers of migrations/006-search-key-and-import-digest.sql; a test holds the two together.
 */

/** Characters that never matter to a match: "SOD-123", "SOD 123" and "sod123" are one text. */
export const SEPARATORS = ' \t\n\r-,./_()#+:;\'"±%&*[]';
const SEPARATOR_PATTERN = new RegExp(`[${SEPARATORS.replace(/[\]\\^-]/g, '\\$&')}]`, 'g');

export function squash(text: string): string {
  return text.replace(SEPARATOR_PATTERN, '');
}

/** Upper case for ASCII only, as SQLite's upper() does. */
function upperAscii(text: string): string {
  // Plain ASCII (nearly every part number) needs no per-letter care.
  return ASCII.test(text) ? text.toUpperCase() : text.replace(/[a-z]+/g, (s) => s.toUpperCase());
}
const ASCII = /^[\x00-\x7f]*$/;

/** Part-number key: "KTR-1A1000-L" → "KTR1A1000L". Ordered by this, a typed prefix is a range. */
export function searchKey(partNumber: string): string {
  return upperAscii(squash(partNumber));
}

/**
 * The text a word may appear in besides the part number: each field squashed like the key, one
 * line each, so a word is found within one field (the catalog search matches each field's values).
 */
export function searchText(part: { manufacturer: string; package: string; kind: string; description: string }): string {
  return `${squash(part.manufacturer)}\n${squash(part.package)}\n${squash(part.kind)}\n${squash(part.description)}`;
}

/** Case-insensitive containment, as the trigram index compares (ASCII folding is enough here). */
export function containsFolded(haystack: string, needle: string): boolean {
  return haystack.toLowerCase().includes(needle.toLowerCase());
}

/** Shorter words than this cannot use the trigram index; alone they match part-number starts. */
export const MIN_INDEXED_WORD = 3;
