import { PART_COLUMNS } from '../../parts/index.js';
import type { RowIssue } from '../row-issue.js';

const REQUIRED = ['manufacturer', 'part_number', 'kind', 'package'];

/** Problems with a CSV header row: unknown or repeated columns, required ones missing. */
export function checkCsvHeader(file: string, columns: readonly string[], line: number): RowIssue[] {
  const issues: RowIssue[] = [];
  const known = new Set(PART_COLUMNS);
  columns.forEach((c, i) => {
    if (!known.has(c)) issues.push({ file, line, column: c, value: '', message: `unknown column ${i + 1}`, expected: `column names from docs/catalog-format.md: ${PART_COLUMNS.join(', ')}` });
    else if (columns.indexOf(c) !== i) issues.push({ file, line, column: c, value: '', message: 'column named twice', expected: 'each column once' });
  });
  for (const required of REQUIRED) {
    if (!columns.includes(required)) issues.push({ file, line, column: required, value: '', message: 'required column missing from the header', expected: 'a header with manufacturer, part_number, kind and package at least' });
  }
  return issues;
}

export function cellCountIssue(file: string, line: number, count: number, expected: number): RowIssue {
  return { file, line, column: '', value: '', message: `${count} cells where the header has ${expected}`, expected: 'one cell per header column (quote cells that contain commas)' };
}

export function unreadableIssue(file: string, line: number, message: string): RowIssue {
  return { file, line, column: '', value: '', message: `not readable as CSV: ${message}`, expected: 'comma-separated values with a header row (RFC 4180 quoting)' };
}

export function emptyFileIssue(file: string): RowIssue {
  return { file, line: 0, column: '', value: '', message: 'the file is empty', expected: 'a header row naming the columns' };
}
