import { describe, expect, it } from 'vitest';
import { changeApproval, importPartsText, listParts, openCatalog, writePartsText, writeParts } from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';

const BY = { by: 'sync', at: '2026-04-01T00:00:00.000Z' };

describe('importing a shared file over local changes', () => {
  const shared = [aPart('schottky', { approval: 'approved' }), aPart('zener', { approval: 'approved' })];
  const sharedText = writePartsText(shared, 'csv');
  const updatedText = writePartsText([aPart('schottky', { approval: 'preferred' }), aPart('zener', { approval: 'approved', pdW: 0.3 })], 'csv');

  it('updates parts not touched here since the last import', () => {
    const catalog = openCatalog(':memory:');
    importPartsText(catalog, 'team.csv', sharedText, 'csv', BY);
    const r = importPartsText(catalog, 'team.csv', updatedText, 'csv', BY);
    expect(r).toMatchObject({ ok: true, written: { updated: 2 } });
  });

  it('reports a part changed both here and in the file, and writes nothing', () => {
    const catalog = openCatalog(':memory:');
    importPartsText(catalog, 'team.csv', sharedText, 'csv', BY);
    changeApproval(catalog, 'TW-SK340A', { state: 'banned', reason: 'local finding', by: 'me' });
    const r = importPartsText(catalog, 'team.csv', updatedText, 'csv', BY);
    expect(r).toEqual({ ok: false, records: 2, issues: [], conflicts: [{ manufacturer: 'Testwell Devices', partNumber: 'TW-SK340A', isLocalOnly: false, line: 2 }] });
    expect(listParts(catalog).map((p) => [p.partNumber, p.approval, p.pdW])).toEqual([
      ['TW-SK340A', 'banned', undefined],
      ['TW-Z5V1', 'approved', 0.5],
    ]);
  });

  it('keeps or overwrites local versions when told to', () => {
    const keep = openCatalog(':memory:');
    importPartsText(keep, 'team.csv', sharedText, 'csv', BY);
    changeApproval(keep, 'TW-SK340A', { state: 'banned', reason: 'local finding', by: 'me' });
    expect(importPartsText(keep, 'team.csv', updatedText, 'csv', { ...BY, onConflict: 'keep-local' })).toMatchObject({ ok: true, keptLocal: [{ partNumber: 'TW-SK340A' }] });
    expect(listParts(keep).map((p) => p.approval)).toEqual(['banned', 'approved']);

    const take = openCatalog(':memory:');
    importPartsText(take, 'team.csv', sharedText, 'csv', BY);
    changeApproval(take, 'TW-SK340A', { state: 'banned', reason: 'local finding', by: 'me' });
    importPartsText(take, 'team.csv', updatedText, 'csv', { ...BY, onConflict: 'overwrite-local' });
    expect(listParts(take).map((p) => p.approval)).toEqual(['preferred', 'approved']);
  });

  it('treats a part added here and never imported as a conflict when the file differs', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [aPart('schottky', { description: 'typed in by hand' })], { by: 'me', reason: 'add' });
    const r = importPartsText(catalog, 'team.csv', sharedText, 'csv', BY);
    expect(r.ok === false && 'conflicts' in r && r.conflicts.map((c) => [c.partNumber, c.isLocalOnly])).toEqual([['TW-SK340A', true]]);
  });
});
