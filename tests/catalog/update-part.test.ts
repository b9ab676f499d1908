import { describe, expect, it } from 'vitest';
import { approvalHistory, findPart, openCatalog, writeParts } from '../../src/catalog/index.js';
import { updatePart } from '../../src/catalog/update-part.js';
import { keyTrigrams } from '../../src/catalog/search/word-sql.js';
import { aPart } from '../helpers/a-part.js';

const AT = '2026-04-01T00:00:00.000Z';
const edit = { by: 'ana', reason: 'datasheet revision C', at: AT };

function catalogWith(...parts: ReturnType<typeof aPart>[]) {
  const catalog = openCatalog(':memory:');
  writeParts(catalog, parts, { by: 'import', reason: 'initial load', at: '2026-01-01T00:00:00.000Z' });
  return catalog;
}

const rowId = (catalog: ReturnType<typeof openCatalog>, partNumber: string) =>
  (catalog.db.prepare('SELECT id FROM part WHERE part_number = ?').get(partNumber) as { id: number } | undefined)?.id;

describe('editing a stored part', () => {
  it('rewrites the same row and adds nothing to the approval trail when approval is unchanged', () => {
    const original = aPart('schottky');
    const catalog = catalogWith(original);
    const id = rowId(catalog, 'TW-SK340A');
    const r = updatePart(catalog, original, { ...original, vrrmV: 60, description: 'revised' }, edit);
    expect(r).toMatchObject({ ok: true, isChanged: true, isApprovalChanged: false, part: { vrrmV: 60, description: 'revised' } });
    expect(rowId(catalog, 'TW-SK340A')).toBe(id);
    expect(findPart(catalog, 'TW-SK340A').vrrmV).toBe(60);
    expect(approvalHistory(catalog, original)).toHaveLength(1);
  });

  it('records an approval change in the trail, from the stored state, by whom and why', () => {
    const original = aPart('schottky', { approval: 'pending' });
    const catalog = catalogWith(original);
    updatePart(catalog, original, { ...original, approval: 'conditional', approvalNote: 'only below 60 °C' }, edit);
    const trail = approvalHistory(catalog, original);
    expect(trail).toHaveLength(2);
    expect(trail[1]).toMatchObject({ fromState: 'pending', toState: 'conditional', note: 'only below 60 °C', by: 'ana', reason: 'datasheet revision C', at: AT });
  });

  it('writes nothing when the values are as stored', () => {
    const original = aPart('schottky');
    const catalog = catalogWith(original);
    const before = catalog.db.prepare('SELECT updated_at FROM part').get();
    expect(updatePart(catalog, original, { ...original }, edit)).toMatchObject({ ok: true, isChanged: false });
    expect(catalog.db.prepare('SELECT updated_at FROM part').get()).toEqual(before);
  });

  it('renames a part in place, and the search index follows the new part number', () => {
    const original = aPart('schottky');
    const catalog = catalogWith(original);
    const id = rowId(catalog, 'TW-SK340A');
    const r = updatePart(catalog, original, { ...original, partNumber: 'TW-SK340AX' }, edit);
    expect(r.ok).toBe(true);
    expect(rowId(catalog, 'TW-SK340AX')).toBe(id);
    expect(rowId(catalog, 'TW-SK340A')).toBeUndefined();
    const hits = catalog.db.prepare('SELECT rowid FROM part_search WHERE part_search MATCH ?').all(keyTrigrams('SK340AX'));
    expect(hits).toEqual([{ rowid: id }]);
  });

  it('refuses a maker and part number that another part has, in any letter case, and changes nothing', () => {
    const original = aPart('schottky');
    const other = aPart('schottky', { partNumber: 'TW-SK360A', vrrmV: 60 });
    const catalog = catalogWith(original, other);
    const r = updatePart(catalog, original, { ...original, partNumber: 'tw-sk360a', vrrmV: 100 }, edit);
    expect(r).toEqual({ ok: false, code: 'duplicate-part', message: expect.stringContaining('tw-sk360a is already in the catalog') });
    expect(findPart(catalog, 'TW-SK340A').vrrmV).toBe(40);
    expect(findPart(catalog, 'TW-SK360A').vrrmV).toBe(60);
  });

  it('accepts a change of letter case in its own part number', () => {
    const original = aPart('schottky');
    const catalog = catalogWith(original);
    expect(updatePart(catalog, original, { ...original, partNumber: 'tw-sk340a' }, edit)).toMatchObject({ ok: true, part: { partNumber: 'tw-sk340a' } });
  });

  it('says so when the part is gone', () => {
    const catalog = catalogWith(aPart('schottky'));
    expect(updatePart(catalog, { manufacturer: 'Testwell Devices', partNumber: 'NOPE' }, aPart('schottky'), edit)).toMatchObject({ ok: false, code: 'unknown-part' });
  });
});
