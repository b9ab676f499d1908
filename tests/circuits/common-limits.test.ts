import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { BUILT_IN_POLICIES, findPolicy, tjCeilingK, type DeratingPolicy } from '../../src/circuits/derating.js';
import { Derivation } from '../../src/circuits/derivation.js';
import {
  ambientShape,
  checkMinMax,
  ifAvLimit,
  ifsmLimit,
  junctionTemperatureLimit,
  rectifyingLimits,
  requiredQuantity,
  switchingKinds,
  vrrmLimit,
  withAllowance,
} from '../../src/circuits/roles/common-limits.js';

const policy = (id: string): DeratingPolicy => findPolicy(id) as DeratingPolicy;
const C = 273.15;

describe('derated rating limits', () => {
  // Factors from derating.ts: commercial and industrial VRRM 0.8 (common practice / RAC), high-reliability 0.7 (NASA EEE-INST-002, from memory).
  it.each([
    ['commercial', 0.8],
    ['industrial', 0.8],
    ['high-reliability', 0.7],
  ])('VRRM under %s is the worst reverse voltage ÷ %f', (id, factor) => {
    const d = new Derivation();
    const limit = vrrmLimit(d, 373, policy(id));
    expect(limit.bound).toBeCloseTo(373 / factor, 9);
    expect(limit).toMatchObject({
      id: 'vrrm',
      label: 'VRRM',
      check: { kind: 'rating', rating: 'vrrmV', relation: 'at-least' },
      quantity: 'voltage',
      stress: 373,
      derating: { policyId: id, factor: 'vrrm', value: factor, source: policy(id).factors.vrrm.source },
      isHard: true,
    });
    expect(d.steps).toHaveLength(1);
    expect(d.steps[0]?.value).toBe(limit.bound);
  });

  it('writes the reason in engineering terms', () => {
    const d = new Derivation();
    expect(vrrmLimit(d, 373, policy('commercial')).reason).toBe('worst reverse voltage 373 V ÷ 0.80 (commercial VRRM factor)');
    expect(ifAvLimit(d, 1.375, policy('high-reliability')).reason).toBe('average forward current 1.38 A ÷ 0.50 (high-reliability IF(AV) factor)');
    expect(ifsmLimit(d, 19, 0.01, policy('industrial'), 'switch-on inrush').reason).toBe('switch-on inrush 19.0 A for 10.0 ms ÷ 0.70 (industrial IFSM factor)');
  });
});

describe('junction-temperature limit', () => {
  it('carries the policy margin, finite, as a temperature difference', () => {
    expect(junctionTemperatureLimit(policy('commercial'))).toEqual({
      id: 'tj',
      label: 'Tj',
      check: { kind: 'computed', what: 'junction-temperature', relation: 'at-most' },
      bound: 25,
      quantity: 'temperature-difference',
      stress: 25,
      derating: { policyId: 'commercial', factor: 'tj', value: 25, source: policy('commercial').tj.source },
      reason: "Tj at least 25 K below the part's Tj max (commercial)",
      isHard: true,
    });
  });

  it('names the absolute ceiling when the policy has one', () => {
    expect(junctionTemperatureLimit(policy('high-reliability')).reason).toBe(
      "Tj at least 40 K below the part's Tj max and at most 125 °C, whichever is lower (high-reliability)",
    );
  });

  it('is what selection turns into a ceiling with tjCeilingK', () => {
    // NASA EEE-INST-002 (from memory): Tj ≤ 125 °C or Tj max − 40 °C, whichever is lower.
    const hr = policy('high-reliability');
    expect(tjCeilingK(hr, 175 + C)).toBeCloseTo(125 + C, 9);
    expect(tjCeilingK(hr, 150 + C)).toBeCloseTo(150 + C - junctionTemperatureLimit(hr).bound, 9);
  });
});

