import type { RowIssue } from '../row-issue.js';
import type { CellIssue } from '../part-cells.js';
import { cellCountIssue, checkCsvHeader, emptyFileIssue, unreadableIssue } from './csv-header.js';
import { CsvTokenizer, type CsvProblem } from './csv-tokenizer.js';
import { compileRowDecoder, decodeByReference, type DecodedRecord } from './row-decoder.js';
import { FileIdentities } from './file-identities.js';
import { ROW_COLUMNS } from '../part-rows.js';
import { rowDigest } from './row-digest.js';
import { DIGEST_AT, type SqlValue } from './row-values.js';

/*
 * The reading side of an import: CSV text in, checked rows out, in batches a writer can insert
 * with few bound values. Rows are grouped by which columns they fill ("shape"): a catalog has a
 * handful of shapes (a Schottky without trr, a Zener, a TVS …), and binding only the filled columns
 * halves the work of the insert. Runs in a worker thread for large files (row-feed.ts).
 */

/** Rows of one shape: `values` holds `lines.length` rows of the shape's columns, row after row. */
export interface RowGroup {
  readonly shape: number;
  readonly lines: number[];
  readonly values: SqlValue[];
}

export interface RowBatch {
  /** Columns (WRITE_COLUMNS positions) of shapes first seen in this batch, numbered on from the last. */
  readonly newShapes: number[][];
  readonly groups: RowGroup[];
  readonly issues: RowIssue[];
}

export interface ReadSummary {
  /** Records in the file, good and bad. */
  readonly records: number;
  /** The file as a whole cannot be read: nothing may be imported, even with skipInvalid. */
  readonly isUnreadable: boolean;
  /** Distinct values of the word-searched fields among the good rows (part_field_value). */
  readonly fieldValues: Record<string, string[]>;
  /** Time the reading took in a worker thread, without its waits for the writer. */
  readonly readMs?: number;
}

/** Rows per multi-row INSERT: one prepared statement per shape. */
export const GROUP_ROWS = 64;
const BATCH_ROWS = 4096;

interface ShapeRows {
  readonly id: number;
  readonly columns: number[];
  lines: number[];
  values: SqlValue[];
}

export class RowCollector {
  private readonly tokenizer: CsvTokenizer;
  private columns: string[] | undefined;
  private decode: ((cells: readonly string[]) => DecodedRecord) | undefined;
  private records = 0;
  private isUnreadable = false;
  /** Parts named so far and field values; undefined when the writing thread keeps them (row-feed.ts). */
  private readonly identities: FileIdentities | undefined;
  private readonly shapes = new Map<number, ShapeRows>();
  private newShapes: number[][] = [];
  private groups: RowGroup[] = [];
  private issues: RowIssue[] = [];
  private pendingRows = 0;
  private readonly sink = (cells: readonly string[], count: number, line: number) => this.record(cells, count, line);

  /** Records come split already (addRecord), not as CSV text. */
  private readonly isRecordInput: boolean;
  private isEnded = false;

  /**
   * `input`: CSV text, CSV bytes read as Latin-1 (pushChunk), or records split already (addRecord).
   * Without `isCheckingIdentity` rows are not checked against each other and no field values are
   * gathered: the caller does that (FileIdentities.checkBatch).
   */
  constructor(
    private readonly file: string,
    private readonly onBatch: (batch: RowBatch) => void,
    input: 'csv' | 'latin1' | 'records' = 'csv',
    isCheckingIdentity = true,
  ) {
    this.isRecordInput = input === 'records';
    this.identities = isCheckingIdentity ? new FileIdentities(file) : undefined;
    this.tokenizer = new CsvTokenizer({ isLatin1: input === 'latin1' });
  }

  /**
   * Reads the complete records at the start of a chunk; says how many characters they took (the
   * caller passes the rest again with the next chunk), or undefined once the file is unreadable.
   */
  pushChunk(text: string, isFinal: boolean): number | undefined {
    if (this.isUnreadable) return undefined;
    const r = this.tokenizer.tokenize(text, isFinal, this.sink);
    if (typeof r !== 'number') {
      this.fail(r);
      return undefined;
    }
    if (isFinal) this.isEnded = true;
    if (this.pendingRows >= BATCH_ROWS || this.issues.length >= 1000) this.flush();
    return r;
  }

  /** Reads the next piece of the file's text. */
  push(text: string): void {
    if (this.isUnreadable) return;
    this.fail(this.tokenizer.push(text, this.sink));
    if (this.pendingRows >= BATCH_ROWS || this.issues.length >= 1000) this.flush();
  }

