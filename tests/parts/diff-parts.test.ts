import { describe, expect, it } from 'vitest';
import { readPartsText, writePartsText } from '../../src/catalog/index.js';
import { diffParts, isEmptyDiff } from '../../src/parts/index.js';
import { aPart } from '../helpers/a-part.js';

describe('diff of two exports', () => {
  it('finds added, removed and changed parts, and lists approval moves apart', () => {
    const before = writePartsText([aPart('schottky', { approval: 'approved' }), aPart('zener')], 'csv');
    const after = writePartsText([aPart('schottky', { approval: 'banned', approvalNote: 'field failures', vrrmV: 45 }), aPart('tvs')], 'json');
    const d = diffParts(readPartsText('a.csv', before, 'csv').parts.map((p) => p.part), readPartsText('b.json', after, 'json').parts.map((p) => p.part));
    expect(d.added.map((p) => p.partNumber)).toEqual(['TW-T33U']);
    expect(d.removed.map((p) => p.partNumber)).toEqual(['TW-Z5V1']);
    expect(d.changed).toEqual([
      {
        manufacturer: 'Testwell Devices',
        partNumber: 'TW-SK340A',
        changes: [
          { column: 'approval', label: 'Approval', before: 'approved', after: 'banned' },
          { column: 'approval_note', label: 'Approval note', before: '—', after: 'field failures' },
          { column: 'vrrm_v', label: 'VRRM', before: '40.0 V', after: '45.0 V' },
        ],
      },
    ]);
    expect(d.approvalChanges).toEqual([{ manufacturer: 'Testwell Devices', partNumber: 'TW-SK340A', from: 'approved', to: 'banned (field failures)' }]);
  });

  it('sees no difference between the same parts in either format', () => {
    const parts = [aPart('schottky'), aPart('tvs')];
    expect(isEmptyDiff(diffParts(parts, [...parts].reverse()))).toBe(true);
  });
});
