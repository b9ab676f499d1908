import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQuery } from '../../../src/selection/query/index.js';

function issues(text: string) {
  const result = parseQuery(text);
  if (result.ok) throw new Error(`expected issues for ${text}`);
  return result.issues.map(({ start, end, code, message }) => ({ start, end, code, message }));
}

describe('bad input', () => {
  it('names an unknown field, the closest one and all of them', () => {
    expect(issues('schottky vrm>=40V')).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-field",
          "end": 17,
          "message": "unknown field "vrm" in "vrm>=40V" (did you mean "vrrm"? fields: vrrm, if, ifsm, vf, trr, qrr, cj, tj, pd, vz, tol, vrwm, vbr, vc, ipp, pppm, price, kind, package, maker, approval, lifecycle, group)",
          "start": 9,
        },
      ]
    `);
  });

  it.each([
    ['vrrm>=2A', 'bad-value', 'expected a voltage after vrrm>=, got "2A" (a current)'],
    ['vrrm>=', 'bad-value', 'expected a voltage after vrrm>=, got nothing'],
    ['vrrm>=fast', 'bad-value', 'expected a voltage after vrrm>=, got "fast"'],
    ['trr<=50nF', 'bad-value', 'expected a time after trr<=, got "50nF" (a capacitance)'],
    ['price<=cheap', 'bad-value', 'expected a plain number after price<=, got "cheap"'],
    ['vrrm=40..', 'bad-value', 'expected a voltage after vrrm=40.., got nothing'],
    ['vrrm=100..40V', 'empty-range', 'the range 100..40V is empty: put the smaller value first'],
    ['vrrm>=40..100', 'bad-operator', 'a range needs "=", as in vrrm=40..100'],
    ['kind>=zener', 'bad-operator', 'only "=" works with kind, got ">=" in "kind>=zener"'],
    ['vrrm!=40', 'bad-operator', '"!=" is not an operator: write -vrrm=40 to leave those parts out'],
    ['kind=diode', 'bad-value', 'unknown kind "diode" in "kind=diode" (kinds: rectifier, fast-recovery, ultrafast, schottky, sic-schottky, zener, tvs-uni, tvs-bi, signal, tvs, sic)'],
    ['approval=ok', 'bad-value', 'unknown approval state "ok" in "approval=ok" (approval states: preferred, approved, conditional, pending, banned)'],
    ['lifecycle=eol', 'bad-value', 'unknown lifecycle state "eol" in "lifecycle=eol" (lifecycle states: active, nrnd, obsolete)'],
    ['maker=', 'bad-value', 'expected a value after maker=, got nothing (part of the maker name)'],
    ['maker=--', 'bad-value', 'expected part of a maker name after maker=, got "--"'],
    ['>=40', 'missing-field', 'expected a field name before ">=" in ">=40", as in vrrm>=40'],
    ['-', 'empty-term', 'nothing after "-": write -obsolete to leave out obsolete parts'],
    ['"low leakage', 'unclosed-quote', 'unclosed quote in "low leakage: close it with another "'],
  ])('%s', (text, code, message) => {
    expect(issues(text)).toEqual([{ start: 0, end: text.length, code, message }]);
  });

  it('reports every bad term in order, each at its own place', () => {
    expect(issues('zener vz=5.1A sma tol<=x').map(({ start, end }) => [start, end])).toEqual([
      [6, 13],
      [18, 24],
    ]);
  });
});

describe('any input', () => {
  it('never throws and answers every input with a result whose positions lie inside it', () => {
    const alphabet = fc.constantFrom(...' -"=<>.,:!%µ°abcdefvrmtiszAKV0123456789\t'.split(''));
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 80 }), fc.string({ unit: alphabet, maxLength: 80 })), (text) => {
        const result = parseQuery(text);
        const spans = result.ok ? [...result.query.words, ...result.query.filters] : result.issues;
        for (const s of spans) {
          expect(text.slice(s.start, s.end)).toBe(s.term);
          expect(s.start).toBeLessThan(s.end);
        }
      }),
      { numRuns: 2000 },
    );
  });

  it('reads a very long paste in bounded time', () => {
    const result = parseQuery('vrrm>=40V '.repeat(50_000));
    expect(result.ok).toBe(true);
  });
});