  /** The file has ended: the last rows, and what was read. */
  end(): ReadSummary {
    if (!this.isUnreadable && !this.isRecordInput) {
      if (!this.isEnded) this.fail(this.tokenizer.end(this.sink));
      if (!this.isUnreadable && this.columns === undefined) this.unreadable([emptyFileIssue(this.file)]);
    }
    for (const shape of this.shapes.values()) this.release(shape);
    this.flush();
    return { records: this.records, isUnreadable: this.isUnreadable, fieldValues: this.identities?.fieldValues() ?? {} };
  }

  /** A record already split into cells by column (the JSON format), decoded by the reference. */
  addRecord(cells: Readonly<Record<string, string>>, line: number): void {
    this.records++;
    const decoded = decodeByReference(cells);
    if (!decoded.ok) {
      for (const i of decoded.issues) this.issues.push(this.located(line, i));
      return;
    }
    this.accept(decoded.values, line);
    if (this.pendingRows >= BATCH_ROWS) this.flush();
  }

  /** Records that could not even be split into cells; with `isUnreadable` the whole file. */
  addIssues(issues: readonly RowIssue[], isUnreadable: boolean): void {
    if (isUnreadable) return this.unreadable([...issues]);
    this.records += new Set(issues.map((i) => i.line)).size;
    this.issues.push(...issues);
  }

  private fail(problem: CsvProblem | undefined): void {
    if (problem) this.unreadable([unreadableIssue(this.file, problem.line, problem.message)]);
  }

  /** Nothing read so far can be trusted: drop the rows, keep only the reason. */
  private unreadable(issues: RowIssue[]): void {
    this.isUnreadable = true;
    this.shapes.clear();
    this.groups = [];
    this.issues = issues;
  }

  private record(cells: readonly string[], count: number, line: number): void {
    if (this.isUnreadable) return;
    if (this.columns === undefined) {
      this.columns = cells.slice(0, count).map((c) => c.trim());
      const issues = checkCsvHeader(this.file, this.columns, line);
      if (issues.length > 0) this.unreadable(issues);
      else this.decode = compileRowDecoder(this.columns, true);
      return;
    }
    this.records++;
    if (count !== this.columns.length) {
      this.issues.push(cellCountIssue(this.file, line, count, this.columns.length));
      return;
    }
    const decoded = this.decode!(cells);
    if (!decoded.ok) {
      for (const i of decoded.issues) this.issues.push(this.located(line, i));
      return;
    }
    this.accept(decoded.values, line);
  }

  private located(line: number, issue: CellIssue): RowIssue {
    return { file: this.file, line, ...issue };
  }

  /** A good row: refused if the file named its part before, else queued with rows of its shape. */
  private accept(values: SqlValue[], line: number): void {
    const refused = this.identities?.admit(values, line);
    if (refused) {
      this.issues.push(refused);
      return;
    }
    // The row's import baseline (row-values.ts).
    values[DIGEST_AT] = rowDigest(values, ROW_COLUMNS.length);
    // The shape as a number: one bit per column (WRITE_COLUMNS has fewer than 53).
    let mask = 0;
    for (let i = 0, bit = 1; i < values.length; i++, bit *= 2) if (values[i] !== null) mask += bit;
    let shape = this.shapes.get(mask);
    if (!shape) {
      const columns = values.flatMap((v, i) => (v === null ? [] : [i]));
      shape = { id: this.shapes.size, columns, lines: [], values: [] };
      this.shapes.set(mask, shape);
      this.newShapes.push(columns);
    }
    shape.lines.push(line);
    for (const c of shape.columns) shape.values.push(values[c]!);
    if (shape.lines.length === GROUP_ROWS) this.release(shape);
  }

  private release(shape: ShapeRows): void {
    if (shape.lines.length === 0) return;
    this.groups.push({ shape: shape.id, lines: shape.lines, values: shape.values });
    this.pendingRows += shape.lines.length;
    shape.lines = [];
    shape.values = [];
  }

  private flush(): void {
    if (this.groups.length === 0 && this.issues.length === 0 && this.newShapes.length === 0) return;
    const batch: RowBatch = { newShapes: this.newShapes, groups: this.groups, issues: this.issues };
    this.newShapes = [];
    this.groups = [];
    this.issues = [];
    this.pendingRows = 0;
    this.onBatch(batch);
  }
}