describe('rectifyingLimits', () => {
  it('builds VRRM, IF(AV), IFSM and Tj from the fields the operating point has, in that order', () => {
    const d = new Derivation();
    const op = { ambientMinK: 253.15, ambientMaxK: 323.15, reversePeakV: 40, forwardAvgA: 1, surgeA: 20, surgePulseS: 0.005 };
    const limits = rectifyingLimits(d, op, policy('commercial'));
    expect(limits.map((l) => [l.id, l.bound])).toEqual([
      ['vrrm', 50],
      ['if-av', 1 / 0.9],
      ['ifsm', 25],
      ['tj', 25],
    ]);
    expect(d.steps.map((s) => s.symbol)).toEqual(['VRRM,min', 'IF(AV),min', 'IFSM,min']);
  });

  it('leaves out what the position does not stress', () => {
    const limits = rectifyingLimits(new Derivation(), { ambientMinK: 253.15, ambientMaxK: 323.15, reversePeakV: 24 }, policy('commercial'));
    expect(limits.map((l) => l.id)).toEqual(['vrrm', 'tj']);
  });

  it('gives every built-in policy finite bounds', () => {
    for (const p of BUILT_IN_POLICIES) {
      const limits = rectifyingLimits(new Derivation(), { ambientMinK: 253.15, ambientMaxK: 323.15, reversePeakV: 400, forwardAvgA: 0.5, surgeA: 30, surgePulseS: 0.01 }, p);
      for (const l of limits) expect(Number.isFinite(l.bound), `${p.id} ${l.id}`).toBe(true);
    }
  });
});

describe('condition helpers', () => {
  const schema = z
    .object({ vin_min: requiredQuantity('voltage', { positive: true }), vin_max: requiredQuantity('voltage', { positive: true }), ...ambientShape() })
    .strict()
    .superRefine((c, ctx) => checkMinMax(ctx, c, 'vin_min', 'vin_max', 'voltage'));
  const issues = (input: unknown) => {
    const r = schema.safeParse(input);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };

  it('says a required condition is missing and what to write', () => {
    expect(issues({ vin_max: '16 V' })).toEqual(['vin_min: required condition is missing: a voltage such as "600 V", "2 kV" or "5V1"']);
  });

  it('reports a wrong unit and a negative magnitude', () => {
    expect(issues({ vin_min: '5 A', vin_max: '-16 V' })).toEqual([
      'vin_min: expected a voltage, got "5 A" (a current)',
      'vin_max: expected a positive voltage, got "-16 V"',
    ]);
  });

  it('reports min above max on the min field', () => {
    expect(issues({ vin_min: '20 V', vin_max: '16 V' })).toEqual(['vin_min: vin_min 20.0 V is above vin_max 16.0 V']);
  });

  it('defaults the ambient to −20 … 50 °C and leaves RθJA unset', () => {
    expect(schema.parse({ vin_min: 9, vin_max: 16 })).toEqual({ vin_min: 9, vin_max: 16, ambient_min: C - 20, ambient_max: C + 50 });
    expect(schema.parse({ vin_min: 9, vin_max: 16, ambient_max: '85 °C', rth_ja: '120 °C/W' })).toMatchObject({ ambient_max: 358.15, rth_ja: 120 });
  });

  it('records a ringing allowance as a step', () => {
    const d = new Derivation();
    expect(withAllowance(d, 16, 0.2, 'common practice')).toBeCloseTo(19.2, 12);
    expect(d.steps[0]).toMatchObject({ symbol: 'VR,pk', substituted: '16.0 V·(1 + 20.0 %)' });
  });
});

describe('switchingKinds', () => {
  // Common practice: Schottky diodes to 150–200 V, ultrafast or SiC Schottky above.
  it.each([
    [24, ['schottky', 'ultrafast']],
    [150, ['schottky', 'ultrafast']],
    [200, ['ultrafast', 'schottky']],
    [600, ['ultrafast', 'sic-schottky']],
  ])('VRRM %d V → %j', (v, kinds) => {
    expect(switchingKinds(v)).toEqual(kinds);
  });
});
