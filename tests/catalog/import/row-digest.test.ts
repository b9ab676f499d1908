import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rowDigest, shapeRowDigest } from '../../../src/catalog/import/row-digest.js';

const value = fc.oneof(fc.constant(null), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.string({ maxLength: 12 }));

describe('row digests', () => {
  it('hash a row of a shape group as the same row written out in full', () => {
    fc.assert(
      fc.property(fc.array(value, { minLength: 1, maxLength: 20 }), fc.array(value, { maxLength: 6 }), (row, before) => {
        const columns = row.flatMap((v, i) => (v === null ? [] : [i]));
        const packed = [...before, ...columns.map((c) => row[c]!)];
        expect(shapeRowDigest(columns, packed, before.length, row.length)).toBe(rowDigest(row));
      }),
    );
  });

  it('tell apart rows that differ in one value, its kind or its place, and read -0 as 0', () => {
    const row = ['Testwell Devices', 'TW-1', 40, null, '0.5'];
    const digests = new Set([row, ['Testwell Devices', 'TW-2', 40, null, '0.5'], ['Testwell Devices', 'TW-1', '40', null, '0.5'], ['Testwell Devices', 'TW-1', null, 40, '0.5'], ['Testwell Devices', 'TW-1', 40, null, '0.50']].map((r) => rowDigest(r)));
    expect(digests.size).toBe(5);
    expect(rowDigest([0, 'a'])).toBe(rowDigest([-0, 'a']));
    expect(Number.isSafeInteger(rowDigest(row)) && rowDigest(row) >= 0).toBe(true);
  });
});
