import { readFileSync } from 'node:fs';
import { findImportConflicts, recordBaselines, type ImportConflict } from './import-conflicts.js';
import type { Catalog } from './open-catalog.js';
import { readPartsText, type PartFileFormat } from './part-file.js';
import { writeParts, type WriteSummary } from './part-repository.js';
import type { RowIssue } from './row-issue.js';

/** What to do with parts changed both here and in the file. */
export type ConflictResolution = 'report' | 'keep-local' | 'overwrite-local';

export interface ImportOptions {
  /** Write the good records and report the bad ones, instead of writing nothing. */
  readonly skipInvalid?: boolean;
  /** Default 'report': refuse the import and list the conflicts. */
  readonly onConflict?: ConflictResolution;
  readonly by: string;
  readonly at?: string;
}

export type ImportResult =
  | { ok: true; records: number; written: WriteSummary; skipped: RowIssue[]; keptLocal: ImportConflict[]; overwritten: ImportConflict[] }
  | { ok: false; records: number; issues: RowIssue[] }
  | { ok: false; records: number; issues: []; conflicts: ImportConflict[] };

/**
 * Validates the whole file first; then, in one write transaction, checks for parts changed here
 * since they were last imported and writes. With one bad record (and no skipInvalid) or an
 * unresolved conflict, the catalog is not touched at all.
 */
export function importPartsText(catalog: Catalog, file: string, text: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  const reading = readPartsText(file, text, format);
  if (reading.issues.length > 0 && (!options.skipInvalid || reading.isUnreadable)) {
    return { ok: false, records: reading.records, issues: reading.issues };
  }
  const at = options.at ?? new Date().toISOString();
  const resolution = options.onConflict ?? 'report';
  const run = catalog.db.transaction(() => {
    const conflicts = findImportConflicts(catalog, reading.parts);
    if (conflicts.length > 0 && resolution === 'report') return { written: undefined, conflicts };
    const keep = new Set(resolution === 'keep-local' ? conflicts.map((c) => `${c.manufacturer}\u0000${c.partNumber}`.toLowerCase()) : []);
    const parts = reading.parts.map((p) => p.part).filter((p) => !keep.has(`${p.manufacturer}\u0000${p.partNumber}`.toLowerCase()));
    const written = writeParts(catalog, parts, { by: options.by, reason: `import of ${file}`, at });
    recordBaselines(catalog, parts, file, at);
    return { written, conflicts };
  });
  const outcome = run.immediate();
  if (outcome.written === undefined) return { ok: false, records: reading.records, issues: [], conflicts: outcome.conflicts };
  return {
    ok: true,
    records: reading.records,
    written: outcome.written,
    skipped: reading.issues,
    keptLocal: resolution === 'keep-local' ? outcome.conflicts : [],
    overwritten: resolution === 'overwrite-local' ? outcome.conflicts : [],
  };
}

export function importPartsFile(catalog: Catalog, path: string, format: PartFileFormat, options: ImportOptions): ImportResult {
  return importPartsText(catalog, path, readFileSync(path, 'utf8'), format, options);
}
