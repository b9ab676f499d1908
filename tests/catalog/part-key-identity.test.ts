import { describe, expect, it } from 'vitest';
import { findPart, openCatalog, writeParts } from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';

/**
 * Migration 007 folds the identity index into the part-number key index. What identity means must
 * not change: one part per maker and number, letter case ignored, whoever writes the row.
 */
describe('identity along part_key (migration 007)', () => {
  const insert = "INSERT INTO part (manufacturer, part_number, kind, package, description, updated_at) VALUES (?, ?, 'zener', 'SOD-123', '', 'x')";

  it('refuses a second row for the same maker and number in another letter case, even from plain SQL without the key', () => {
    const catalog = openCatalog(':memory:');
    catalog.db.prepare(insert).run('Ferncombe', 'FZ-5V1');
    expect(() => catalog.db.prepare(insert).run('FERNCOMBE', 'fz-5v1')).toThrow(/UNIQUE constraint failed/);
    expect(catalog.db.prepare('SELECT count(*) FROM part').pluck().get()).toBe(1);
    catalog.close();
  });

  it('keeps numbers that share a key but differ in more than letter case as two parts', () => {
    const catalog = openCatalog(':memory:');
    catalog.db.prepare(insert).run('Ferncombe', 'FZ-5V1');
    catalog.db.prepare(insert).run('Ferncombe', 'FZ5V1');
    expect(catalog.db.prepare('SELECT count(DISTINCT search_key) AS keys, count(*) AS rows FROM part').get()).toEqual({ keys: 1, rows: 2 });
    expect(findPart(catalog, 'Ferncombe:fz5v1').partNumber).toBe('FZ5V1');
    expect(findPart(catalog, 'fz-5v1').partNumber).toBe('FZ-5V1');
    catalog.close();
  });

  it('finds parts written by Headroom and by plain SQL alike', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [aPart('schottky', { manufacturer: 'Ferncombe', partNumber: 'FS-140A' })], { by: 't', reason: 'test' });
    catalog.db.prepare(insert).run('Ferncombe', 'fz (5.1) v');
    expect(findPart(catalog, 'ferncombe:fs-140a').partNumber).toBe('FS-140A');
    expect(findPart(catalog, 'FZ (5.1) V').partNumber).toBe('fz (5.1) v');
    catalog.close();
  });
});
