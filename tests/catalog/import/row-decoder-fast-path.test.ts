import { describe, expect, it, vi } from 'vitest';
import { encodePartCells } from '../../../src/catalog/part-cells.js';
import { compileRowDecoder } from '../../../src/catalog/import/row-decoder.js';
import { PART_COLUMNS } from '../../../src/parts/index.js';
import { aPart } from '../../helpers/a-part.js';

// Counts the records that reach the reference decoder.
const calls = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../../src/catalog/part-cells.js', async (original) => {
  const actual = await original<typeof import('../../../src/catalog/part-cells.js')>();
  return { ...actual, decodePartCells: (...args: Parameters<typeof actual.decodePartCells>) => (calls.count++, actual.decodePartCells(...args)) };
});

describe('fast row decoder', () => {
  it('decodes exported parts of every kind family without the reference', () => {
    const decode = compileRowDecoder(PART_COLUMNS);
    const parts = [
      aPart('schottky', { irPoints: [{ irA: 5e-5, vrV: 40, tjK: 298.15 }], unitPrice: 0.04, currency: 'EUR', datasheetUrl: 'https://example.com/a.pdf' }),
      aPart('zener', { vzTempcoPerK: -3e-4, description: '=formula', approval: 'conditional', approvalNote: 'below 60 °C' }),
      aPart('tvs', { secondSourceGroup: 'G1', lifecycle: 'nrnd' }),
    ];
    for (const part of parts) {
      const cells = encodePartCells(part);
      expect(decode(PART_COLUMNS.map((c) => cells[c]!)).ok).toBe(true);
    }
    expect(calls.count).toBe(0);
    const bad = encodePartCells(parts[0]!);
    expect(decode(PART_COLUMNS.map((c) => (c === 'vrrm_v' ? '5 A' : bad[c]!))).ok).toBe(false);
    expect(calls.count).toBe(1);
  });
});
