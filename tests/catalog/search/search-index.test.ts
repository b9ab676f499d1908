import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { loadMigrations, migrate, openCatalog, writeParts, type Catalog } from '../../../src/catalog/index.js';
import { searchParts } from '../../../src/catalog/search/index.js';
import type { Part } from '../../../src/parts/index.js';
import { ROW_COLUMNS, partToRow } from '../../../src/catalog/part-rows.js';
import { aPart } from '../../helpers/a-part.js';
import { fixtureCatalog, fixtureParts } from './search-fixture.js';

const context = { by: 'test', reason: 'test', at: '2026-01-05T09:00:00.000Z' };

function numbers(catalog: Catalog, text: string): string[] {
  const outcome = searchParts(catalog, text);
  if (!outcome.ok) throw new Error('bad query');
  return outcome.results.filter((h) => h.matched === 'exact').map((h) => h.part.partNumber);
}

/** FTS5 compares its index with the text the view gives; it throws when they differ. */
function checkIndex(catalog: Catalog): void {
  catalog.db.exec("INSERT INTO part_search (part_search, rank) VALUES ('integrity-check', 1)");
}

describe('keeping the search index current', () => {
  it('follows an update made through writeParts', () => {
    const catalog = fixtureCatalog();
    expect(numbers(catalog, 'glasspassivated')).toEqual([]);
    writeParts(catalog, [aPart('schottky', { manufacturer: 'Brackwater Semiconductor', partNumber: 'BWS3-40A', description: 'glass passivated' })], context);
    expect(numbers(catalog, 'glass passivated')).toEqual(['BWS3-40A']);
    expect(numbers(catalog, '"Schottky rectifier 40 V"')).toEqual([]);
    checkIndex(catalog);
    catalog.close();
  });

  it('follows a part number changed and a row deleted by plain SQL', () => {
    const catalog = fixtureCatalog();
    catalog.db.prepare("UPDATE part SET part_number = 'KTR-9Z1000-L' WHERE part_number = 'KTR-1A1000-L'").run();
    expect(numbers(catalog, 'KTR-9Z')).toEqual(['KTR-9Z1000-L']);
    expect(numbers(catalog, '1A1000')).toEqual([]);
    catalog.db.prepare("DELETE FROM part WHERE part_number = 'KTR-9Z1000-L'").run();
    expect(numbers(catalog, 'KTR9Z')).toEqual([]);
    checkIndex(catalog);
    catalog.close();
  });

  it('leaves the index alone when only ratings or approval change', () => {
    const catalog = fixtureCatalog();
    catalog.db.prepare("UPDATE part SET approval = 'banned', vrrm_v = 45 WHERE part_number = 'BWS3-40A'").run();
    expect(numbers(catalog, 'BWS3')).toEqual(['BWS3-40A']);
    checkIndex(catalog);
    catalog.close();
  });
});

/** Parts as a program of schema version 3 to 5 wrote them: the part columns, nothing derived. */
function writeOlder(db: Database.Database, parts: readonly Part[]): void {
  const insert = db.prepare(`INSERT INTO part (${ROW_COLUMNS.join(', ')}, updated_at) VALUES (${ROW_COLUMNS.map(() => '?').join(', ')}, 'x')`);
  for (const part of parts) insert.run(ROW_COLUMNS.map((c) => partToRow(part)[c] ?? null));
}

describe('migrations 004 and 006', () => {
  it.each([3, 5])('index parts written at version %i', (version) => {
    const db = new Database(':memory:');
    migrate(db, loadMigrations(), version);
    const older: Catalog = { db, path: ':memory:', migrated: [], close: () => db.close() };
    writeOlder(db, fixtureParts());
    expect(migrate(db)).toContain(6);
    expect(numbers(older, 'ktr1a1000l')).toEqual(['KTR-1A1000-L']);
    expect(numbers(older, 'automotive')).toEqual(['AG-SK100-S']);
    checkIndex(older);
    db.close();
  });

  it('gives a new catalog an empty index that fills as parts arrive', () => {
    const catalog = openCatalog(':memory:');
    expect(numbers(catalog, 'BWS')).toEqual([]);
    writeParts(catalog, fixtureParts().slice(0, 1), context);
    expect(numbers(catalog, 'BWS')).toEqual(['BWS3-40A']);
    catalog.close();
  });
});

describe('large writes', () => {
  const many = (count: number, description: string) =>
    Array.from({ length: count }, (_, i) => aPart('zener', { manufacturer: 'Dunmere Electronics', partNumber: `DMZ-${1000 + i}`, description }));

  it('index their new parts in one statement, updates of older parts as they go', () => {
    const catalog = fixtureCatalog();
    const parts = [...many(300, 'bulk'), aPart('schottky', { manufacturer: 'Brackwater Semiconductor', partNumber: 'BWS3-40A', description: 'rewritten in bulk' })];
    writeParts(catalog, parts, context);
    expect(catalog.db.prepare('SELECT count(*) FROM part_search_deferral').pluck().get()).toBe(0);
    expect(numbers(catalog, 'DMZ-1299')).toEqual(['DMZ-1299']);
    expect(numbers(catalog, 'rewritten')).toEqual(['BWS3-40A']);
    checkIndex(catalog);
    catalog.close();
  });

  it('index the last state of a part written twice in one batch', () => {
    const catalog = fixtureCatalog();
    writeParts(catalog, [...many(250, 'first'), ...many(1, 'second')], context);
    expect(numbers(catalog, 'DMZ-1000 second')).toEqual(['DMZ-1000']);
    expect(numbers(catalog, 'DMZ-1000 first')).toEqual([]);
    checkIndex(catalog);
    catalog.close();
  });

  it('leave nothing behind when they fail', () => {
    const catalog = fixtureCatalog();
    const broken = { ...aPart('zener'), partNumber: 'BROKEN-1', kind: null } as unknown as Part;
    expect(() => writeParts(catalog, [...many(250, 'lost'), broken], context)).toThrow();
    expect(catalog.db.prepare('SELECT count(*) FROM part_search_deferral').pluck().get()).toBe(0);
    expect(numbers(catalog, 'DMZ')).toEqual([]);
    writeParts(catalog, many(1, 'after'), context);
    expect(numbers(catalog, 'DMZ-1000')).toEqual(['DMZ-1000']);
    checkIndex(catalog);
    catalog.close();
  });
});
