import { describe, expect, it } from 'vitest';
import {
  headlineVfV,
  matchesFilters,
  matchesWords,
  parseQuery,
  searchableText,
  type SearchQuery,
} from '../../../src/selection/query/index.js';
import { aPart } from '../../helpers/a-part.js';

function query(text: string): SearchQuery {
  const result = parseQuery(text);
  if (!result.ok) throw new Error(result.issues[0]!.message);
  return result.query;
}

const schottky = aPart('schottky', {
  manufacturer: 'Brackwater Semiconductor',
  partNumber: 'BWS3-40A',
  description: 'low leakage',
  vfPoints: [
    { vfV: 0.42, ifA: 0.5, tjK: 298.15 },
    { vfV: 0.55, ifA: 3, tjK: 298.15 },
    { vfV: 0.45, ifA: 3, tjK: 398.15 },
  ],
});

describe('filters on one part', () => {
  it.each([
    ['vrrm>=40V', true],
    ['vrrm>40V', false],
    ['vrrm=40', true],
    ['vrrm=30..40V', true],
    ['schottky sma', true],
    ['DO-214AC', true], // another spelling of SMA
    ['sod123', false],
    ['maker=brack', true],
    ['maker="brackwater semi"', true],
    ['-maker=brackwater', false],
    ['pending active', true],
    ['-pending', false],
    ['trr<=50ns', false], // no trr given: a filter on it cannot hold…
    ['-trr<=50ns', true], // …and its negation does
    ['vf<=0.55V', true],
    ['vf<0.55V', false],
  ])('%s → %s', (text, expected) => {
    expect(matchesFilters(schottky, query(text).filters)).toBe(expected);
  });

  it('takes the headline VF at the lowest temperature and highest current', () => {
    expect(headlineVfV(schottky)).toBe(0.55);
    expect(headlineVfV(aPart('zener'))).toBeUndefined();
  });
});

describe('words on one part', () => {
  const text = searchableText(schottky);

  it.each([
    ['bws3', true],
    ['BWS3-40A', true],
    ['40a', true],
    ['lowleak', true],
    ['"low leakage" brackwater', true],
    ['B', true], // a short word alone: the start of the part number
    ['S', false],
    ['S brack', true], // with a longer word, anywhere
    ['-leakage', false],
    ['bws -automotive', true],
  ])('%s → %s', (q, expected) => {
    expect(matchesWords(text, query(q).words)).toBe(expected);
  });
});
