import { extname } from 'node:path';
import type { Part } from '../parts/index.js';
import { readCsvRecords, writeCsv, type SourceRecord } from './csv-format.js';
import { readJsonRecords, writeJson } from './json-format.js';
import { decodePartCells } from './part-cells.js';
import { comparePartIdentity } from './part-rows.js';
import type { RowIssue } from './row-issue.js';

export type PartFileFormat = 'csv' | 'json';

export function formatFromPath(path: string, explicit?: string): PartFileFormat | undefined {
  if (explicit === 'csv' || explicit === 'json') return explicit;
  if (explicit !== undefined) return undefined;
  const ext = extname(path).toLowerCase();
  return ext === '.json' ? 'json' : ext === '.csv' ? 'csv' : undefined;
}

export interface LocatedPart {
  readonly part: Part;
  readonly line: number;
}

export interface PartFileReading {
  readonly parts: LocatedPart[];
  readonly issues: RowIssue[];
  /** Records in the file, good and bad. */
  readonly records: number;
  /** True when the file as a whole is unreadable; then nothing may be imported, even with skipInvalid. */
  readonly isUnreadable: boolean;
}

/**
 * Reads and validates every record of a parts file without touching any catalog.
 * Every bad record is reported with its line, column, value and the accepted form.
 */
export function readPartsText(file: string, text: string, format: PartFileFormat): PartFileReading {
  const read = format === 'csv' ? readCsvRecords(file, text) : readJsonRecords(file, text);
  const parts: LocatedPart[] = [];
  const issues: RowIssue[] = [...read.issues];
  const firstLine = new Map<string, number>();
  for (const record of read.records) {
    const decoded = decodePartCells(record.cells, { bareTemperatureUnit: 'K' });
    if (!decoded.ok) {
      for (const i of decoded.issues) issues.push({ file, line: record.line, ...i });
      continue;
    }
    const identity = `${decoded.part.manufacturer}\u0000${decoded.part.partNumber}`.toLowerCase();
    const earlier = firstLine.get(identity);
    if (earlier !== undefined) {
      issues.push(duplicateIssue(file, record, earlier));
      continue;
    }
    firstLine.set(identity, record.line);
    parts.push({ part: decoded.part, line: record.line });
  }
    issues.sort((a, b) => a.line - b.line);
  return {
    parts,
    issues,
    records: read.records.length + new Set(read.issues.map((i) => i.line)).size,
    isUnreadable: read.isUnreadable === true,
  };
}

function duplicateIssue(file: string, record: SourceRecord, earlier: number): RowIssue {
  return {
    file,
    line: record.line,
    column: 'part_number',
    value: record.cells.part_number ?? '',
    message: `the same manufacturer and part number as line ${earlier}`,
    expected: 'each part once per file',
  };
}

/** Canonical text of a set of parts: sorted by manufacturer then part number, whatever the input order. */
export function writePartsText(parts: readonly Part[], format: PartFileFormat): string {
  const sorted = [...parts].sort(comparePartIdentity);
  return format === 'csv' ? writeCsv(sorted) : writeJson(sorted);
}
