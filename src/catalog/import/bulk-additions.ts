import type { WriteStatements } from './write-statements.js';

// Rows the bulk path adds to the full-text index at a time: few enough segments to merge, and a
// short last step (the rows indexed after the reader has finished wait on this thread alone).
const SEARCH_INDEX_ROWS = 100_000;

/**
 * The bulk path's approval trail entries and full-text entries for the parts it added (ids above
 * `maxIdBefore`), in row order so both grow at their ends, written while the reader works on. The
 * trail takes every batch; the full-text index a hundred thousand rows at a time, because FTS5
 * starts a segment at every statement and merging hundreds of them cost more than the inserts
 * (bench/README.md, import). Each trail entry names its part's row (part_id, migration 006).
 */
export class BulkAdditions {
  private trailUpTo: number;
  private searchUpTo: number;

  constructor(
    private readonly statements: WriteStatements,
    maxIdBefore: number,
    private readonly entry: { readonly at: string; readonly by: string; readonly reason: string },
  ) {
    this.trailUpTo = maxIdBefore;
    this.searchUpTo = maxIdBefore;
  }

  /** Catches up with the rows written so far; `isLast` for the final rows of the import. */
  add(isLast = false): void {
    const to = this.statements.get('SELECT coalesce(max(id), 0) FROM part').pluck().get() as number;
    if (to > this.trailUpTo) {
      this.statements
        .get(
          `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason, part_id)
           SELECT manufacturer, part_number, ?, ?, NULL, approval, approval_note, ?, id FROM part WHERE id > ? AND id <= ? ORDER BY id`,
        )
        .run(this.entry.at, this.entry.by, this.entry.reason, this.trailUpTo, to);
      this.trailUpTo = to;
    }
    if (to > this.searchUpTo && (isLast || to - this.searchUpTo >= SEARCH_INDEX_ROWS)) {
      this.statements.get('INSERT INTO part_search (rowid, key) SELECT id, search_key FROM part WHERE id > ? AND id <= ?').run(this.searchUpTo, to);
      this.searchUpTo = to;
    }
  }
}
