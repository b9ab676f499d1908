import { describe, expect, it } from 'vitest';
import { memoryPager, sqlPager } from '../../src/tui/io/part-pager.js';
import { aPart } from '../helpers/a-part.js';
import { memoryCatalog } from './support/tui-services.js';

const parts = Array.from({ length: 30 }, (_, i) =>
  aPart(i % 3 === 0 ? 'zener' : 'schottky', { partNumber: `TW-${String(i).padStart(2, '0')}`, package: i % 2 ? 'SOD-123' : 'SMA' }),
);

describe('paging the catalog', () => {
  it('reads pages from SQLite in part-number order, nothing more', () => {
    const pager = sqlPager(memoryCatalog(parts).db);
    const page = pager('', 10, 5);
    expect(page.total).toBe(30);
    expect(page.parts.map((p) => p.partNumber)).toEqual(['TW-10', 'TW-11', 'TW-12', 'TW-13', 'TW-14']);
  });

  it('searches every word, separators ignored, and pages the matches', () => {
    const pager = sqlPager(memoryCatalog(parts).db);
    const page = pager('sod123 zener', 0, 3);
    expect(page.total).toBe(5);
    expect(page.parts.map((p) => p.partNumber)).toEqual(['TW-03', 'TW-09', 'TW-15']);
    expect(pager('sod123 zener tw2', 0, 10).parts.map((p) => p.partNumber)).toEqual(['TW-21', 'TW-27']);
    expect(pager('nothing-like-it', 0, 10)).toEqual({ parts: [], total: 0, isTotalCapped: false });
  });

  it('gives the same answers from memory with the injected search', () => {
    const pager = memoryPager(parts);
    expect(pager('sod123 zener', 0, 3).parts.map((p) => p.partNumber)).toEqual(['TW-03', 'TW-09', 'TW-15']);
    const calls: string[] = [];
    const stub = memoryPager(parts, (list, q) => (calls.push(q), list.slice(0, 1)));
    expect(stub('anything', 0, 5).total).toBe(1);
    expect(calls).toEqual(['anything']);
  });
});
