import { describe, expect, it } from 'vitest';
import {
  approvalHistory,
  changeApproval,
  checkCatalog,
  formatRowIssue,
  importPartsText,
  listParts,
  openCatalog,
  writeParts,
  type Catalog,
} from '../../../src/catalog/index.js';
import { partDigest } from '../../../src/catalog/import-conflicts.js';
import { searchParts } from '../../../src/catalog/search/index.js';
import { PART_COLUMNS } from '../../../src/parts/index.js';
import { aPart } from '../../helpers/a-part.js';
import { syntheticCsv } from '../../helpers/synthetic-csv.js';

const BY = { by: 'tester', at: '2026-03-01T00:00:00.000Z' };
// Large enough for the bulk path (indexes dropped and built again); small files keep them.
const LARGE = 25_000;

/** The schema as sqlite_schema lists it: an import must leave every index and trigger in place. */
function schema(catalog: Catalog): string[] {
  return (catalog.db.prepare("SELECT type || ' ' || name || ' ' || coalesce(sql, '') FROM sqlite_schema ORDER BY name").pluck().all() as string[]).sort();
}

function count(catalog: Catalog, table: string): number {
  return catalog.db.prepare(`SELECT count(*) FROM ${table}`).pluck().get() as number;
}

function withRow(csv: string, at: number, replace: (line: string) => string): string {
  const lines = csv.split('\n');
  lines[at] = replace(lines[at]!);
  return lines.join('\n');
}

describe('a large import into an empty catalog', () => {
  it('writes every part, its trail entry and baseline, and leaves every index and trigger', () => {
    const catalog = openCatalog(':memory:');
    const before = schema(catalog);
    const r = importPartsText(catalog, 'big.csv', syntheticCsv(LARGE), 'csv', BY);
    expect(r).toMatchObject({ ok: true, records: LARGE, written: { added: LARGE, updated: 0, unchanged: 0 } });
    expect(schema(catalog)).toEqual(before);
    expect(count(catalog, 'part')).toBe(LARGE);
    expect(count(catalog, 'approval_event')).toBe(LARGE);
    expect(catalog.db.prepare('SELECT count(*) FROM part WHERE import_digest IS NULL OR search_key IS NULL').pluck().get()).toBe(0);
    catalog.db.exec("INSERT INTO part_search (part_search, rank) VALUES ('integrity-check', 1)");
    const [first] = listParts(catalog, { manufacturer: 'Loadtest Devices' });
    expect(approvalHistory(catalog, first!)).toMatchObject([{ fromState: null, toState: 'pending', by: 'tester', reason: 'import of big.csv' }]);
    const hit = searchParts(catalog, 'LT-0012345');
    expect(hit.ok && hit.results[0]?.part.partNumber).toBe('LT-0012345');
    expect(checkCatalog(catalog).isHealthy).toBe(true);
    catalog.close();
  });

  it('writes nothing when the last row is bad, and says where', () => {
    const catalog = openCatalog(':memory:');
    const before = schema(catalog);
    const csv = withRow(syntheticCsv(LARGE), LARGE, (line) => line.replace(',423.15,', ',-5,'));
    const r = importPartsText(catalog, 'late.csv', csv, 'csv', BY);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues.map(formatRowIssue)).toEqual([expect.stringMatching(/^late\.csv:25001 column tj_max_k value "-5": /)]);
    expect(count(catalog, 'part')).toBe(0);
    expect(count(catalog, 'approval_event')).toBe(0);
    expect(schema(catalog)).toEqual(before);
    catalog.close();
  });

  it('writes the good rows with skipInvalid, and refuses a part named twice either way', () => {
    const csv = withRow(syntheticCsv(LARGE), 30, (line) => line.replace('LT-0000029', 'LT-0000010'));
    const refused = openCatalog(':memory:');
    const r = importPartsText(refused, 'twice.csv', csv, 'csv', BY);
    expect(!r.ok && r.issues.map((i) => [i.line, i.column, i.message])).toEqual([[31, 'part_number', 'the same manufacturer and part number as line 12']]);
    expect(count(refused, 'part')).toBe(0);
    const skipping = openCatalog(':memory:');
    const s = importPartsText(skipping, 'twice.csv', csv, 'csv', { ...BY, skipInvalid: true });
    expect(s).toMatchObject({ ok: true, written: { added: LARGE - 1 }, skipped: [{ line: 31 }] });
    expect(count(skipping, 'approval_event')).toBe(LARGE - 1);
    refused.close();
    skipping.close();
  });
});

