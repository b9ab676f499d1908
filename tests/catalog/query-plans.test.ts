import { describe, expect, it } from 'vitest';
import { IDENTITY_WHERE, KEY_ORDER, NUMBER_WHERE } from '../../src/catalog/identity-sql.js';
import { openCatalog } from '../../src/catalog/index.js';

/**
 * The queries that must not read the whole part table at a million parts use the indexes of
 * migrations 006 and 007 (EXPLAIN QUERY PLAN, https://sqlite.org/eqp.html).
 */
describe('query plans', () => {
  const catalog = openCatalog(':memory:');
  const plan = (sql: string, ...params: unknown[]) => (catalog.db.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...params) as { detail: string }[]).map((r) => r.detail).join(' | ');

  it.each([
    ['a part by maker and number (findPart, writers, imports)', `SELECT id FROM part WHERE ${IDENTITY_WHERE}`, /SEARCH part USING (COVERING )?INDEX part_key \(search_key=\? AND part_number=\? AND manufacturer=\?\)/],
    ['a part by number alone (findPart)', `SELECT id FROM part WHERE ${NUMBER_WHERE}`, /SEARCH part USING (COVERING )?INDEX part_key \(search_key=\? AND part_number=\?\)/],
    ['the browser pages in part-number order', `SELECT id FROM part ORDER BY ${KEY_ORDER} LIMIT 50`, /^SCAN part USING (COVERING )?INDEX part_key$/],
    ['a typed prefix of a part number', 'SELECT id FROM part WHERE search_key >= ? AND search_key < ? ORDER BY search_key LIMIT 40', /SEARCH part USING (COVERING )?INDEX part_key \(search_key>\? AND search_key<\?\)/],
    ['a word in part numbers', 'SELECT p.id FROM part_search s JOIN part p ON p.id = s.rowid WHERE part_search MATCH ? LIMIT 40', /SCAN s VIRTUAL TABLE INDEX 0:M1 \| SEARCH p USING INTEGER PRIMARY KEY/],
    ['the trail entries an import wrote', 'SELECT id FROM approval_event WHERE part_id = ?', /SEARCH approval_event USING COVERING INDEX approval_event_part_id \(part_id=\?\)/],
    ['the other trail entries', 'SELECT id FROM approval_event WHERE part_id IS NULL AND part_number = ? COLLATE NOCASE AND manufacturer = ? COLLATE NOCASE', /SEARCH approval_event USING (COVERING )?INDEX approval_event_part \(manufacturer=\? AND part_number=\?\)/],
    ['the makers, packages, kinds and descriptions', "SELECT value FROM part_field_value WHERE field = 'manufacturer'", /SEARCH part_field_value USING PRIMARY KEY \(field=\?\)/],
  ])('%s', (_what, sql, expected) => {
    const params = (sql.match(/\?/g) ?? []).map(() => 'x');
    expect(plan(sql, ...params)).toMatch(expected);
  });
});
