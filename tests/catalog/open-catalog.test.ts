import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import {
  APPLICATION_ID,
  CatalogError,
  latestSchemaVersion,
  listParts,
  loadMigrations,
  migrate,
  openCatalog,
  writeParts,
} from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (error) {
    return error instanceof CatalogError ? error.code : `not a CatalogError: ${String(error)}`;
  }
  return undefined;
}

describe('opening a catalog', () => {
  it('creates a fresh catalog at the latest schema with WAL and a busy timeout', () => {
    const path = join(tempDir(), 'c.sqlite');
    const catalog = openCatalog(path);
    expect(catalog.migrated).toEqual(loadMigrations().map((m) => m.version));
    expect(catalog.db.pragma('user_version', { simple: true })).toBe(latestSchemaVersion());
    expect(catalog.db.pragma('application_id', { simple: true })).toBe(APPLICATION_ID);
    expect(catalog.db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(catalog.db.pragma('busy_timeout', { simple: true })).toBeGreaterThanOrEqual(60_000);
    catalog.close();
    const again = openCatalog(path);
    expect(again.migrated).toEqual([]);
    again.close();
  });

  it('upgrades a version-1 catalog with its parts intact and keeps a backup', () => {
    const path = join(tempDir(), 'old.sqlite');
    const db = new Database(path);
    migrate(db, loadMigrations(), 1);
    db.prepare(
      `INSERT INTO part (manufacturer, part_number, kind, package, vrrm_v, if_av_a, tj_max_k, vf_points, updated_at)
       VALUES ('Testwell Devices', 'TW-OLD1', 'rectifier', 'DO-41', 1000, 1, 423.15, '[{"vfV":1.1,"ifA":1,"tjK":298.15}]', '2025-01-01')`,
    ).run();
    db.close();
    const catalog = openCatalog(path);
    const later = loadMigrations().map((m) => m.version).filter((v) => v > 1);
    expect(catalog.migrated).toEqual(later);
    expect(catalog.backupPath).toBe(`${path}.before-v${latestSchemaVersion()}.bak`);
    const parts = listParts(catalog);
    expect(parts).toHaveLength(1);
    expect(parts[0]).toMatchObject({ partNumber: 'TW-OLD1', approval: 'pending', vrrmV: 1000, vfPoints: [{ vfV: 1.1, ifA: 1, tjK: 298.15 }] });
    catalog.close();
    const backup = new Database(catalog.backupPath!, { readonly: true });
    expect(backup.pragma('user_version', { simple: true })).toBe(1);
    backup.close();
  });

  it('refuses a catalog written by a newer version and leaves the file byte-for-byte untouched', () => {
    const path = join(tempDir(), 'new.sqlite');
    openCatalog(path).close();
    const db = new Database(path);
    db.pragma(`user_version = ${latestSchemaVersion() + 1}`);
    db.pragma('journal_mode = DELETE');
    db.close();
    const before = readFileSync(path);
    expect(codeOf(() => openCatalog(path))).toBe('too-new');
    expect(readFileSync(path).equals(before)).toBe(true);
  });

  it('refuses a file that is not SQLite, and a SQLite file of another program', () => {
    const dir = tempDir();
    const text = join(dir, 'notes.sqlite');
    writeFileSync(text, 'manufacturer,part_number\n'.repeat(20));
    expect(codeOf(() => openCatalog(text))).toBe('not-sqlite');
    const other = join(dir, 'other.sqlite');
    const db = new Database(other);
    db.exec('CREATE TABLE t (x)');
    db.pragma('application_id = 42');
    db.close();
    expect(codeOf(() => openCatalog(other))).toBe('foreign');
  });

  it('does not create a missing catalog when asked not to', () => {
    expect(codeOf(() => openCatalog(join(tempDir(), 'missing.sqlite'), { create: false }))).toBe('not-found');
  });

  it('keeps the approval trail append-only', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [aPart()], { by: 'tester', reason: 'test', at: '2026-01-01T00:00:00.000Z' });
    expect(() => catalog.db.prepare('UPDATE approval_event SET by = ?').run('someone else')).toThrow(/append-only/);
    expect(() => catalog.db.prepare('DELETE FROM approval_event').run()).toThrow(/append-only/);
    catalog.close();
  });

  it('reads a damaged copy as an error, not a crash', () => {
    const dir = tempDir();
    const path = join(dir, 'good.sqlite');
    const catalog = openCatalog(path);
    writeParts(catalog, [aPart()], { by: 't', reason: 't' });
    catalog.db.pragma('journal_mode = DELETE');
    catalog.close();
    const truncated = join(dir, 'truncated.sqlite');
    copyFileSync(path, truncated);
    const bytes = readFileSync(truncated);
    writeFileSync(truncated, bytes.subarray(0, 150));
    expect(codeOf(() => openCatalog(truncated))).toMatch(/damaged|not-sqlite/);
  });
});
