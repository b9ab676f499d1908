import { readFileSync } from 'node:fs';
import type { Catalog } from './open-catalog.js';
import { readPartsText, type PartFileFormat } from './part-file.js';
import { writeParts, type WriteSummary } from './part-repository.js';
import type { RowIssue } from './row-issue.js';

export interface ImportOptions {
  /** Write the good records and report the bad ones, instead of writing nothing. */
  readonly skipInvalid?: boolean;
  readonly by: string;
  readonly at?: string;
}

export type ImportResult =
  | { ok: true; records: number; written: WriteSummary; skipped: RowIssue[] }
  | { ok: false; records: number; issues: RowIssue[] };

/**
 * Validates the whole file first; only then writes, in one transaction. With one bad
 * record and no skipInvalid, the catalog is not touched at all.
 */
export function importPartsText(catalog: Catalog, file: string, text: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  const reading = readPartsText(file, text, format);
  if (reading.issues.length > 0 && (!options.skipInvalid || reading.isUnreadable)) {
    return { ok: false, records: reading.records, issues: reading.issues };
  }
  const written = writeParts(
    catalog,
    reading.parts.map((p) => p.part),
    { by: options.by, reason: `import of ${file}`, ...(options.at ? { at: options.at } : {}) },
  );
  return { ok: true, records: reading.records, written, skipped: reading.issues };
}

export function importPartsFile(catalog: Catalog, path: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  return importPartsText(catalog, path, readFileSync(path, 'utf8'), format, options);
}
