import { describe, expect, it } from 'vitest';
import { normalisePackage, requiredRatings } from '../../src/parts/index.js';
import { partSchema } from '../../src/parts/part-schema.js';
import { aPart } from '../helpers/a-part.js';

const messages = (input: unknown) => {
  const r = partSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('part schema', () => {
  it('accepts a complete part of each family and fills the defaults', () => {
    const p = aPart('schottky');
    expect(p).toMatchObject({ lifecycle: 'active', approval: 'pending', description: '', irPoints: [] });
    expect(aPart('zener').kind).toBe('zener');
    expect(aPart('tvs').kind).toBe('tvs-uni');
  });

  it('names every rating a kind requires when it is missing', () => {
    const { vrrmV: _v, tjMaxK: _t, ...rest } = aPart('schottky');
    expect(messages({ ...rest, vfPoints: [] })).toEqual([
      'vrrmV: required for this kind of part',
      'vfPoints: at least one VF point is required for this kind of part',
      'tjMaxK: required for this kind of part',
    ]);
    expect(messages({ ...aPart('zener'), vzTol: undefined })).toEqual(['vzTol: required for this kind of part']);
  });

  it('rejects an unknown kind', () => {
    expect(messages({ ...aPart(), kind: 'schotky' })).toHaveLength(1);
  });

  it.each([
    ['VRWM at or above VBR min', { vrwmV: 40 }, 'vrwmV: VRWM 40.0 V must be below VBR min 36.7 V'],
    ['VC not above VBR', { vcV: 40 }, 'vcV: VC 40.0 V must be above VBR 40.6 V: the clamp voltage includes the dynamic drop'],
    ['VBR max below VBR min', { vbrMaxV: 30 }, 'vbrMaxV: VBR max 30.0 V is below VBR min 36.7 V'],
    ['pulse decay not longer than rise', { pppmDecayS: 5e-6 }, 'pppmDecayS: the pulse decay time must be longer than its rise time (for example 10/1000 µs)'],
  ])('checks TVS relations: %s', (_name, override, message) => {
    expect(messages({ ...aPart('tvs'), ...override })).toEqual([message]);
  });

  it('checks rectifier relations: IFSM below IF(AV) and leakage measured above VRRM', () => {
    expect(messages({ ...aPart(), ifsmA: 1 })).toEqual(['ifsmA: IFSM must not be below IF(AV): a surge rating is a peak, not an average']);
    expect(messages({ ...aPart(), irPoints: [{ irA: 1e-3, vrV: 60, tjK: 298.15 }] })).toEqual([
      'irPoints: an IR point is at VR 60.0 V, above VRRM 40.0 V',
    ]);
  });

  it('needs the condition of a conditional approval and the currency of a price', () => {
    expect(messages({ ...aPart(), approval: 'conditional' })).toEqual(['approvalNote: a conditional approval needs its condition in approval_note']);
    expect(messages({ ...aPart(), unitPrice: 0.1 })).toEqual(['currency: a unit price needs its currency, such as EUR']);
  });

  it('refuses control characters in identity fields', () => {
    expect(messages({ ...aPart(), partNumber: 'AB\u001b[31mC' })).toEqual(['partNumber: must not contain control characters']);
  });

  it.each([
    ['sod123', 'SOD-123'],
    ['DO-214AC', 'SMA'],
    ['do214aa', 'SMB'],
    ['minimelf', 'SOD-80'],
    ['  TO-220AC ', 'TO-220AC'],
    ['Custom-7', 'Custom-7'],
  ])('normalises package "%s" to "%s"', (typed, canonical) => {
    expect(normalisePackage(typed)).toBe(canonical);
    expect(aPart('schottky', { package: typed }).package).toBe(canonical);
  });
});

describe('required ratings', () => {
  // Ranking trusts requiredRatings() to know which columns are never empty; the schema decides.
  it('lists exactly the ratings each kind\'s schema refuses to leave out', async () => {
    const { rectifyingPartSchema, zenerPartSchema, tvsPartSchema } = await import('../../src/parts/part-schema.js');
    const identity = new Set(['manufacturer', 'partNumber', 'package', 'kind']);
    for (const [kind, schema] of [['schottky', rectifyingPartSchema], ['zener', zenerPartSchema], ['tvs-uni', tvsPartSchema]] as const) {
      const shape = schema.shape as Record<string, { safeParse(v: unknown): { success: boolean } }>;
      const required = Object.keys(shape).filter((key) => !identity.has(key) && !shape[key]!.safeParse(undefined).success);
      expect(required.sort()).toEqual([...requiredRatings(kind)].sort());
    }
  });
});
