import type BetterSqlite3 from 'better-sqlite3';
import type { ImportConflict } from '../import-conflicts.js';
import type { Catalog } from '../open-catalog.js';
import { ROW_COLUMNS, type PartRow } from '../part-rows.js';
import type { WriteSummary } from '../part-repository.js';
import type { RowIssue } from '../row-issue.js';
import { addFieldValues } from './field-values.js';
import { judgeIncoming, storedPartOf, type StoredPart } from './import-conflicts-check.js';
import { shapeRowDigest } from './row-digest.js';
import { deferSearchIndex } from '../search/bulk-index.js';
import { deferredRebuild, type SchemaRebuild } from './schema-rebuild.js';
import type { ReadSummary, RowBatch, RowGroup } from './row-collector.js';
import {
  APPROVAL_AT,
  APPROVAL_NOTE_AT,
  DIGEST_AT,
  MANUFACTURER_AT,
  PART_NUMBER_AT,
  WRITE_COLUMNS,
  identityOf,
  type SqlValue,
} from './row-values.js';

export type ConflictResolution = 'report' | 'keep-local' | 'overwrite-local';

export interface WriterOptions {
  readonly by: string;
  readonly at: string;
  readonly reason: string;
  readonly onConflict: ConflictResolution;
  readonly skipInvalid: boolean;
  /** About how many rows the file holds (from its size): large imports into small catalogs take the bulk path. */
  readonly expectedRows: number;
  /** Told the time each step took (bench/import-benchmark.ts). */
  readonly trace?: (step: string, ms: number) => void;
}

export type WriteOutcome =
  | { ok: true; written: WriteSummary; skipped: RowIssue[]; keptLocal: ImportConflict[]; overwritten: ImportConflict[] }
  | { ok: false; issues: RowIssue[] }
  | { ok: false; issues: []; conflicts: ImportConflict[] };

// Below this many rows the indexes are kept up row by row; above it, if the catalog holds no more
// parts than the file, they are dropped and built again once (bench/README.md, import).
const BULK_MIN_ROWS = 20_000;
// Parts read into memory to check the file's rows against, on the bulk path.
const BULK_MAX_EXISTING = 200_000;
// Rows the bulk path adds to the full-text index at a time.
const SEARCH_INDEX_ROWS = 250_000;

const EVENT_SQL = `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason, part_id) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)`;
const STORED_SQL = `SELECT id, ${ROW_COLUMNS.join(', ')}, import_digest FROM part`;

const sqlText = (s: string) => `'${s.replace(/'/g, "''")}'`;

/**
 * Writes an import's rows as they are read, inside one write transaction: other connections see
 * all of it at commit or nothing (a process killed half-way leaves the catalog as it was). A bad
 * row (without skipInvalid) or an unresolved conflict stops the writing; finish() then rolls back
 * and reports every problem the reading found.
 */
export class PartWriter {
  private readonly db: BetterSqlite3.Database;
  private readonly shapes: number[][] = [];
  private readonly statements = new Map<string, BetterSqlite3.Statement>();
  private readonly issues: RowIssue[] = [];
  private readonly conflicts: ImportConflict[] = [];
  private readonly keptLocal: ImportConflict[] = [];
  private readonly overwritten: ImportConflict[] = [];
  private added = 0;
  private updated = 0;
  private unchanged = 0;
  private isStopped = false;
  private isOpen = true;
  private readonly maxIdBefore: number;
  /** Bulk path: indexes and triggers dropped until finish(); the catalog's parts held here. */
  private readonly rebuild: SchemaRebuild | undefined;
  private readonly stored: Map<string, StoredPart> | undefined;
  private readonly finishSearchIndex: () => void;
  private readonly find: BetterSqlite3.Statement;
  private readonly event: BetterSqlite3.Statement;

  constructor(
    catalog: Catalog,
    private readonly options: WriterOptions,
  ) {
    this.db = catalog.db;
    this.db.exec('BEGIN IMMEDIATE');
    try {
      this.maxIdBefore = this.db.prepare('SELECT coalesce(max(id), 0) FROM part').pluck().get() as number;
      const existing = this.db.prepare('SELECT count(*) FROM part').pluck().get() as number;
      // expectedRows overestimates about twofold: bulk when the catalog is small beside the file.
      const isBulk = options.expectedRows >= BULK_MIN_ROWS && existing <= Math.min(options.expectedRows / 4, BULK_MAX_EXISTING);
      this.find = this.db.prepare(`${STORED_SQL} WHERE part_number = ? COLLATE NOCASE AND manufacturer = ? COLLATE NOCASE`);
      this.event = this.db.prepare(EVENT_SQL);
      if (isBulk) {
        this.stored = new Map();
        for (const row of this.db.prepare(STORED_SQL).iterate() as Iterable<PartRow & { id: number; import_digest: string | number | null }>) {
          this.stored.set(identityOf(String(row.manufacturer), String(row.part_number)), storedPartOf(row));
        }
        this.rebuild = deferredRebuild(this.db);
        this.finishSearchIndex = () => {};
      } else {
        this.finishSearchIndex = deferSearchIndex(this.db, Number.MAX_SAFE_INTEGER);
      }
    } catch (error) {
      this.db.exec('ROLLBACK');
      throw error;
    }
  }

