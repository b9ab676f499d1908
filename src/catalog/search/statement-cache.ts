import type BetterSqlite3 from 'better-sqlite3';

// Queries differ only in which filters they carry, so a few dozen shapes cover real use.
const MAX_STATEMENTS = 200;

/** Prepares each distinct SQL text once per connection. */
export function statementCache(db: BetterSqlite3.Database): (sql: string) => BetterSqlite3.Statement {
  const cache = new Map<string, BetterSqlite3.Statement>();
  return (sql) => {
    let statement = cache.get(sql);
    if (!statement) {
      if (cache.size >= MAX_STATEMENTS) cache.clear();
      statement = db.prepare(sql);
      cache.set(sql, statement);
    }
    return statement;
  };
}
