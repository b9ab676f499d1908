import type BetterSqlite3 from 'better-sqlite3';

/**
 * The bulk path of an import: the part table's indexes and triggers are dropped inside the write
 * transaction and created again before it commits, so other connections never see them missing
 * and a rolled-back import brings them back. Creating an index over a million rows sorts once;
 * keeping it up row by row costs several times that (bench/README.md, import). The definitions are
 * read back from the schema itself, so later migrations need nothing here.
 */
export interface SchemaRebuild {
  /** Creates the named indexes again (all remaining ones when no names are given). */
  restoreIndexes(names?: readonly string[]): void;
  /** Indexes not created again yet. */
  pendingIndexes(): string[];
  restoreTriggers(): void;
}

export function deferredRebuild(db: BetterSqlite3.Database): SchemaRebuild {
  const saved = db
    .prepare("SELECT type, name, sql FROM sqlite_schema WHERE tbl_name = 'part' AND type IN ('index', 'trigger') AND sql IS NOT NULL ORDER BY rowid")
    .all() as { type: 'index' | 'trigger'; name: string; sql: string }[];
  for (const s of saved) db.exec(`DROP ${s.type.toUpperCase()} "${s.name.replace(/"/g, '""')}"`);
  const pending = new Map(saved.filter((s) => s.type === 'index').map((s) => [s.name, s.sql]));
  return {
    restoreIndexes(names = [...pending.keys()]) {
      for (const name of names) {
        const sql = pending.get(name);
        if (sql === undefined) continue;
        db.exec(sql);
        pending.delete(name);
      }
    },
    pendingIndexes() {
      return [...pending.keys()];
    },
    restoreTriggers() {
      for (const s of saved) if (s.type === 'trigger') db.exec(s.sql);
    },
  };
}
