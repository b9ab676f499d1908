import type { Part } from '../../parts/index.js';
import { searchKey } from '../../selection/query/search-text.js';
import { ROW_COLUMNS, partToRow } from '../part-rows.js';

export type SqlValue = string | number | null;

/**
 * What an import writes per part: the part's columns (part-rows.ts), then the two it derives. The
 * digest (row-digest.ts) is left 0 by the decoders and filled in by the collector, on the reading
 * thread: the writing thread checks rows against each other instead (bench/README.md, import).
 */
export const WRITE_COLUMNS: readonly string[] = [...ROW_COLUMNS, 'search_key', 'import_digest'];
export const SEARCH_KEY_AT = ROW_COLUMNS.length;
export const DIGEST_AT = ROW_COLUMNS.length + 1;
export const MANUFACTURER_AT = ROW_COLUMNS.indexOf('manufacturer');
export const PART_NUMBER_AT = ROW_COLUMNS.indexOf('part_number');
export const APPROVAL_AT = ROW_COLUMNS.indexOf('approval');
export const APPROVAL_NOTE_AT = ROW_COLUMNS.indexOf('approval_note');

/** A part's values in WRITE_COLUMNS order. */
export function writeValuesOf(part: Part): SqlValue[] {
  const row = partToRow(part);
  const values: SqlValue[] = ROW_COLUMNS.map((c) => row[c] ?? null);
  values.push(searchKey(part.partNumber), 0);
  return values;
}

/** "maker\0number" in lower case: two spellings of one part give the same text. */
export function identityOf(manufacturer: string, partNumber: string): string {
  return `${manufacturer}\u0000${partNumber}`.toLowerCase();
}
