import type BetterSqlite3 from 'better-sqlite3';
import { availableParallelism } from 'node:os';
import type { ImportConflict } from '../import-conflicts.js';
import type { Catalog } from '../open-catalog.js';
import { ROW_COLUMNS } from '../part-rows.js';
import type { WriteSummary } from '../part-repository.js';
import type { RowIssue } from '../row-issue.js';
import { deferSearchIndex } from '../search/bulk-index.js';
import { BulkAdditions } from './bulk-additions.js';
import { addFieldValues } from './field-values.js';
import { judgeIncoming, type StoredPart } from './import-conflicts-check.js';
import type { ReadSummary, RowBatch, RowGroup } from './row-collector.js';
import { APPROVAL_AT, APPROVAL_NOTE_AT, DIGEST_AT, MANUFACTURER_AT, PART_NUMBER_AT, WRITE_COLUMNS, identityOf, type SqlValue } from './row-values.js';
import { useRollbackJournal } from './rollback-journal.js';
import { deferredRebuild, type SchemaRebuild } from './schema-rebuild.js';
import { WriteStatements } from './write-statements.js';

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

// Below this many rows the indexes are kept up row by row; above it, if the catalog holds few parts
// beside the file, they are dropped and built again once (bench/README.md, import).
const BULK_MIN_ROWS = 20_000;
// Parts read into memory to check the file's rows against, on the bulk path.
const BULK_MAX_EXISTING = 200_000;

/** The bulk path: indexes and triggers dropped until finish(), the catalog's few parts held here. */
interface Bulk {
  readonly rebuild: SchemaRebuild;
  readonly stored: Map<string, StoredPart>;
  readonly additions: BulkAdditions;
}

/**
 * Writes an import's rows as they are read, inside one write transaction: other connections see
 * all of it at commit or nothing (a process killed half-way leaves the catalog as it was). A bad
 * row (without skipInvalid) or an unresolved conflict stops the writing; finish() then rolls back
 * and reports every problem the reading found.
 */
export class PartWriter {
  private readonly db: BetterSqlite3.Database;
  private readonly statements: WriteStatements;
  private readonly shapes: number[][] = [];
  private readonly issues: RowIssue[] = [];
  private readonly conflicts: ImportConflict[] = [];
  private readonly keptLocal: ImportConflict[] = [];
  private readonly overwritten: ImportConflict[] = [];
  private added = 0;
  private updated = 0;
  private unchanged = 0;
  private isStopped = false;
  private isOpen = true;
  private readonly bulk: Bulk | undefined;
  private readonly finishSearchIndex: () => void = () => {};
  /** Back to the write-ahead log after a bulk import (rollback-journal.ts). */
  private readonly restoreJournal: (() => void) | undefined;
  /** Time spent in write(), for the benchmark's phase figures. */
  writeMs = 0;

  constructor(
    catalog: Catalog,
    private readonly options: WriterOptions,
  ) {
    this.db = catalog.db;
    this.statements = new WriteStatements(this.db, options.at);
    const countParts = () => this.db.prepare('SELECT count(*) FROM part').pluck().get() as number;
    // expectedRows overestimates about twofold: bulk when the catalog is small beside the file.
    const isBulk = (existing: number) => options.expectedRows >= BULK_MIN_ROWS && existing <= Math.min(options.expectedRows / 4, BULK_MAX_EXISTING);
    // The journal can only change outside a transaction: decided on the count before it, checked again inside.
    if (options.expectedRows >= BULK_MIN_ROWS && isBulk(countParts())) this.restoreJournal = useRollbackJournal(this.db);
    this.db.exec('BEGIN IMMEDIATE');
    try {
      const maxIdBefore = this.db.prepare('SELECT coalesce(max(id), 0) FROM part').pluck().get() as number;
      if (isBulk(countParts())) {
        const stored = new Map<string, StoredPart>();
        for (const part of this.statements.all()) stored.set(identityOf(String(part.values[MANUFACTURER_AT]), String(part.values[PART_NUMBER_AT])), part);
        this.bulk = { rebuild: deferredRebuild(this.db), stored, additions: new BulkAdditions(this.statements, maxIdBefore, options) };
      } else {
        this.finishSearchIndex = deferSearchIndex(this.db, Number.MAX_SAFE_INTEGER);
      }
    } catch (error) {
      this.db.exec('ROLLBACK');
      this.restoreJournal?.();
      throw error;
    }
  }

  write(batch: RowBatch): void {
    const started = performance.now();
    try {
      for (const columns of batch.newShapes) this.shapes.push(columns);
      if (batch.issues.length > 0) {
        this.issues.push(...batch.issues);
        if (!this.options.skipInvalid) this.isStopped = true;
      }
      if (this.isStopped) return;
      for (const group of batch.groups) this.writeGroup(group);
      this.bulk?.additions.add();
    } finally {
      this.writeMs += performance.now() - started;
    }
  }