describe('imports over parts already in the catalog', () => {
  const local = aPart('schottky', { manufacturer: 'Loadtest Devices', partNumber: 'LT-0000007', kind: 'rectifier', package: 'DO-41', vrrmV: 800, ifAvA: 1, tjMaxK: 423.15, vfPoints: [{ vfV: 1.1, ifA: 1, tjK: 298.15 }] });

  it.each([
    ['a few local parts (bulk path)', LARGE],
    ['more local parts than the file has (row by row)', 300],
  ])('with %s: updates, conflicts and the trail behave the same', (_label, rows) => {
    const catalog = openCatalog(':memory:');
    const csv = syntheticCsv(rows);
    // Parts that came in from the file earlier, one changed here since, one rewritten here unchanged.
    expect(importPartsText(catalog, 'team.csv', csv, 'csv', BY).ok).toBe(true);
    if (rows < LARGE) writeParts(catalog, Array.from({ length: 2 * rows }, (_, i) => ({ ...local, partNumber: `OTHER-${i}` })), { ...BY, reason: 'filler' });
    changeApproval(catalog, 'LT-0000003', { state: 'approved', reason: 'reviewed', by: 'ce' });
    writeParts(catalog, [local], { ...BY, reason: 'added here' });
    const updated = withRow(withRow(csv, 4, (l) => l.replace(',DO-41,', ',DO-15,')), 5, (l) => l.replace(',DO-41,', ',DO-15,'));
    const changedBoth = withRow(updated, 8, (l) => l.replace(',DO-41,', ',DO-15,'));

    // LT-0000003 changed here (approval) and in the file (package): a conflict; LT-0000007 never imported.
    const report = importPartsText(catalog, 'team.csv', changedBoth, 'csv', BY);
    expect(report.ok).toBe(false);
    const conflicts = !report.ok && 'conflicts' in report ? report.conflicts : [];
    expect(conflicts.map((c) => [c.partNumber, c.isLocalOnly, c.line])).toEqual([['LT-0000003', false, 5]]);
    expect(listParts(catalog).find((p) => p.partNumber === 'LT-0000004')?.package).toBe('DO-41');

    const kept = importPartsText(catalog, 'team.csv', changedBoth, 'csv', { ...BY, onConflict: 'keep-local' });
    expect(kept).toMatchObject({ ok: true, written: { updated: 2, unchanged: rows - 3 }, keptLocal: [{ partNumber: 'LT-0000003' }] });
    const parts = new Map(listParts(catalog).map((p) => [p.partNumber, p]));
    expect([parts.get('LT-0000003')?.approval, parts.get('LT-0000003')?.package, parts.get('LT-0000004')?.package]).toEqual(['approved', 'DO-41', 'DO-15']);

    const taken = importPartsText(catalog, 'team.csv', changedBoth, 'csv', { ...BY, onConflict: 'overwrite-local' });
    expect(taken).toMatchObject({ ok: true, written: { updated: 1 }, overwritten: [{ partNumber: 'LT-0000003' }] });
    expect(approvalHistory(catalog, parts.get('LT-0000003')!).map((e) => [e.fromState, e.toState, e.reason])).toEqual([
      [null, 'pending', 'import of team.csv'],
      ['pending', 'approved', 'reviewed'],
      ['approved', 'pending', 'import of team.csv'],
    ]);
    expect(importPartsText(catalog, 'team.csv', changedBoth, 'csv', BY)).toMatchObject({ ok: true, written: { added: 0, updated: 0, unchanged: rows } });
    expect(checkCatalog(catalog).isHealthy).toBe(true);
    catalog.close();
  });

  it('reports a part added here that the file also has, as local only', () => {
    const catalog = openCatalog(':memory:');
    writeParts(catalog, [{ ...local, vrrmV: 900 }], { ...BY, reason: 'added here' });
    const r = importPartsText(catalog, 'big.csv', syntheticCsv(LARGE), 'csv', BY);
    expect(!r.ok && 'conflicts' in r && r.conflicts).toEqual([{ manufacturer: 'Loadtest Devices', partNumber: 'LT-0000007', isLocalOnly: true, line: 9 }]);
    expect(count(catalog, 'part')).toBe(1);
    catalog.close();
  });

  it('honours a baseline kept as SHA-256 text before migration 006', () => {
    const catalog = openCatalog(':memory:');
    const part = aPart('schottky', { manufacturer: 'Loadtest Devices', partNumber: 'LT-0000001' });
    writeParts(catalog, [part], { ...BY, reason: 'older import' });
    catalog.db.prepare('UPDATE part SET import_digest = ?').run(partDigest(part));
    const header = PART_COLUMNS.join(',');
    const cells = (vrrm: string) => PART_COLUMNS.map((c) => ({ manufacturer: 'Loadtest Devices', part_number: 'LT-0000001', kind: 'schottky', package: 'SMA', vrrm_v: vrrm, if_av_a: '3', tj_max_k: '423.15', vf_points: '0.5@3@298.15' })[c] ?? '').join(',');
    // Unchanged here since that import: the file's newer rating is taken without a conflict.
    expect(importPartsText(catalog, 'f.csv', `${header}\n${cells('45')}\n`, 'csv', BY)).toMatchObject({ ok: true, written: { updated: 1 } });
    expect(listParts(catalog)[0]?.vrrmV).toBe(45);
    catalog.close();
  });
});

describe('the approval trail of imported parts', () => {
  it('stays with its identity when a part is renamed or deleted', () => {
    const catalog = openCatalog(':memory:');
    importPartsText(catalog, 'big.csv', syntheticCsv(LARGE), 'csv', BY);
    const trailOf = (partNumber: string) => approvalHistory(catalog, { manufacturer: 'Loadtest Devices', partNumber }).length;
    catalog.db.prepare("UPDATE part SET part_number = 'LT-RENAMED' WHERE part_number = 'LT-0000002'").run();
    expect([trailOf('LT-0000002'), trailOf('LT-RENAMED')]).toEqual([1, 0]);
    catalog.db.prepare("DELETE FROM part WHERE part_number = 'LT-0000005'").run();
    expect(trailOf('LT-0000005')).toBe(1);
    expect(() => catalog.db.prepare('UPDATE approval_event SET part_id = 1 WHERE part_id IS NULL').run()).toThrow(/can only be cleared/);
    expect(() => catalog.db.prepare("UPDATE approval_event SET reason = 'x'").run()).toThrow(/append-only/);
    catalog.close();
  });
});
