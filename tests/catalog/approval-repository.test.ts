import { describe, expect, it } from 'vitest';
import { approvalHistory, changeApproval, CatalogError, listParts, openCatalog, writeParts } from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';

function catalogWithOnePart() {
  const catalog = openCatalog(':memory:');
  writeParts(catalog, [aPart('schottky', { approval: 'approved' })], { by: 'import', reason: 'initial load', at: '2026-01-01T00:00:00.000Z' });
  return catalog;
}

describe('approval changes', () => {
  it('records who, when, from, to, condition and why, oldest first', () => {
    const catalog = catalogWithOnePart();
    changeApproval(catalog, 'TW-SK340A', { state: 'banned', reason: 'field failures', by: 'ana', at: '2026-02-01T00:00:00.000Z' });
    changeApproval(catalog, 'tw-sk340a', { state: 'conditional', condition: 'only below 60 °C ambient', reason: 'supplier fix', by: 'ben', at: '2026-03-01T00:00:00.000Z' });
    const trail = approvalHistory(catalog, { manufacturer: 'Testwell Devices', partNumber: 'TW-SK340A' });
    expect(trail.map(({ id: _id, manufacturer: _m, partNumber: _p, ...e }) => e)).toEqual([
      { at: '2026-01-01T00:00:00.000Z', by: 'import', fromState: null, toState: 'approved', note: null, reason: 'initial load' },
      { at: '2026-02-01T00:00:00.000Z', by: 'ana', fromState: 'approved', toState: 'banned', note: null, reason: 'field failures' },
      { at: '2026-03-01T00:00:00.000Z', by: 'ben', fromState: 'banned', toState: 'conditional', note: 'only below 60 °C ambient', reason: 'supplier fix' },
    ]);
    expect(listParts(catalog)[0]).toMatchObject({ approval: 'conditional', approvalNote: 'only below 60 °C ambient' });
  });

  it('clears the condition when a part leaves the conditional state', () => {
    const catalog = catalogWithOnePart();
    changeApproval(catalog, 'TW-SK340A', { state: 'conditional', condition: 'x', reason: 'r', by: 'a' });
    changeApproval(catalog, 'TW-SK340A', { state: 'preferred', reason: 'qualified', by: 'a' });
    expect(listParts(catalog)[0]!.approvalNote).toBeUndefined();
  });

  it.each([
    [{ state: 'banned' as const, reason: ' ', by: 'a' }, 'a reason is required for every approval change'],
    [{ state: 'conditional' as const, reason: 'r', by: 'a' }, 'a conditional approval needs its condition'],
  ])('refuses a change without what it needs', (change, message) => {
    const catalog = catalogWithOnePart();
    expect(() => changeApproval(catalog, 'TW-SK340A', change)).toThrow(message);
    expect(approvalHistory(catalog, aPart())).toHaveLength(1);
  });

  it('refuses an unknown part, writing nothing', () => {
    const catalog = catalogWithOnePart();
    expect(() => changeApproval(catalog, 'NOPE-1', { state: 'banned', reason: 'r', by: 'a' })).toThrow(CatalogError);
    expect(catalog.db.prepare('SELECT count(*) AS n FROM approval_event').get()).toEqual({ n: 1 });
  });
});
