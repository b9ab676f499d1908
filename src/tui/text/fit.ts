import { lineText, wrapStyled } from './styled.js';
import { charWidth, displayWidth } from './width.js';

export { charWidth, displayWidth };

export function truncate(text: string, width: number): string {
  if (width <= 0) return '';
  if (displayWidth(text) <= width) return text;
  let out = '';
  let used = 0;
  for (const ch of text) {
    const w = charWidth(ch.codePointAt(0)!);
    if (used + w > width - 1) break;
    out += ch;
    used += w;
  }
  return out + '…';
}

/** Exactly `width` columns: cut with "…" or padded with spaces. */
export function fit(text: string, width: number): string {
  const cut = truncate(text, width);
  return cut + ' '.repeat(Math.max(0, width - displayWidth(cut)));
}

/** Right-aligned in `width` columns. */
export function fitRight(text: string, width: number): string {
  const cut = truncate(text, width);
  return ' '.repeat(Math.max(0, width - displayWidth(cut))) + cut;
}

/** Word-wraps plain text to lines of at most `width` columns, keeping its spaces; long words are broken. */
export function wrap(text: string, width: number, hangingIndent = 0): string[] {
  return text.split('\n').flatMap((paragraph) => wrapStyled([{ text: paragraph }], width, hangingIndent).map(lineText));
}

/** 100000 → "100,000": as toLocaleString('en') writes it, without loading a locale at start-up. */
export function groupDigits(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}
