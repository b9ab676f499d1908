import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { openCatalog } from '../../../src/catalog/index.js';
import { useRollbackJournal } from '../../../src/catalog/import/rollback-journal.js';
import { useTempDir } from '../../helpers/temp-dir.js';

const tempDir = useTempDir();
const modeOf = (db: Database.Database) => db.pragma('journal_mode', { simple: true });

/** A bulk import's journal switch (rollback-journal.ts); SQLite's rules at https://sqlite.org/wal.html#changing_to_and_from_wal_mode */
describe('the rollback journal of a bulk import', () => {
  it('is used when the import holds the only connection, and the write-ahead log comes back after', () => {
    const catalog = openCatalog(join(tempDir(), 'c.sqlite'));
    expect(modeOf(catalog.db)).toBe('wal');
    const restore = useRollbackJournal(catalog.db);
    expect(restore).toBeTypeOf('function');
    expect(modeOf(catalog.db)).toBe('delete');
    restore!();
    expect(modeOf(catalog.db)).toBe('wal');
    catalog.close();
  });

  it('is given up at once while another connection has the catalog open', () => {
    const path = join(tempDir(), 'c.sqlite');
    const catalog = openCatalog(path);
    const other = new Database(path, { readonly: true });
    other.prepare('SELECT count(*) FROM part').get();
    const started = Date.now();
    expect(useRollbackJournal(catalog.db)).toBeUndefined();
    // Not the five-second busy wait: the switch is refused, not waited for.
    expect(Date.now() - started).toBeLessThan(2000);
    expect(modeOf(catalog.db)).toBe('wal');
    expect(catalog.db.pragma('busy_timeout', { simple: true })).toBeGreaterThan(0);
    other.close();
    catalog.close();
  });

  it('lets another process open the catalog once the import has gone back to the log', () => {
    const path = join(tempDir(), 'c.sqlite');
    const catalog = openCatalog(path);
    const restore = useRollbackJournal(catalog.db)!;
    catalog.db.exec("BEGIN IMMEDIATE; INSERT INTO part (manufacturer, part_number, kind, package, description, updated_at) VALUES ('Ferncombe', 'FZ-1', 'zener', 'SOD-123', '', 'x'); COMMIT");
    restore();
    const second = openCatalog(path);
    expect(second.db.prepare('SELECT count(*) FROM part').pluck().get()).toBe(1);
    expect(modeOf(second.db)).toBe('wal');
    second.close();
    catalog.close();
  });
});