  /** Time spent in write(), for the benchmark's phase figures. */
  writeMs = 0;

  write(batch: RowBatch): void {
    const started = performance.now();
    try {
      this.writeBatch(batch);
    } finally {
      this.writeMs += performance.now() - started;
    }
  }

  private writeBatch(batch: RowBatch): void {
    for (const columns of batch.newShapes) this.shapes.push(columns);
    if (batch.issues.length > 0) {
      this.issues.push(...batch.issues);
      if (!this.options.skipInvalid) this.isStopped = true;
    }
    if (this.isStopped) return;
    for (const group of batch.groups) this.writeGroup(group);
    if (this.rebuild) this.indexNewRows();
  }

  /** Last row ids whose trail entry and full-text entry are written (bulk path). */
  private trailUpTo = 0;
  private searchUpTo = 0;

  /**
   * The bulk path's trail and full-text entries for the rows added so far, in row order (both
   * grow at their ends), while the reader works on. The trail takes every batch; the full-text
   * index a quarter million rows at a time, because FTS5 starts a segment at every statement and
   * merging hundreds of them cost more than the inserts (bench/README.md, import).
   */
  private indexNewRows(isLast = false): void {
    const to = this.db.prepare('SELECT coalesce(max(id), 0) FROM part').pluck().get() as number;
    const trailFrom = Math.max(this.trailUpTo, this.maxIdBefore);
    if (to > trailFrom) {
      // Each entry names its part's row: the trail's part_id index grows at its end (migration 006).
      this.statement(
        `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason, part_id)
         SELECT manufacturer, part_number, ?, ?, NULL, approval, approval_note, ?, id FROM part WHERE id > ? AND id <= ? ORDER BY id`,
      ).run(this.options.at, this.options.by, this.options.reason, trailFrom, to);
      this.trailUpTo = to;
    }
    const searchFrom = Math.max(this.searchUpTo, this.maxIdBefore);
    if (to > searchFrom && (isLast || to - searchFrom >= SEARCH_INDEX_ROWS)) {
      this.statement('INSERT INTO part_search (rowid, key) SELECT id, search_key FROM part WHERE id > ? AND id <= ?').run(searchFrom, to);
      this.searchUpTo = to;
    }
  }

  private writeGroup(group: RowGroup): void {
    const columns = this.shapes[group.shape]!;
    const width = columns.length;
    const rows = group.lines.length;
    // The rows' baselines (row-values.ts): each row's digest slot, computed here.
    const digestSlot = columns.indexOf(DIGEST_AT);
    for (let r = 0, offset = 0; r < rows; r++, offset += width) group.values[offset + digestSlot] = shapeRowDigest(columns, group.values, offset, ROW_COLUMNS.length);
    if (this.stored !== undefined && this.conflicts.length === 0 && !this.matchesStored(group, columns)) {
      // Only new parts (always so in an empty catalog): the whole group in one statement.
      this.insertStatement(group.shape, rows).run(group.values);
      this.added += rows;
      return;
    }
    for (let r = 0; r < rows && !this.isStopped; r++) {
      const values: SqlValue[] = new Array<SqlValue>(WRITE_COLUMNS.length).fill(null);
      for (let k = 0; k < width; k++) values[columns[k]!] = group.values[r * width + k]!;
      this.writeRow(values, group.lines[r]!, group.shape, group.values.slice(r * width, (r + 1) * width));
    }
  }

  private matchesStored(group: RowGroup, columns: readonly number[]): boolean {
    if (this.stored!.size === 0) return false;
    const m = columns.indexOf(MANUFACTURER_AT);
    const p = columns.indexOf(PART_NUMBER_AT);
    for (let r = 0, at = 0; r < group.lines.length; r++, at += columns.length) {
      if (this.stored!.has(identityOf(group.values[at + m] as string, group.values[at + p] as string))) return true;
    }
    return false;
  }

