import { describe, expect, it } from 'vitest';
import { rowDigest } from '../../../src/catalog/import/row-digest.js';

describe('row digests', () => {
  it('tell apart rows that differ in one value, its kind or its place, and read -0 as 0', () => {
    const row = ['Testwell Devices', 'TW-1', 40, null, '0.5'];
    const digests = new Set([row, ['Testwell Devices', 'TW-2', 40, null, '0.5'], ['Testwell Devices', 'TW-1', '40', null, '0.5'], ['Testwell Devices', 'TW-1', null, 40, '0.5'], ['Testwell Devices', 'TW-1', 40, null, '0.50']].map((r) => rowDigest(r)));
    expect(digests.size).toBe(5);
    expect(rowDigest([0, 'a'])).toBe(rowDigest([-0, 'a']));
    expect(Number.isSafeInteger(rowDigest(row)) && rowDigest(row) >= 0).toBe(true);
  });
});