  private writeGroup(group: RowGroup): void {
    const columns = this.shapes[group.shape]!;
    const width = columns.length;
    const rows = group.lines.length;
    if (this.bulk && this.conflicts.length === 0 && !this.matchesStored(group, columns)) {
      // Only new parts (always so in an empty catalog): the whole group in one statement.
      this.statements.insert(columns, rows).run(group.values);
      this.added += rows;
      return;
    }
    for (let r = 0; r < rows && !this.isStopped; r++) {
      const values: SqlValue[] = new Array<SqlValue>(WRITE_COLUMNS.length).fill(null);
      for (let k = 0; k < width; k++) values[columns[k]!] = group.values[r * width + k]!;
      this.writeRow(values, group.lines[r]!, columns, group.values.slice(r * width, (r + 1) * width));
    }
  }

  private matchesStored(group: RowGroup, columns: readonly number[]): boolean {
    if (this.bulk!.stored.size === 0) return false;
    const m = columns.indexOf(MANUFACTURER_AT);
    const p = columns.indexOf(PART_NUMBER_AT);
    for (let r = 0, at = 0; r < group.lines.length; r++, at += columns.length) {
      if (this.bulk!.stored.has(identityOf(group.values[at + m] as string, group.values[at + p] as string))) return true;
    }
    return false;
  }

  private writeRow(values: SqlValue[], line: number, columns: readonly number[], shapeValues: SqlValue[]): void {
    const manufacturer = values[MANUFACTURER_AT] as string;
    const partNumber = values[PART_NUMBER_AT] as string;
    const stored = this.bulk ? this.bulk.stored.get(identityOf(manufacturer, partNumber)) : this.statements.find(manufacturer, partNumber);
    // After a conflict to report nothing is written; the rest of the file is still checked for more.
    const isWriting = this.conflicts.length === 0;
    if (!stored) {
      if (!isWriting) return;
      const { lastInsertRowid } = this.statements.insert(columns, 1).run(shapeValues);
      // The bulk path writes its trail entries batch by batch (bulk-additions.ts).
      if (!this.bulk) this.event(values, null, lastInsertRowid);
      this.added++;
      return;
    }
    const verdict = judgeIncoming(stored, values);
    if (verdict === 'conflict') {
      const conflict: ImportConflict = { manufacturer, partNumber, isLocalOnly: stored.baseline === null, line };
      if (this.options.onConflict === 'report') return void this.conflicts.push(conflict);
      if (this.options.onConflict === 'keep-local') return void this.keptLocal.push(conflict);
      this.overwritten.push(conflict);
    }
    if (!isWriting) return;
    if (verdict === 'unchanged') {
      this.unchanged++;
      if (stored.baseline !== values[DIGEST_AT]) this.statements.get('UPDATE part SET import_digest = ? WHERE id = ?').run(values[DIGEST_AT], stored.id);
      return;
    }
    this.statements.update(stored, values, values[DIGEST_AT]!);
    const approval = stored.values[APPROVAL_AT];
    if (approval !== values[APPROVAL_AT] || (stored.values[APPROVAL_NOTE_AT] ?? null) !== (values[APPROVAL_NOTE_AT] ?? null)) this.event(values, approval ?? null, stored.id);
    this.updated++;
  }

  private event(values: readonly SqlValue[], from: SqlValue, partId: number | bigint): void {
    const { at, by, reason } = this.options;
    this.statements.event().run(values[MANUFACTURER_AT], values[PART_NUMBER_AT], at, by, from, values[APPROVAL_AT], values[APPROVAL_NOTE_AT], reason, partId);
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
      if (this.bulk) {
        const { rebuild, additions } = this.bulk;
        // The reader has finished: SQLite may sort on the other cores while it builds the indexes.
        const threads = this.db.pragma('threads', { simple: true }) as number;
        this.db.pragma(`threads = ${Math.max(threads, availableParallelism() - 1)}`);
        // part_key first: creating it is also the last check that no part came twice.
        for (const name of ['part_key', ...rebuild.pendingIndexes().filter((n) => n !== 'part_key')]) {
          rebuild.restoreIndexes([name]);
          step(`index ${name}`);
        }
        this.db.pragma(`threads = ${threads}`);
        additions.add(true);
        step('full-text index (last rows)');
        addFieldValues(this.db, summary.fieldValues);
        rebuild.restoreTriggers();
        step('field values, triggers');
      } else {
        this.finishSearchIndex();
        step('full-text index');
      }
      this.db.exec('COMMIT');
      step('commit');
      this.isOpen = false;
      this.restoreJournal?.();
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
    this.restoreJournal?.();
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
