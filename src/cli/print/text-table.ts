import { safeText } from '../output.js';

export interface Column {
  readonly header: string;
  readonly align?: 'left' | 'right';
  /** Longest cell shown before it is cut with "…". */
  readonly max?: number;
}

/** Plain aligned columns separated by two spaces; catalog text is made safe first. */
export function textTable(columns: readonly Column[], rows: readonly string[][]): string {
  const cut = (text: string, max = 40) => {
    const clean = safeText(text);
    return [...clean].length > max ? [...clean].slice(0, max - 1).join('') + '…' : clean;
  };
  const cells = rows.map((r) => r.map((c, i) => cut(c, columns[i]?.max)));
  const widths = columns.map((col, i) => Math.max(col.header.length, ...cells.map((r) => [...(r[i] ?? '')].length)));
  const pad = (text: string, i: number) => {
    const gap = ' '.repeat(widths[i]! - [...text].length);
    return columns[i]?.align === 'right' ? gap + text : text + gap;
  };
  const lines = [columns.map((c, i) => pad(c.header, i)), ...cells.map((r) => r.map((c, i) => pad(c, i)))];
  return lines.map((l) => l.join('  ').trimEnd()).join('\n');
}
