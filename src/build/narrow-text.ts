/**
 * True when every character of the text is one the terminal shows one column wide and on its own
 * (no escape codes, controls, combining marks, emoji or East Asian wide characters), so its width
 * is its length. The bundle answers Ink's width questions for such text without the grapheme
 * segmenter, whose start-up costs tens of milliseconds (src/build/bundle.ts); anything else goes to
 * string-width. tests/build/narrow-text.test.ts holds this set to string-width's own answers.
 */
export function isNarrowText(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0x20 && c <= 0x7e) continue;
    if (!isNarrowCharacter(c)) return false;
  }
  return true;
}

function isNarrowCharacter(c: number): boolean {
  return (
    (c >= 0xa0 && c <= 0x2ff && c !== 0xad && c !== 0xa9 && c !== 0xae) || // Latin-1 and extended, spacing modifiers (not the soft hyphen, nor © and ®, which some count as emoji)
    (c >= 0x391 && c <= 0x3c9 && c !== 0x3a2) || // Greek letters (Ω, µ-like θ, ε, α)
    c === 0x2013 || c === 0x2014 || (c >= 0x2018 && c <= 0x2022) || c === 0x2026 || c === 0x2030 || c === 0x2039 || c === 0x203a ||
    c === 0x2070 || c === 0x2071 || (c >= 0x2074 && c <= 0x208e) || // superscripts and subscripts
    c === 0x2103 || c === 0x2126 || (c >= 0x2153 && c <= 0x215e) || // ℃, Ω, fractions
    (c >= 0x2190 && c <= 0x2193) || // ← ↑ → ↓
    (c >= 0x2200 && c <= 0x22ff) || // mathematical operators
    (c >= 0x2500 && c <= 0x259f) || // box drawing and block elements
    c === 0x25b2 || c === 0x25bc || c === 0x2713 || c === 0x2717 // ▲ ▼ ✓ ✗
  );
}

/**
 * The graphemes of a text that holds only escape characters and characters isNarrowText accepts:
 * each code unit is a grapheme of its own there (an escape is a control, which stands alone), so
 * Intl.Segmenter is not needed. Undefined for any other text. tests/build holds this to the
 * segmenter's own answers.
 */
export function narrowGraphemes(text: string): { segment: string; index: number }[] | undefined {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x1b || (c >= 0x20 && c <= 0x7e)) continue;
    if (!isNarrowCharacter(c)) return undefined;
  }
  const graphemes = new Array<{ segment: string; index: number }>(text.length);
  for (let i = 0; i < text.length; i++) graphemes[i] = { segment: text[i]!, index: i };
  return graphemes;
}
