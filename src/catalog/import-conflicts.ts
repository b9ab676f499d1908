import { createHash } from 'node:crypto';
import { PART_COLUMNS, type Part } from '../parts/index.js';
import { encodePartCells } from './part-cells.js';

/** A part changed here since it last came in from a file, which the file would now overwrite. */
export interface ImportConflict {
  readonly manufacturer: string;
  readonly partNumber: string;
  /** True when this catalog has no record of importing the part (it was added or edited here). */
  readonly isLocalOnly: boolean;
  readonly line: number;
}

/**
 * The import baseline as catalogs before migration 006 kept it: SHA-256 of the exported cells.
 * Those baselines are still compared in this form; new ones are row digests (import/row-digest.ts).
 */
export function partDigest(part: Part): string {
  const cells = encodePartCells(part);
  return createHash('sha256').update(PART_COLUMNS.map((c) => cells[c] ?? '').join('\u001f')).digest('hex');
}
