import { fit } from './fit.js';
import { wrapStyled, type Segment, type StyledLine, type Tone } from './styled.js';

/** Builds a scrollable document of terminal lines, wrapped to one width as it goes. */
export interface DocBuilder {
  readonly lines: StyledLine[];
  readonly width: number;
  blank(): void;
  heading(text: string): void;
  /** A paragraph, wrapped; continuation lines indented by `hang` (and all lines by `indent`). */
  para(line: StyledLine | string, options?: { hang?: number; indent?: number; tone?: Tone }): void;
  /** "label   value" with the value wrapped under itself. */
  row(label: string, value: StyledLine | string, labelWidth: number, options?: { indent?: number; tone?: Tone }): void;
  /** Lines already laid out (a chart), cut to the width. */
  raw(lines: readonly StyledLine[]): void;
}

const asLine = (line: StyledLine | string, tone?: Tone): StyledLine => (typeof line === 'string' ? [{ text: line, ...(tone ? { tone } : {}) }] : line);

export function docBuilder(width: number): DocBuilder {
  const lines: StyledLine[] = [];
  const para: DocBuilder['para'] = (line, options = {}) => {
    const indent = options.indent ?? 0;
    const body = asLine(line, options.tone);
    const prefix: Segment[] = indent > 0 ? [{ text: ' '.repeat(indent) }] : [];
    lines.push(...wrapStyled([...prefix, ...body], width, indent + (options.hang ?? 0)));
  };
  return {
    lines,
    width,
    blank: () => lines.push([]),
    heading: (text) => lines.push([{ text, tone: 'accent', bold: true }]),
    para,
    row: (label, value, labelWidth, options = {}) => {
      const indent = options.indent ?? 0;
      const narrow = Math.min(labelWidth, Math.max(8, Math.floor(width * 0.4)));
      para([{ text: fit(label, narrow) + ' ', tone: 'muted' }, ...asLine(value, options.tone)], { indent, hang: narrow + 1 });
    },
    raw: (more) => lines.push(...more),
  };
}
