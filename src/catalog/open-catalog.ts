import { closeSync, copyFileSync, existsSync, openSync, readSync } from 'node:fs';
import Database from 'better-sqlite3';
import type BetterSqlite3 from 'better-sqlite3';
import { CatalogError } from './catalog-error.js';
import { latestSchemaVersion, loadMigrations, migrate } from './migrations.js';

export const APPLICATION_ID = 0x4864526d; // "HdRm"
/** Long enough for a second writer to wait out a million-part import instead of failing. */
export const BUSY_TIMEOUT_MS = 120_000;

export interface Catalog {
  readonly db: BetterSqlite3.Database;
  readonly path: string;
  /** Schema versions applied while opening; empty when the file was already current. */
  readonly migrated: readonly number[];
  /** Copy taken before upgrading an existing catalog, if any. */
  readonly backupPath?: string;
  close(): void;
}

export interface OpenOptions {
  /** Create the file when it does not exist (default true). */
  readonly create?: boolean;
  readonly readonly?: boolean;
}

const SQLITE_HEADER = 'SQLite format 3\u0000';

/** Checks a file is a SQLite database of ours and not newer than this program, without writing to it. */
function inspectExisting(path: string): void {
  const fd = openSync(path, 'r');
  const header = Buffer.alloc(100);
  let read: number;
  try {
    read = readSync(fd, header, 0, 100, 0);
  } finally {
    closeSync(fd);
  }
  if (read === 0) return; // an empty file is a new catalog
  if (read < 100 || header.toString('latin1', 0, 16) !== SQLITE_HEADER) {
    throw new CatalogError('not-sqlite', `${path} is not a SQLite database`, 'check the --catalog path or HEADROOM_CATALOG');
  }
  const applicationId = header.readUInt32BE(68);
  const version = header.readUInt32BE(60);
  if (applicationId !== APPLICATION_ID && !(applicationId === 0 && version === 0)) {
    throw new CatalogError('foreign', `${path} is a SQLite database but not a Headroom catalog`, 'choose another file with --catalog');
  }
  if (version > latestSchemaVersion()) throw tooNew(path, version);
}

function checkIdentity(db: BetterSqlite3.Database, path: string): void {
  const applicationId = db.pragma('application_id', { simple: true }) as number;
  const version = db.pragma('user_version', { simple: true }) as number;
  if (applicationId !== APPLICATION_ID && !(applicationId === 0 && version === 0)) {
    throw new CatalogError('foreign', `${path} is a SQLite database but not a Headroom catalog`, 'choose another file with --catalog');
  }
  if (version > latestSchemaVersion()) throw tooNew(path, version);
}

/**
 * Sets the write-ahead log, waiting like any other lock while a bulk import holds the catalog in
 * its rollback journal (import/rollback-journal.ts): SQLite answers a journal change at once with
 * "busy" instead of waiting itself.
 */
function useWriteAheadLog(db: BetterSqlite3.Database): void {
  const deadline = Date.now() + BUSY_TIMEOUT_MS;
  for (;;) {
    try {
      if (String(db.pragma('journal_mode = WAL', { simple: true })).toLowerCase() === 'wal') return;
    } catch (error) {
      if ((error as { code?: string }).code !== 'SQLITE_BUSY') throw error;
    }
    if (Date.now() >= deadline) throw new CatalogError('busy', `${db.name} is locked by a long write (an import?)`, 'try again when it has finished');
    Atomics.wait(PAUSE, 0, 0, 25);
  }
}
const PAUSE = new Int32Array(new SharedArrayBuffer(4));

function tooNew(path: string, version: number): CatalogError {
  return new CatalogError(
    'too-new',
    `${path} was written by a newer Headroom (catalog schema ${version}; this program knows up to ${latestSchemaVersion()}). It was left untouched.`,
    'upgrade Headroom to open it',
  );
}

export function openCatalog(path: string, options: OpenOptions = {}): Catalog {
  const isMemory = path === ':memory:';
  const exists = !isMemory && existsSync(path);
  if (!isMemory && !exists && options.create === false) {
    throw new CatalogError('not-found', `no catalog at ${path}`, 'import parts with `headroom catalog import FILE`, or try `headroom --demo`');
  }
  if (exists) inspectExisting(path);

  let db: BetterSqlite3.Database;
  try {
    db = new Database(path, { readonly: options.readonly ?? false });
  } catch (error) {
    throw new CatalogError('damaged', `cannot open ${path}: ${(error as Error).message}`);
  }
  try {
    db.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
    // The file header may lag behind a write-ahead log: ask SQLite itself before writing anything.
    if (exists) checkIdentity(db, path);
    if (options.readonly) {
      if ((db.pragma('user_version', { simple: true }) as number) < latestSchemaVersion()) {
        throw new CatalogError('too-new', `${path} needs an upgrade that a read-only open cannot make`, 'open it once without read-only');
      }
      return { db, path, migrated: [], close: () => db.close() };
    }
    // A new file gets 16 KiB pages: a million-part import writes a third fewer pages (and log
    // frames) than with SQLite's 4 KiB, and builds its indexes quicker (bench/README.md). The size
    // is fixed once the file has pages, so existing catalogs keep theirs.
    if (!isMemory && (db.pragma('page_count', { simple: true }) as number) === 0) db.pragma('page_size = 16384');
    if (!isMemory) useWriteAheadLog(db);
    db.pragma('synchronous = NORMAL');
    // Every write to a table with triggers (part, for search) keeps a statement journal; in a
    // temporary file that costs about a quarter of a large import (bench/README.md).
    db.pragma('temp_store = MEMORY');
    db.pragma('foreign_keys = ON');
    let backupPath: string | undefined;
    const current = db.pragma('user_version', { simple: true }) as number;
    if (current > 0 && current < latestSchemaVersion()) {
      backupPath = `${path}.before-v${latestSchemaVersion()}.bak`;
      db.pragma('wal_checkpoint(TRUNCATE)');
      copyFileSync(path, backupPath);
    }
    const migrated = migrate(db, loadMigrations());
    return { db, path, migrated, ...(backupPath ? { backupPath } : {}), close: () => db.close() };
  } catch (error) {
    db.close();
    if (error instanceof CatalogError) throw error;
    throw new CatalogError('damaged', `cannot use ${path}: ${(error as Error).message}`, 'run `headroom catalog check`, or restore a backup');
  }
}
