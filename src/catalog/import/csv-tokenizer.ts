/**
 * A streaming RFC 4180 tokenizer that splits CSV text into records, as csv-parse does with
 * `{ bom: true, skip_empty_lines: true, relax_column_count: true }` (tests/catalog/import hold the
 * two together). About fifteen times faster than csv-parse with the line numbers we need
 * (bench/README.md), and it keeps one record at a time, not the whole file.
 *
 * Like csv-parse, the record delimiter is the first line break seen (\r\n, \n or \r); other line
 * breaks are cell text. Line numbers count every \r\n, \n and lone \r, as editors show them.
 */

/** Receives each record: `cells` is reused for the next record, so copy what must outlive the call. */
export type RecordSink = (cells: readonly string[], count: number, line: number) => void;

/** The text cannot be read as CSV from `line` on; nothing after it can be trusted. */
export interface CsvProblem {
  readonly line: number;
  readonly message: string;
}

const QUOTE = 34;
const COMMA = 44;
const LF = 10;
const CR = 13;

/**
 * The two texts joined into one flat string. V8 keeps `a + b` as a pair, and reading a pair one
 * character at a time is several times slower; Array.join builds a flat string (measured, bench/README.md).
 */
function joined(a: string, b: string): string {
  return [a, b].join('');
}

/** Line breaks in a piece of cell text: \r\n counts once. */
function countBreaks(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === LF) n++;
    else if (c === CR && text.charCodeAt(i + 1) !== LF) n++;
  }
  return n;
}

export interface TokenizerOptions {
  /**
   * The text is UTF-8 bytes read as Latin-1, one character per byte (read-csv-file.ts): cheaper to
   * decode and to carry between chunks. CSV's own characters are ASCII, so splitting is unchanged;
   * cells of records holding other bytes are decoded from UTF-8 before the sink sees them.
   */
  readonly isLatin1?: boolean;
}

const HIGH_BYTE = /[\x80-\xff]/;

function fromUtf8(latin1: string): string {
  return Buffer.from(latin1, 'latin1').toString('utf8');
}

export class CsvTokenizer {
  private pending = '';
  /** Line of the next character to tokenize. */
  private line = 1;
  private delimiter: '' | '\n' | '\r\n' | '\r' = '';
  private isStart = true;
  private readonly cells: string[] = [];

  constructor(private readonly options: TokenizerOptions = {}) {}

  /** Tokenizes every complete record of `text` (after what earlier calls left over). */
  push(text: string, sink: RecordSink): CsvProblem | undefined {
    const input = this.pending.length === 0 ? text : joined(this.pending, text);
    const r = this.tokenize(input, false, sink);
    if (typeof r !== 'number') return r;
    this.pending = input.slice(r);
    return undefined;
  }

  /** Tokenizes what is left once the input has ended. */
  end(sink: RecordSink): CsvProblem | undefined {
    const r = this.tokenize(this.pending, true, sink);
    this.pending = '';
    return typeof r === 'number' ? undefined : r;
  }