  private writeRow(values: SqlValue[], line: number, shape: number, shapeValues: SqlValue[]): void {
    const manufacturer = values[MANUFACTURER_AT] as string;
    const partNumber = values[PART_NUMBER_AT] as string;
    const stored = this.stored ? this.stored.get(identityOf(manufacturer, partNumber)) : this.lookUp(manufacturer, partNumber);
    // After a conflict to report nothing is written; the rest of the file is still checked for more.
    const isWriting = this.conflicts.length === 0;
    if (!stored) {
      if (!isWriting) return;
      const { lastInsertRowid } = this.insertStatement(shape, 1).run(shapeValues);
      if (!this.rebuild) this.event.run(manufacturer, partNumber, this.options.at, this.options.by, null, values[APPROVAL_AT], values[APPROVAL_NOTE_AT], this.options.reason, lastInsertRowid);
      this.added++;
      return;
    }
    const verdict = judgeIncoming(stored, values);
    if (verdict === 'conflict') {
      const conflict: ImportConflict = { manufacturer, partNumber, isLocalOnly: stored.baseline === null, line };
      if (this.options.onConflict === 'report') {
        this.conflicts.push(conflict);
        return;
      }
      if (this.options.onConflict === 'keep-local') {
        this.keptLocal.push(conflict);
        return;
      }
      this.overwritten.push(conflict);
    }
    if (!isWriting) return;
    if (verdict === 'unchanged') {
      this.unchanged++;
      if (stored.baseline !== values[DIGEST_AT]) this.statement('UPDATE part SET import_digest = ? WHERE id = ?').run(values[DIGEST_AT], stored.id);
      return;
    }
    this.update(stored, values);
    this.updated++;
  }

  private lookUp(manufacturer: string, partNumber: string): StoredPart | undefined {
    const row = this.find.get(partNumber, manufacturer) as (PartRow & { id: number; import_digest: string | number | null }) | undefined;
    return row ? storedPartOf(row) : undefined;
  }

  private update(stored: StoredPart, values: SqlValue[]): void {
    // The part number only when its letter case changed: naming it wakes the key triggers.
    const columns = ROW_COLUMNS.filter((c, i) => i !== PART_NUMBER_AT || stored.values[i] !== values[i]);
    const sql = `UPDATE part SET ${columns.map((c) => `${c} = ?`).join(', ')}, updated_at = ?, import_digest = ? WHERE id = ?`;
    this.statement(sql).run(...columns.map((c) => values[ROW_COLUMNS.indexOf(c)]), this.options.at, values[DIGEST_AT], stored.id);
    const approval = stored.values[APPROVAL_AT];
    if (approval !== values[APPROVAL_AT] || (stored.values[APPROVAL_NOTE_AT] ?? null) !== (values[APPROVAL_NOTE_AT] ?? null)) {
      this.event.run(values[MANUFACTURER_AT], values[PART_NUMBER_AT], this.options.at, this.options.by, approval, values[APPROVAL_AT], values[APPROVAL_NOTE_AT], this.options.reason, stored.id);
    }
  }

  private statement(sql: string): BetterSqlite3.Statement {
    let s = this.statements.get(sql);
    if (!s) this.statements.set(sql, (s = this.db.prepare(sql)));
    return s;
  }

  private insertStatement(shape: number, rows: number): BetterSqlite3.Statement {
    const key = `${shape}:${rows}`;
    let s = this.statements.get(key);
    if (!s) {
      const columns = this.shapes[shape]!.map((c) => WRITE_COLUMNS[c]!);
      const one = `(${columns.map(() => '?').join(', ')}, ${sqlText(this.options.at)})`;
      s = this.db.prepare(`INSERT INTO part (${columns.join(', ')}, updated_at) VALUES ${Array.from({ length: rows }, () => one).join(', ')}`);
      this.statements.set(key, s);
    }
    return s;
  }

  /** Commits what was written, or rolls it all back and says why. */
  finish(summary: ReadSummary): WriteOutcome {
    const issues = [...this.issues].sort((a, b) => a.line - b.line);
    if (summary.isUnreadable || (issues.length > 0 && !this.options.skipInvalid)) {
      this.abort();
      return { ok: false, issues };
    }
    if (this.conflicts.length > 0) {
      this.abort();
      return { ok: false, issues: [], conflicts: this.conflicts };
    }
    const step = stepTimer(this.options.trace);
    try {
      if (this.rebuild) {
        // part_identity first: creating it is also the last check that no part came twice.
        for (const name of ['part_identity', ...this.rebuild.pendingIndexes().filter((n) => n !== 'part_identity')]) {
          this.rebuild.restoreIndexes([name]);
          step(`index ${name}`);
        }
        this.indexNewRows(true);
        step('full-text index (last rows)');
        addFieldValues(this.db, summary.fieldValues);
        this.rebuild.restoreTriggers();
        step('field values, triggers');
      } else {
        this.finishSearchIndex();
        step('full-text index');
      }
      this.db.exec('COMMIT');
      step('commit');
      this.isOpen = false;
    } catch (error) {
      this.abort();
      throw error;
    }
    return {
      ok: true,
      written: { added: this.added, updated: this.updated, unchanged: this.unchanged },
      skipped: issues,
      keptLocal: this.keptLocal,
      overwritten: this.overwritten,
    };
  }

  /** Leaves the catalog as it was. */
  abort(): void {
    if (!this.isOpen) return;
    this.isOpen = false;
    if (this.db.inTransaction) this.db.exec('ROLLBACK');
  }
}

/** Reports the time since the last call under each step's name. */
function stepTimer(trace: WriterOptions['trace']): (name: string) => void {
  let last = performance.now();
  return (name) => {
    const now = performance.now();
    trace?.(name, now - last);
    last = now;
  };
}
