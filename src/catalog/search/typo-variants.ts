/**
 * Candidates for a word typed with one slip. Both are pure; catalog-search.ts runs them as SQL.
 */

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ';
// Every variant is one index probe; a pasted paragraph would make thousands.
const MAX_WORD = 24;

/**
 * Every text one slip away from `key` — a character wrong, missing, extra, or two swapped —
 * over the characters of part numbers. Probed as prefixes of the part-number key, they find the
 * intended part whether the whole number or only its start was typed: about 75 probes a character.
 */
export function oneSlipVariants(key: string): string[] {
  const word = key.toUpperCase().slice(0, MAX_WORD);
  const out = new Set<string>();
  for (let i = 0; i <= word.length; i++) {
    const head = word.slice(0, i);
    for (const c of ALPHABET) out.add(head + c + word.slice(i)); // missing character
    if (i === word.length) break;
    const tail = word.slice(i + 1);
    out.add(head + tail); // extra character
    for (const c of ALPHABET) if (c !== word[i]) out.add(head + c + tail); // wrong character
    if (i + 1 < word.length) out.add(head + word[i + 1] + word[i] + word.slice(i + 2)); // swapped pair
  }
  out.delete(word);
  return [...out].filter((v) => v.length > 0);
}

/**
 * Substrings that survive any one slip: the word less its middle two characters, as two pieces.
 * A slip lands in at most one piece (a swap across the middle touches neither), so a part that
 * contains one piece is a candidate. Short words have pieces too short for trigrams; their
 * trigrams are used instead, each a weaker hint.
 */
export function slipProofPieces(word: string): string[] {
  const n = word.length;
  if (n >= 8) {
    const m = Math.floor(n / 2);
    return [word.slice(0, m - 1), word.slice(m + 1)];
  }
  const trigrams = new Set<string>();
  for (let i = 0; i + 3 <= n; i++) trigrams.add(word.slice(i, i + 3));
  return [...trigrams];
}
