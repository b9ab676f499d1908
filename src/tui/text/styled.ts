import { charWidth, displayWidth } from './width.js';

/** Semantic tones; the theme turns them into colours, or into nothing under NO_COLOR. */
export type Tone = 'accent' | 'muted' | 'good' | 'warn' | 'bad' | 'safety';

export interface Segment {
  readonly text: string;
  readonly tone?: Tone;
  readonly bold?: boolean;
}

/** One terminal line made of styled pieces. */
export type StyledLine = readonly Segment[];

export const plain = (text: string, tone?: Tone, bold?: boolean): StyledLine => [{ text, ...(tone ? { tone } : {}), ...(bold ? { bold } : {}) }];

export function lineText(line: StyledLine): string {
  return line.map((s) => s.text).join('');
}

/** Splits a line into words (runs without spaces, possibly across segments) and runs of spaces. */
function units(line: StyledLine): { isSpace: boolean; pieces: Segment[] }[] {
  const out: { isSpace: boolean; pieces: Segment[] }[] = [];
  for (const segment of line) {
    for (const token of segment.text.split(/( +)/)) {
      if (token === '') continue;
      const isSpace = token.startsWith(' ');
      const piece = { ...segment, text: token };
      const last = out[out.length - 1];
      if (last && last.isSpace === isSpace) last.pieces.push(piece);
      else out.push({ isSpace, pieces: [piece] });
    }
  }
  return out;
}

/** A number and its unit ("40.0 V", "96 %") stay on one line. */
const UNIT = /^(%|°C|K|[pnµumkMG]?(V|A|W|Ω|s|Hz|F|H|C|J)|°C\/W|K\/W|ppm)[,.;:)]*$/;

function keepUnits(list: { isSpace: boolean; pieces: Segment[] }[]): { isSpace: boolean; pieces: Segment[] }[] {
  const out: { isSpace: boolean; pieces: Segment[] }[] = [];
  for (let i = 0; i < list.length; i++) {
    const word = list[i]!;
    const space = list[i + 1];
    const unit = list[i + 2];
    const lastText = word.pieces[word.pieces.length - 1]?.text ?? '';
    if (!word.isSpace && space?.isSpace && space.pieces.length === 1 && space.pieces[0]!.text === ' ' && unit && /\d$/.test(lastText) && UNIT.test(unit.pieces.map((p) => p.text).join(''))) {
      out.push({ isSpace: false, pieces: [...word.pieces, ...space.pieces, ...unit.pieces] });
      i += 2;
    } else out.push(word);
  }
  return out;
}

const widthOf = (pieces: readonly Segment[]) => pieces.reduce((s, p) => s + displayWidth(p.text), 0);

/**
 * Word-wraps a styled line to `width` columns, keeping its spaces (indents, aligned columns);
 * continuation lines start with `hangingIndent` spaces instead of the space they broke at.
 * Words longer than a line are broken.
 */
export function wrapStyled(line: StyledLine, width: number, hangingIndent = 0): StyledLine[] {
  const limit = Math.max(1, width);
  const indent = Math.min(hangingIndent, limit - 1);
  const lines: Segment[][] = [];
  let current: Segment[] = [];
  let used = 0;
  let isContinuation = false;
  let pending: Segment[] = [];
  const newLine = () => {
    lines.push(current);
    current = indent > 0 ? [{ text: ' '.repeat(indent) }] : [];
    used = indent;
    isContinuation = true;
    pending = [];
  };
  const atLineStart = () => isContinuation && used === indent;
  for (const unit of keepUnits(units(line))) {
    if (unit.isSpace) {
      if (!atLineStart()) pending = unit.pieces;
      continue;
    }
    const w = widthOf(unit.pieces);
    const gap = widthOf(pending);
    if (used + gap + w <= limit) {
      current.push(...pending, ...unit.pieces);
      used += gap + w;
      pending = [];
      continue;
    }
    if (!atLineStart() && used > 0) newLine();
    pending = [];
    for (const piece of unit.pieces) {
      let text = '';
      for (const ch of piece.text) {
        const cw = charWidth(ch.codePointAt(0)!);
        if (used + cw > limit && !atLineStart()) {
          if (text) current.push({ ...piece, text });
          text = '';
          newLine();
        }
        text += ch;
        used += cw;
      }
      if (text) current.push({ ...piece, text });
    }
  }
  lines.push(current);
  return lines;
}

/** Cuts a styled line to `width` columns, ending in "…" when something was cut. */
export function truncateStyled(line: StyledLine, width: number): StyledLine {
  if (displayWidth(lineText(line)) <= width) return line;
  const out: Segment[] = [];
  let used = 0;
  for (const segment of line) {
    let text = '';
    for (const ch of segment.text) {
      const cw = charWidth(ch.codePointAt(0)!);
      if (used + cw > width - 1) {
        if (text) out.push({ ...segment, text });
        out.push({ text: '…' });
        return out;
      }
      text += ch;
      used += cw;
    }
    out.push({ ...segment, text });
  }
  return out;
}
