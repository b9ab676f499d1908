import type BetterSqlite3 from 'better-sqlite3';

/**
 * A bulk import into a (nearly) empty catalog writes through a rollback journal instead of the
 * write-ahead log. The log holds every new page once and the checkpoint copies it into the file
 * again (about 600 MB twice at a million parts); a rollback journal saves only pages that existed
 * before, which an empty catalog hardly has, so the pages go into the file once
 * (bench/README.md, import). Atomicity is the same: a process killed half-way leaves a hot journal
 * that the next open rolls back. SQLite allows the switch only while no other connection has the
 * catalog open; then the import simply keeps the log. While the journal is in use other processes
 * cannot read the catalog until the import commits (with the log they would read the old state).
 *
 * Returns the function that goes back to the log (at commit or rollback), or undefined when the
 * switch was not possible.
 */
export function useRollbackJournal(db: BetterSqlite3.Database): (() => void) | undefined {
  if (db.inTransaction || db.memory) return undefined;
  if (String(db.pragma('journal_mode', { simple: true })).toLowerCase() !== 'wal') return undefined;
  const timeout = db.pragma('busy_timeout', { simple: true }) as number;
  try {
    // Another connection open means no switch: fail at once rather than wait for it to close.
    db.pragma('busy_timeout = 0');
    if (String(db.pragma('journal_mode = DELETE', { simple: true })).toLowerCase() !== 'delete') return undefined;
  } catch (error) {
    if ((error as { code?: string }).code === 'SQLITE_BUSY') return undefined;
    throw error;
  } finally {
    db.pragma(`busy_timeout = ${timeout}`);
  }
  return () => {
    try {
      db.pragma('journal_mode = WAL');
    } catch (error) {
      // A reader arrived after the commit and kept it busy: the next open of the catalog (openCatalog) sets the log again.
      if ((error as { code?: string }).code !== 'SQLITE_BUSY') throw error;
    }
  };
}
