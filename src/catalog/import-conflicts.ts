import { createHash } from 'node:crypto';
import { PART_COLUMNS, type Part } from '../parts/index.js';
import type { Catalog } from './open-catalog.js';
import { encodePartCells } from './part-cells.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from './part-rows.js';

/** A part changed here since it last came in from a file, which the file would now overwrite. */
export interface ImportConflict {
  readonly manufacturer: string;
  readonly partNumber: string;
  /** True when this catalog has no record of importing the part (it was added or edited here). */
  readonly isLocalOnly: boolean;
  readonly line: number;
}

export function partDigest(part: Part): string {
  const cells = encodePartCells(part);
  return createHash('sha256').update(PART_COLUMNS.map((c) => cells[c] ?? '').join('\u001f')).digest('hex');
}

/**
 * Parts that both the file and this catalog changed: the catalog's row differs from what was
 * last imported (or was never imported), and the file's row differs from the catalog's.
 * Run inside the import's write transaction, so nothing can change between check and write.
 */
export function findImportConflicts(catalog: Catalog, incoming: readonly { part: Part; line: number }[]): ImportConflict[] {
  const current = catalog.db.prepare(
    `SELECT ${ROW_COLUMNS.join(', ')} FROM part WHERE manufacturer = ? COLLATE NOCASE AND part_number = ? COLLATE NOCASE`,
  );
  const baseline = catalog.db.prepare('SELECT row_digest FROM import_baseline WHERE manufacturer = ? COLLATE NOCASE AND part_number = ? COLLATE NOCASE');
  const conflicts: ImportConflict[] = [];
  for (const { part, line } of incoming) {
    const row = current.get(part.manufacturer, part.partNumber) as PartRow | undefined;
    if (!row) continue;
    const localDigest = partDigest(rowToPart(row));
    if (localDigest === partDigest(part)) continue;
    const base = baseline.get(part.manufacturer, part.partNumber) as { row_digest: string } | undefined;
    if (base?.row_digest === localDigest) continue; // unchanged here since the last import: safe to update
    conflicts.push({ manufacturer: part.manufacturer, partNumber: part.partNumber, isLocalOnly: base === undefined, line });
  }
  return conflicts;
}

export function recordBaselines(catalog: Catalog, parts: readonly Part[], source: string, at: string): void {
  const upsert = catalog.db.prepare(
    `INSERT INTO import_baseline (manufacturer, part_number, row_digest, source, imported_at) VALUES (?, ?, ?, ?, ?)
     ON CONFLICT (manufacturer COLLATE NOCASE, part_number COLLATE NOCASE) DO UPDATE
     SET row_digest = excluded.row_digest, source = excluded.source, imported_at = excluded.imported_at`,
  );
  for (const p of parts) upsert.run(p.manufacturer, p.partNumber, partDigest(p), source, at);
}
