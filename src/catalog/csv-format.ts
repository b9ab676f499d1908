import { stringify } from 'csv-stringify/sync';
import { PART_COLUMNS, type Part } from '../parts/index.js';
import { encodePartCells } from './part-cells.js';
import { cellCountIssue, checkCsvHeader, emptyFileIssue, unreadableIssue } from './import/csv-header.js';
import { CsvTokenizer } from './import/csv-tokenizer.js';
import type { RowIssue } from './row-issue.js';

export interface SourceRecord {
  readonly line: number;
  readonly cells: Record<string, string>;
}

/** Records that could be split into cells, and the problems with those that could not. */
export interface RecordsRead {
  readonly records: SourceRecord[];
  readonly issues: RowIssue[];
  /** The file as a whole could not be read (syntax, header, format): no record can be trusted. */
  readonly isUnreadable?: boolean;
}

/** Splits CSV text into records keyed by header, each with the line it starts on. */
export function readCsvRecords(file: string, text: string): RecordsRead {
  const tokenizer = new CsvTokenizer();
  const rows: { cells: string[]; line: number }[] = [];
  const sink = (cells: readonly string[], count: number, line: number) => rows.push({ cells: cells.slice(0, count), line });
  const problem = tokenizer.push(text, sink) ?? tokenizer.end(sink);
  if (problem) return { records: [], isUnreadable: true, issues: [unreadableIssue(file, problem.line, problem.message)] };
  const [header, ...data] = rows;
  if (!header) return { records: [], isUnreadable: true, issues: [emptyFileIssue(file)] };
  const columns = header.cells.map((c) => c.trim());
  const headerIssues = checkCsvHeader(file, columns, header.line);
  if (headerIssues.length > 0) return { records: [], issues: headerIssues, isUnreadable: true };
  const issues: RowIssue[] = [];
  const records: SourceRecord[] = [];
  for (const row of data) {
    if (row.cells.length !== columns.length) {
      issues.push(cellCountIssue(file, row.line, row.cells.length, columns.length));
      continue;
    }
    const cells: Record<string, string> = {};
    columns.forEach((c, i) => (cells[c] = row.cells[i]!));
    records.push({ line: row.line, cells });
  }
  return { records, issues };
}

/** A spreadsheet runs a cell starting with these as a formula; an apostrophe makes it text. */
const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseCell(cell: string): string {
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** Canonical CSV: fixed column order, SI numbers in shortest exact text, LF line ends. */
export function writeCsv(parts: readonly Part[]): string {
  const rows = parts.map((p) => {
    const cells = encodePartCells(p);
    return PART_COLUMNS.map((c) => neutraliseCell(cells[c] ?? ''));
  });
  return stringify([PART_COLUMNS as string[], ...rows], { record_delimiter: '\n' });
}
