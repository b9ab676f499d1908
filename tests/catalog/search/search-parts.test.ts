import { afterEach, describe, expect, it } from 'vitest';
import type { Catalog } from '../../../src/catalog/index.js';
import { searchPartList, searchParts, type SearchOutcome } from '../../../src/catalog/search/index.js';
import { fixtureCatalog, fixtureParts } from './search-fixture.js';

let catalog: Catalog | undefined;
afterEach(() => {
  catalog?.close();
  catalog = undefined;
});

function found(text: string, limit = 50): { numbers: string[]; matched: string[]; outcome: SearchOutcome } {
  catalog ??= fixtureCatalog();
  const outcome = searchParts(catalog, text, { limit });
  if (!outcome.ok) throw new Error(outcome.issues.map((i) => i.message).join('; '));
  return { numbers: outcome.results.map((h) => h.part.partNumber), matched: [...new Set(outcome.results.map((h) => h.matched))], outcome };
}

describe('text', () => {
  it('puts the exact part number first with score 1, whatever its separators and case', () => {
    for (const text of ['KTR-1A1000-L', 'ktr1a1000l', 'KTR 1A1000 L']) {
      const { numbers, outcome } = found(text);
      expect(numbers[0]).toBe('KTR-1A1000-L');
      expect(outcome.ok && outcome.results[0]!.score).toBe(1);
    }
  });

  it('finds part numbers from their first characters, as typed', () => {
    expect(found('K').numbers).toEqual(['KTR-1A600-L', 'KTU-2A600-A', 'KTR-1A1000-L']);
    expect(found('KTR-1').numbers).toEqual(['KTR-1A600-L', 'KTR-1A1000-L']);
  });

  it('finds a word anywhere in part number, maker, package or description', () => {
    expect(found('1A600').numbers).toEqual(['KTR-1A600-L']);
    expect(found('ketterby').numbers).toEqual(['KTR-1A600-L', 'KTU-2A600-A', 'KTR-1A1000-L']);
    expect(found('automotive').numbers).toEqual(['AG-SK100-S']);
    expect(found('low leakage').numbers).toEqual(['AG-SK100-S']);
    expect(found('"leakage, automotive"').numbers).toEqual([]);
  });

  it('leaves out parts containing a negated word', () => {
    expect(found('velmora -5V1').numbers).toEqual(['VPT-24CA-B']);
  });
});

describe('typos', () => {
  it.each([
    ['one character wrong', 'KTR-1A1O00-L'],
    ['one character missing', 'KTR-1A100-L'.replace('100', '10')],
    ['one character extra', 'KTR-1A10000-L'],
    ['two characters swapped', 'KTR-A11000-L'],
    ['a slip and no hyphens', 'ktr1a1000k'],
  ])('%s: %s', (_slip, text) => {
    const { numbers, matched } = found(text);
    expect(numbers[0]).toBe('KTR-1A1000-L');
    expect(matched).toEqual(['fuzzy']);
  });

  it('forgives a slip in a maker name', () => {
    const { numbers, matched } = found('brakwater');
    expect(numbers.sort()).toEqual(['BWS1-40W', 'BWS3-40A']);
    expect(matched).toEqual(['fuzzy']);
  });

  it('keeps exact matches when there are any, without fuzzy ones', () => {
    expect(found('KTR-1A6').matched).toEqual(['exact']);
  });
});

describe('filters', () => {
  it.each([
    ['schottky sma vrrm>=40V if>=2A', ['BWS3-40A']],
    ['sod123 schottky', ['BWS1-40W']],
    ['zener vz=5.1V tol<=2%', ['VPZ-5V1C-W']],
    ['tvs vrwm>=24V pppm>=600W approval=preferred', ['VPT-24CA-B']],
    ['maker=ketterby -nrnd', ['KTU-2A600-A', 'KTR-1A1000-L']],
    ['-obsolete tvs', ['VPT-24CA-B']],
    ['ultrafast trr<=50ns cj<=15pF', ['KTU-2A600-A']],
    ['tj>=150C zener', ['VPZ-5V1C-W', 'VPZ-5V1B-W']],
    ['price<=0.0155', ['KTR-1A600-L']],
    ['vrrm=500..700V', ['KTR-1A600-L', 'KTU-2A600-A']],
    ['vf<=0.45V', ['BWS1-40W']],
    ['vf>=0.6V', ['AG-SK100-S']], // its headline point is 0.7 V at 1 A, not 0.3 V at 0.1 A
    ['group=uf2a600-sma', ['KTU-2A600-A']],
    ['maker=nobody', []],
  ])('%s', (text, expected) => {
    expect(found(text).numbers).toEqual(expected);
  });

  it('orders by approval when nothing else tells parts apart: preferred first', () => {
    expect(found('schottky').numbers).toEqual(['AG-SK100-S', 'BWS1-40W', 'BWS3-40A']);
  });

  it('gives the total when every match was looked at, and keeps to the limit', () => {
    const { outcome, numbers } = found('ketterby', 2);
    expect(numbers).toHaveLength(2);
    expect(outcome.ok && outcome.total).toBe(3);
  });

  it('answers bad input with the issues instead of results', () => {
    catalog = fixtureCatalog();
    expect(searchParts(catalog, 'schottky vrm>=40V')).toMatchObject({ ok: false, issues: [{ term: 'vrm>=40V', start: 9, end: 17, code: 'unknown-field' }] });
  });
});

describe('in memory', () => {
  it.each([
    'KTR-1A1000-L', 'K', 'KTR-1', '1A600', 'ketterby', 'low leakage', 'velmora -5V1', 'KTR-1A1O00-L', 'brakwater',
    'schottky sma vrrm>=40V if>=2A', 'zener vz=5.1V tol<=2%', 'maker=ketterby -nrnd', 'vf>=0.6V', 'schottky', '',
  ])('finds what the catalog search finds: %s', (text) => {
    const inMemory = searchPartList(fixtureParts(), text);
    if (!inMemory.ok) throw new Error('parse');
    expect(inMemory.results.map((h) => [h.part.partNumber, h.matched, h.score])).toEqual(
      (found(text).outcome as Extract<SearchOutcome, { ok: true }>).results.map((h) => [h.part.partNumber, h.matched, h.score]),
    );
  });
});

describe('long queries', () => {
  it('are not retried for typos past four words, and stay quick', () => {
    expect(found('KTR-1A1O00-L a1 b2 c3 d4').numbers).toEqual([]);
    expect(found('KTR-1A1O00-L '.repeat(150)).numbers).toEqual([]);
  });
});

describe('limits', () => {
  it('accepts any limit, keeping it between 1 and 5000', () => {
    expect(found('ketterby', Infinity).numbers).toHaveLength(3);
    expect(found('ketterby', 0).numbers).toHaveLength(1);
    expect(found('ketterby', Number.NaN).numbers).toHaveLength(3);
  });
});
