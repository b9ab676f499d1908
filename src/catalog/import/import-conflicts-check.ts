import { partDigest } from '../import-conflicts.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from '../part-rows.js';
import { rowDigest } from './row-digest.js';
import { DIGEST_AT, type SqlValue } from './row-values.js';

/** A part as the catalog holds it, with the baseline of its last import (if any). */
export interface StoredPart {
  readonly id: number;
  /** ROW_COLUMNS order. */
  readonly values: readonly SqlValue[];
  /** SHA-256 text (baselines from before migration 006), a row digest, or null when never imported. */
  readonly baseline: string | number | null;
}

export type Verdict = 'unchanged' | 'update' | 'conflict';

export function storedPartOf(row: PartRow & { id: number; import_digest: string | number | null }): StoredPart {
  return { id: row.id, values: ROW_COLUMNS.map((c) => row[c] ?? null), baseline: row.import_digest ?? null };
}

function sameContent(a: readonly SqlValue[], b: readonly SqlValue[]): boolean {
  for (let i = 0; i < ROW_COLUMNS.length; i++) if ((a[i] ?? null) !== (b[i] ?? null)) return false;
  return true;
}

/** The stored part's digest in its baseline's own form, so the two compare. */
function digestLike(stored: StoredPart): string | number {
  if (typeof stored.baseline === 'string') {
    const row: PartRow = Object.fromEntries(ROW_COLUMNS.map((c, i) => [c, stored.values[i] ?? null]));
    return partDigest(rowToPart(row));
  }
  return rowDigest(stored.values, ROW_COLUMNS.length);
}

/**
 * What an incoming row does to a stored part (docs/team-workflow.md): nothing when they are equal;
 * an update when the stored part is as it was last imported; a conflict when it was changed here
 * since (or never imported) and the file differs too.
 */
export function judgeIncoming(stored: StoredPart, incoming: readonly SqlValue[]): Verdict {
  if (sameContent(stored.values, incoming)) return 'unchanged';
  if (stored.baseline !== null && stored.baseline === digestLike(stored)) return 'update';
  return 'conflict';
}

/** The baseline an incoming row leaves behind. */
export function incomingBaseline(incoming: readonly SqlValue[]): number {
  return incoming[DIGEST_AT] as number;
}
