import { describe, expect, it } from 'vitest';
import { parseQuery, type QueryFilter, type SearchQuery } from '../../../src/selection/query/index.js';

function query(text: string): SearchQuery {
  const result = parseQuery(text);
  if (!result.ok) throw new Error(result.issues.map((i) => i.message).join('; '));
  return result.query;
}

/** The filter's meaning without its position, for compact tables. */
function meaning(f: QueryFilter): Record<string, unknown> {
  const { term: _t, start: _s, end: _e, ...rest } = f;
  return rest;
}

/** Equal to a part in 10^8: bounds are given a hair of room (see the test below). */
const near = (v: number) => ({
  asymmetricMatch: (x: unknown) => typeof x === 'number' && Math.abs(x - v) <= Math.abs(v) * 1e-8,
  toString: () => `near ${v}`,
});

describe('numeric filters', () => {
  it.each([
    ['vrrm>=40V', 'vrrmV', { min: near(40) }],
    ['vrrm>=40', 'vrrmV', { min: near(40) }], // bare numbers in the field's unit
    ['if>=2A', 'ifAvA', { min: near(2) }],
    ['io>=500mA', 'ifAvA', { min: near(0.5) }],
    ['ifsm>=30', 'ifsmA', { min: near(30) }],
    ['vf<=0.5V', 'vfPoints', { max: near(0.5) }],
    ['trr<=50ns', 'trrS', { max: near(50e-9) }],
    ['qrr<10nC', 'qrrC', { max: near(10e-9), isMaxExclusive: true }],
    ['cj<=15pF', 'cjF', { max: near(15e-12) }],
    ['tj>=150C', 'tjMaxK', { min: near(423.15) }],
    ['tj>=150', 'tjMaxK', { min: near(423.15) }], // bare temperatures in °C
    ['pd>=0.5W', 'pdW', { min: near(0.5) }],
    ['vz=5.1V', 'vzV', { min: near(5.1), max: near(5.1) }],
    ['vz=5V1', 'vzV', { min: near(5.1), max: near(5.1) }],
    ['tol<=2%', 'vzTol', { max: near(0.02) }],
    ['tol<=2', 'vzTol', { max: near(0.02) }], // bare tolerances in %
    ['vrwm>=24V', 'vrwmV', { min: near(24) }],
    ['vbr>30', 'vbrMinV', { min: near(30), isMinExclusive: true }],
    ['vc<=40V', 'vcV', { max: near(40) }],
    ['ipp>=10A', 'ippA', { min: near(10) }],
    ['pppm>=600W', 'pppmW', { min: near(600) }],
    ['pppm>=1.5kW', 'pppmW', { min: near(1500) }],
    ['price<=0.1', 'unitPrice', { max: near(0.1) }],
    ['vrrm=40..100V', 'vrrmV', { min: near(40), max: near(100) }],
    ['vrrm=40V..100', 'vrrmV', { min: near(40), max: near(100) }],
    ['VRRM>=40V', 'vrrmV', { min: near(40) }],
  ])('%s compares %s', (text, key, bounds) => {
    const [filter] = query(text).filters;
    expect(filter).toMatchObject({ type: 'number', key, isNegated: false, ...bounds });
  });

  it('gives every bound a hair of room, so a value written as stored always matches', () => {
    const f = query('vrrm>=40V').filters[0] as { min: number };
    expect(f.min).toBeLessThan(40);
    expect(f.min).toBeGreaterThan(39.9999);
  });
});

describe('choice filters and keywords', () => {
  it.each([
    ['schottky', { type: 'kind', values: ['schottky'] }],
    ['tvs', { type: 'kind', values: ['tvs-uni', 'tvs-bi'] }],
    ['sic', { type: 'kind', values: ['sic-schottky'] }],
    ['Fast-Recovery', { type: 'kind', values: ['fast-recovery'] }],
    ['kind=zener,tvs-bi', { type: 'kind', values: ['zener', 'tvs-bi'] }],
    ['sod123', { type: 'package', values: ['SOD-123'] }],
    ['DO-214AC', { type: 'package', values: ['SMA'] }],
    ['package=sod-123f', { type: 'package', values: ['SOD-123F'] }],
    ['pkg=PowerDI5', { type: 'package', values: ['PowerDI5'] }], // unknown packages compare as typed
    ['preferred', { type: 'approval', values: ['preferred'] }],
    ['approval=approved,conditional', { type: 'approval', values: ['approved', 'conditional'] }],
    ['obsolete', { type: 'lifecycle', values: ['obsolete'] }],
    ['lifecycle=nrnd', { type: 'lifecycle', values: ['nrnd'] }],
    ['maker=brackwater', { type: 'maker', values: ['brackwater'] }],
    ['maker="Ketterby Components"', { type: 'maker', values: ['ketterbycomponents'] }],
    ['group=R1A1K-DO41', { type: 'group', values: ['R1A1K-DO41'] }],
  ])('%s', (text, expected) => {
    expect(meaning(query(text).filters[0]!)).toEqual({ ...expected, isNegated: false });
  });

  it('negates any filter with a leading minus', () => {
    expect(query('-obsolete -maker=ketterby -vrrm>=1000V').filters.map((f) => [f.type, f.isNegated])).toEqual([
      ['lifecycle', true],
      ['maker', true],
      ['number', true],
    ]);
  });
});

describe('free text', () => {
  it('keeps other words as text, squashed, with their positions', () => {
    expect(query('KTR-1A1000 "low leakage" -automotive').words).toEqual([
      { term: 'KTR-1A1000', start: 0, end: 10, text: 'KTR1A1000', isNegated: false },
      { term: '"low leakage"', start: 11, end: 24, text: 'lowleakage', isNegated: false },
      { term: '-automotive', start: 25, end: 36, text: 'automotive', isNegated: true },
    ]);
  });

  it('reads the examples of docs/search.md', () => {
    const q = query('schottky sma vrrm>=40V if>=2A');
    expect(q.words).toEqual([]);
    expect(q.filters.map((f) => f.type)).toEqual(['kind', 'package', 'number', 'number']);
    expect(query('').words).toEqual([]);
    expect(query('  -1000  ').words[0]).toMatchObject({ text: '1000', isNegated: true, start: 2, end: 7 });
  });

  it('drops terms of punctuation alone', () => {
    expect(query('/ -- KTR').words.map((w) => w.text)).toEqual(['KTR']);
  });
});
