import type BetterSqlite3 from 'better-sqlite3';

/**
 * Columns whose words a search finds through part_field_value (migration 006): few distinct
 * values each, so a typed word is matched against the values, not against every part.
 */
export const FIELD_VALUE_COLUMNS = ['manufacturer', 'package', 'kind', 'description'] as const;

/** Adds values a bulk write brought in (the table's triggers are off while it runs). */
export function addFieldValues(db: BetterSqlite3.Database, values: Readonly<Record<string, readonly string[]>>): void {
  const insert = db.prepare('INSERT OR IGNORE INTO part_field_value (field, value) VALUES (?, ?)');
  for (const field of FIELD_VALUE_COLUMNS) for (const value of values[field] ?? []) insert.run(field, value);
}
