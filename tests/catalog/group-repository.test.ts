import { describe, expect, it } from 'vitest';
import { declareGroup, findGroup, leaveGroup, listGroups, openCatalog, writeParts } from '../../src/catalog/index.js';
import { partDifferences } from '../../src/parts/index.js';
import { aPart } from '../helpers/a-part.js';

function threeSchottkys() {
  const catalog = openCatalog(':memory:');
  writeParts(
    catalog,
    [
      aPart('schottky', { partNumber: 'TW-A', ifsmA: 80 }),
      aPart('schottky', { manufacturer: 'Other Works', partNumber: 'OW-A', ifsmA: 100, vfPoints: [{ vfV: 0.48, ifA: 3, tjK: 298.15 }] }),
      aPart('schottky', { manufacturer: 'Third Co', partNumber: 'TC-A' }),
    ],
    { by: 't', reason: 't' },
  );
  return catalog;
}

describe('second-source groups', () => {
  it('declares a group and shows only the fields on which members differ', () => {
    const catalog = threeSchottkys();
    const { group } = declareGroup(catalog, 'SK3A40-SMA', ['TW-A', 'OW-A']);
    expect(group.members.map((m) => m.partNumber)).toEqual(['OW-A', 'TW-A']);
    expect(partDifferences(group.members)).toEqual([
      { column: 'ifsm_a', label: 'IFSM', values: ['100 A', '80.0 A'] },
      { column: 'vf_points', label: 'VF', values: ['480 mV @ 3.00 A, 25.0 °C', '500 mV @ 3.00 A, 25.0 °C'] },
    ]);
  });

  it.each([
    [['TW-A'], 'a second-source group needs at least two parts; a group of one declares nothing'],
    [['TW-A', 'tw-a'], '"tw-a" and "TW-A" are the same part'],
    [['TW-A', 'NOPE-9'], 'no part "NOPE-9"'],
  ])('refuses %j', (refs, message) => {
    const catalog = threeSchottkys();
    expect(() => declareGroup(catalog, 'G', refs)).toThrow(message);
    expect(listGroups(catalog)).toEqual([]);
  });

  it('moves a part named in a new group, and dissolves a group left with one member', () => {
    const catalog = threeSchottkys();
    declareGroup(catalog, 'G1', ['TW-A', 'OW-A']);
    const { moved } = declareGroup(catalog, 'G2', ['TW-A', 'TC-A']);
    expect(moved.map((p) => p.partNumber)).toEqual(['TW-A']);
    expect(listGroups(catalog).map((g) => [g.name, g.members.length])).toEqual([
      ['G1', 1],
      ['G2', 2],
    ]);
    expect(leaveGroup(catalog, 'TC-A').dissolved).toBe('G2');
    expect(() => findGroup(catalog, 'G2')).toThrow('no second-source group "G2"');
  });
});
