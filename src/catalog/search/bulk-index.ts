import type BetterSqlite3 from 'better-sqlite3';

// Below this many parts the triggers index each row; above it one statement at the end is
// several times cheaper (bench/README.md, import benchmark).
const BULK_MIN_PARTS = 200;

/**
 * Call inside a write transaction that adds many parts; call the function it returns before
 * the transaction ends. Meanwhile the search triggers skip the new rows (migrations 004, 006), and
 * the returned function indexes them all in one statement. If the transaction rolls back, so
 * does the deferral. Nested calls, small writes and catalogs without the table do nothing.
 */
export function deferSearchIndex(db: BetterSqlite3.Database, partCount: number): () => void {
  if (partCount < BULK_MIN_PARTS) return () => {};
  const hasTable = db.prepare("SELECT 1 FROM sqlite_schema WHERE name = 'part_search_deferral'").get();
  if (!hasTable || db.prepare('SELECT 1 FROM part_search_deferral').get()) return () => {};
  const afterId = db.prepare('SELECT coalesce(max(id), 0) FROM part').pluck().get() as number;
  db.prepare('INSERT INTO part_search_deferral (after_id) VALUES (?)').run(afterId);
  return () => {
    db.prepare('INSERT INTO part_search (rowid, key) SELECT id, search_key FROM part WHERE id > ?').run(afterId);
    db.prepare('DELETE FROM part_search_deferral').run();
  };
}
