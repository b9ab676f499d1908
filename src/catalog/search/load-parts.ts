import type BetterSqlite3 from 'better-sqlite3';
import type { Part } from '../../parts/index.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from '../part-rows.js';

/** Whole parts for the few ids shown; turning rows into parts is the costly step, so only these. */
export function partLoader(db: BetterSqlite3.Database): (ids: readonly number[]) => Map<number, Part> {
  const select = db.prepare(`SELECT id, ${ROW_COLUMNS.join(', ')} FROM part WHERE id IN (SELECT value FROM json_each(?))`);
  return (ids) => {
    const out = new Map<number, Part>();
    if (ids.length === 0) return out;
    for (const row of select.all(JSON.stringify(ids)) as (PartRow & { id: number })[]) out.set(row.id, rowToPart(row));
    return out;
  };
}
