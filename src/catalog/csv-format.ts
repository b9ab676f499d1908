import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { PART_COLUMNS, type Part } from '../parts/index.js';
import { encodePartCells } from './part-cells.js';
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
  let parsed: { record: string[]; info: { lines: number }; raw: string }[];
  try {
    parsed = parse(text, { bom: true, info: true, raw: true, skip_empty_lines: true, relax_column_count: true }) as never;
  } catch (error) {
    const e = error as { message: string; lines?: number };
    return { records: [], isUnreadable: true, issues: [{ file, line: e.lines ?? 0, column: '', value: '', message: `not readable as CSV: ${e.message}`, expected: 'comma-separated values with a header row (RFC 4180 quoting)' }] };
  }
  const [header, ...rows] = parsed;
  if (!header) return { records: [], isUnreadable: true, issues: [{ file, line: 0, column: '', value: '', message: 'the file is empty', expected: 'a header row naming the columns' }] };
  const columns = header.record.map((c) => c.trim());
  const issues: RowIssue[] = [];
  const headerLine = startLine(header);
  const known = new Set(PART_COLUMNS);
  columns.forEach((c, i) => {
    if (!known.has(c)) issues.push({ file, line: headerLine, column: c, value: '', message: `unknown column ${i + 1}`, expected: `column names from docs/catalog-format.md: ${PART_COLUMNS.join(', ')}` });
    else if (columns.indexOf(c) !== i) issues.push({ file, line: headerLine, column: c, value: '', message: 'column named twice', expected: 'each column once' });
  });
  for (const required of ['manufacturer', 'part_number', 'kind', 'package']) {
    if (!columns.includes(required)) issues.push({ file, line: headerLine, column: required, value: '', message: 'required column missing from the header', expected: 'a header with manufacturer, part_number, kind and package at least' });
  }
  if (issues.length > 0) return { records: [], issues, isUnreadable: true };
  const records: SourceRecord[] = [];
  for (const row of rows) {
    const line = startLine(row);
    if (row.record.length !== columns.length) {
      issues.push({ file, line, column: '', value: '', message: `${row.record.length} cells where the header has ${columns.length}`, expected: 'one cell per header column (quote cells that contain commas)' });
      continue;
    }
    const cells: Record<string, string> = {};
    columns.forEach((c, i) => (cells[c] = row.record[i]!));
    records.push({ line, cells });
  }
  return { records, issues };
}

/** csv-parse reports the line a record ends on; count back over its own line breaks. */
function startLine(row: { info: { lines: number }; raw: string }): number {
  const body = row.raw.replace(/^(\r?\n)+/, '').replace(/\r?\n$/, '');
  return row.info.lines - (body.match(/\n/g)?.length ?? 0);
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