  /**
   * Tokenizes the complete records at the start of `text` and says how many characters they took;
   * the caller passes the rest again, followed by more text (or with `isFinal`, alone).
   */
  tokenize(text: string, isFinal: boolean, sink: RecordSink): number | CsvProblem {
    let pos = 0;
    if (this.isStart) {
      if (text.length === 0 && !isFinal) return 0;
      if (text.charCodeAt(0) === 0xfeff) pos = 1;
      this.isStart = false;
    }
    const n = text.length;
    let line = this.line;
    const cells = this.cells;
    while (pos < n) {
      // A record starting with its delimiter is an empty line: skipped.
      const d = this.delimiterAt(text, pos, isFinal);
      if (d === -1) return this.keep(pos, line);
      if (d > 0) {
        pos += d;
        line++;
        continue;
      }
      const start = pos;
      const startLine = line;
      let count = 0;
      // Any character from U+0080 on, seen so far in this record (isLatin1: a byte of UTF-8).
      let high = 0;
      let isComplete = false;
      for (;;) {
        // One cell, starting at pos.
        if (text.charCodeAt(pos) === QUOTE) {
          let value = '';
          let from = pos + 1;
          let close: number;
          for (;;) {
            close = text.indexOf('"', from);
            if (close === -1) {
              if (!isFinal) return this.keep(start, startLine);
              return { line: startLine + countBreaks(text.slice(start, pos)), message: 'a quoted cell is never closed (a cell that starts with " must end with ")' };
            }
            if (close + 1 >= n && !isFinal) return this.keep(start, startLine);
            if (text.charCodeAt(close + 1) === QUOTE) {
              value += text.slice(from, close + 1);
              from = close + 2;
            } else break;
          }
          value += text.slice(from, close);
          line += countBreaks(text.slice(pos, close));
          if (this.options.isLatin1 && HIGH_BYTE.test(value)) high = 0x80;
          cells[count++] = value;
          pos = close + 1;
          if (pos < n && text.charCodeAt(pos) !== COMMA) {
            const d2 = this.delimiterAt(text, pos, isFinal);
            if (d2 === -1) return this.keep(start, startLine);
            if (d2 === 0) return { line, message: `a quoted cell is followed by ${JSON.stringify(text[pos])} instead of a comma or the end of the line` };
          }
        } else {
          let end = pos;
          for (; end < n; end++) {
            const c = text.charCodeAt(end);
            high |= c;
            if (c === COMMA) break;
            if (c === QUOTE) return { line, message: 'a quote inside a cell that does not start with one (quote the whole cell and double the quotes inside)' };
            if (c === LF || c === CR) {
              const d2 = this.delimiterAt(text, end, isFinal);
              if (d2 === -1) return this.keep(start, startLine);
              if (d2 > 0) break;
              // A line break that is not the record delimiter is cell text; \r\n counts once.
              if (c === LF || text.charCodeAt(end + 1) !== LF) line++;
            }
          }
          if (end >= n && !isFinal) return this.keep(start, startLine);
          cells[count++] = text.slice(pos, end);
          pos = end;
        }
        // After a cell: a comma, the record delimiter or the end of the text.
        if (pos >= n) {
          isComplete = isFinal;
          break;
        }
        if (text.charCodeAt(pos) === COMMA) {
          pos++;
          if (pos >= n) {
            if (!isFinal) return this.keep(start, startLine);
            cells[count++] = '';
            isComplete = true;
            break;
          }
          continue;
        }
        const d3 = this.delimiterAt(text, pos, isFinal);
        if (d3 === -1) return this.keep(start, startLine);
        pos += d3;
        line++;
        isComplete = true;
        break;
      }
      if (!isComplete) return this.keep(start, startLine);
      if (this.options.isLatin1 && high >= 0x80) {
        for (let k = 0; k < count; k++) if (HIGH_BYTE.test(cells[k]!)) cells[k] = fromUtf8(cells[k]!);
      }
      sink(cells, count, startLine);
    }
    this.line = line;
    return n;
  }

  /**
   * Length of the record delimiter at `at` (0 when there is none there, -1 when more text is
   * needed to tell). The first line break of the input decides which delimiter the file uses.
   */
  private delimiterAt(text: string, at: number, isFinal: boolean): number {
    const c = text.charCodeAt(at);
    if (c !== LF && c !== CR) return 0;
    if (this.delimiter === '') {
      if (c === LF) this.delimiter = '\n';
      else if (at + 1 >= text.length && !isFinal) return -1;
      else this.delimiter = text.charCodeAt(at + 1) === LF ? '\r\n' : '\r';
    }
    if (this.delimiter === '\n') return c === LF ? 1 : 0;
    if (this.delimiter === '\r') return c === CR ? 1 : 0;
    if (c !== CR) return 0;
    if (at + 1 >= text.length) return isFinal ? 0 : -1;
    return text.charCodeAt(at + 1) === LF ? 2 : 0;
  }

  /** The record starting at `start` is not complete yet. */
  private keep(start: number, startLine: number): number {
    this.line = startLine;
    return start;
  }
}
