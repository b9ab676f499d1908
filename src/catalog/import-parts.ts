import { readFileSync, statSync } from 'node:fs';
import type { ImportConflict } from './import-conflicts.js';
import { PartWriter, type ConflictResolution } from './import/part-writer.js';
import { readJsonText } from './import/read-json-text.js';
import { readCsvText } from './import/read-csv-file.js';
import type { ReadSummary, RowBatch } from './import/row-collector.js';
import { feedCsvFile } from './import/row-feed.js';
import type { Catalog } from './open-catalog.js';
import type { PartFileFormat } from './part-file.js';
import type { WriteSummary } from './part-repository.js';
import type { RowIssue } from './row-issue.js';

export type { ConflictResolution };

export interface ImportOptions {
  /** Write the good records and report the bad ones, instead of writing nothing. */
  readonly skipInvalid?: boolean;
  /** Default 'report': refuse the import and list the conflicts. */
  readonly onConflict?: ConflictResolution;
  readonly by: string;
  readonly at?: string;
  /** Told how long each step took: reading and writing, each index, the commit (bench/import-benchmark.ts). */
  readonly trace?: (step: string, ms: number) => void;
}

export type ImportResult =
  | { ok: true; records: number; written: WriteSummary; skipped: RowIssue[]; keptLocal: ImportConflict[]; overwritten: ImportConflict[] }
  | { ok: false; records: number; issues: RowIssue[] }
  | { ok: false; records: number; issues: []; conflicts: ImportConflict[] };

/**
 * Fewest bytes a row of an export takes (44 columns, the four required ones filled), to tell from
 * a file's size how many rows it may hold before reading it: the writer's choice of path.
 */
const MIN_BYTES_PER_ROW = 100;

type Read = (onBatch: (batch: RowBatch) => void) => ReadSummary;

/**
 * Reads, checks and writes in one pass inside one write transaction (src/catalog/import/). With
 * one bad record (and no skipInvalid), an unreadable file or an unresolved conflict, the
 * transaction is rolled back and the catalog is not touched at all; every problem is reported.
 */
function runImport(catalog: Catalog, file: string, bytes: number, read: Read, options: ImportOptions): ImportResult {
  const writer = new PartWriter(catalog, {
    by: options.by,
    at: options.at ?? new Date().toISOString(),
    reason: `import of ${file}`,
    onConflict: options.onConflict ?? 'report',
    skipInvalid: options.skipInvalid === true,
    expectedRows: Math.floor(bytes / MIN_BYTES_PER_ROW),
    ...(options.trace ? { trace: options.trace } : {}),
  });
  let summary: ReadSummary;
  const started = performance.now();
  try {
    summary = read((batch) => writer.write(batch));
  } catch (error) {
    writer.abort();
    throw error;
  }
  options.trace?.('read and write rows', performance.now() - started);
  options.trace?.('  of which writing rows', writer.writeMs);
  if (summary.readMs !== undefined) options.trace?.('  reading and checking (worker thread)', summary.readMs);
  return { ...writer.finish(summary), records: summary.records };
}

export function importPartsText(catalog: Catalog, file: string, text: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  const read: Read = (onBatch) => (format === 'csv' ? readCsvText(text, file, onBatch) : readJsonText(text, file, onBatch));
  return runImport(catalog, file, text.length, read, options);
}

export function importPartsFile(catalog: Catalog, path: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  const read: Read = (onBatch) => (format === 'csv' ? feedCsvFile(path, path, onBatch) : readJsonText(readFileSync(path, 'utf8'), path, onBatch));
  return runImport(catalog, path, statSync(path).size, read, options);
}
