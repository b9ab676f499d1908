import type BetterSqlite3 from 'better-sqlite3';
import { ROW_COLUMNS, type PartRow } from '../part-rows.js';
import { storedPartOf, type StoredPart } from './import-conflicts-check.js';
import { PART_NUMBER_AT, WRITE_COLUMNS, type SqlValue } from './row-values.js';
import { IDENTITY_WHERE, identityParams } from '../identity-sql.js';

const STORED_SQL = `SELECT id, ${ROW_COLUMNS.join(', ')}, import_digest FROM part`;
const EVENT_SQL = `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason, part_id) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)`;

const sqlText = (s: string) => `'${s.replace(/'/g, "''")}'`;

type StoredRow = PartRow & { id: number; import_digest: string | number | null };

/** The statements an import writes with, each prepared once. */
export class WriteStatements {
  private readonly cache = new Map<string, BetterSqlite3.Statement>();

  constructor(
    private readonly db: BetterSqlite3.Database,
    /** The import's time, written into every row it adds or changes. */
    private readonly at: string,
  ) {}

  get(sql: string): BetterSqlite3.Statement {
    let s = this.cache.get(sql);
    if (!s) this.cache.set(sql, (s = this.db.prepare(sql)));
    return s;
  }

  /** Statements by shape (its columns array) and number of rows. */
  private readonly inserts = new WeakMap<readonly number[], Map<number, BetterSqlite3.Statement>>();

  /** Inserts `rows` rows that fill `columns` (WRITE_COLUMNS positions), binding only those. */
  insert(columns: readonly number[], rows: number): BetterSqlite3.Statement {
    let byRows = this.inserts.get(columns);
    if (!byRows) this.inserts.set(columns, (byRows = new Map()));
    let s = byRows.get(rows);
    if (!s) {
      const names = columns.map((c) => WRITE_COLUMNS[c]!);
      const one = `(${names.map(() => '?').join(', ')}, ${sqlText(this.at)})`;
      byRows.set(rows, (s = this.db.prepare(`INSERT INTO part (${names.join(', ')}, updated_at) VALUES ${Array.from({ length: rows }, () => one).join(', ')}`)));
    }
    return s;
  }

  event(): BetterSqlite3.Statement {
    return this.get(EVENT_SQL);
  }

  /** The stored part with this maker and part number, letter case ignored (part_key). */
  find(manufacturer: string, partNumber: string): StoredPart | undefined {
    const row = this.get(`${STORED_SQL} WHERE ${IDENTITY_WHERE}`).get(...identityParams(manufacturer, partNumber)) as StoredRow | undefined;
    return row ? storedPartOf(row) : undefined;
  }

  /** Every stored part, for the bulk path's small catalogs. */
  all(): Iterable<StoredPart> {
    const rows = this.get(STORED_SQL).iterate() as Iterable<StoredRow>;
    return (function* () {
      for (const row of rows) yield storedPartOf(row);
    })();
  }

  /** Rewrites a stored part with a row's values and baseline. */
  update(stored: StoredPart, values: readonly SqlValue[], digest: SqlValue): void {
    // The part number only when its letter case changed: naming it wakes the key triggers.
    const columns = ROW_COLUMNS.filter((_, i) => i !== PART_NUMBER_AT || stored.values[i] !== values[i]);
    const sql = `UPDATE part SET ${columns.map((c) => `${c} = ?`).join(', ')}, updated_at = ?, import_digest = ? WHERE id = ?`;
    this.get(sql).run(...columns.map((c) => values[ROW_COLUMNS.indexOf(c)]), this.at, digest, stored.id);
  }
}
