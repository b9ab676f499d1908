import { describe, expect, it } from 'vitest';
import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { zenerRegulatorRole } from '../../src/circuits/roles/zener-regulator.js';
import { expectRelClose } from '../physics/expect-close.js';

const commercial = findPolicy('commercial')!;
const highRel = findPolicy('high-reliability')!;

function solve(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial) {
  return zenerRegulatorRole.solve(zenerRegulatorRole.schema.parse(conditions), policy);
}

function solved(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial): SolvedPosition {
  const result = solve(conditions, policy);
  if (!result.ok) throw new Error(`expected a design, got: ${result.infeasible.reason}`);
  return result.position;
}

const limit = (p: SolvedPosition, id: string) => p.limits.find((l) => l.id === id)!;
const messages = (conditions: Record<string, unknown>) => {
  const r = zenerRegulatorRole.schema.safeParse(conditions);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

// A 5.1 V reference fed from a 24 V rail (the demo catalog's D7), sized by hand below.
const reference = { vin_min: '18 V', vin_max: '32 V', vz: '5V1', load_max: '1 mA' };

describe('zener-regulator: Malvino & Bates 7th ed. Example 5-1 [published], analysed through the role', () => {
  // R = 820 Ω, VZ = 10 V, Vin 20–40 V, no load: IZ = 12.2–36.6 mA. Ideal parts: no tolerances, no tempco.
  const p = solved({ vin_min: '20 V', vin_max: '40 V', vz: '10 V', tolerance: 0, resistor_tolerance: 0, load_max: '0 A', resistor: '820 Ω' });

  it('gives IZ = 12.2 mA at 20 V and 36.6 mA at 40 V (published, rounded to 3 figures)', () => {
    expectRelClose(p.operatingPoint.zenerCurrentMinA!, 12.2e-3, 2e-3);
    expectRelClose(p.operatingPoint.zenerCurrentMaxA!, 36.6e-3, 2e-3);
  });

  it('keeps the given resistor and says it analyses rather than chooses', () => {
    expect(p.figures.rOhm).toBe(820);
    expect(p.steps.find((s) => s.symbol === 'R')!.quantity).toContain('given');
  });

  it('PZ = VZ·IZ,max = 10 V × 30 V/820 Ω = 365.9 mW (derived by hand)', () => {
    expectRelClose(p.figures.pzW!, 10 * (30 / 820), 1e-12);
  });
});

describe('zener-regulator: a 5.1 V reference from 18–32 V, ±5 % Zener and resistor (derived by hand)', () => {
  const p = solved(reference);
  // VZ 4.845–5.355 V; R,max = (18 − 5.355)/(1 mA + 1 mA) = 6322.5 Ω; ÷1.05 = 6021.4 Ω → E24 5.6 kΩ.
  it.each([
    ['rMaxOhm', 6322.5],
    ['rOhm', 5600],
    ['izMinA', (18 - 5.355) / 5880 - 1e-3], // 1.1505 mA at R·1.05 and IL,max
    ['izMaxA', (32 - 4.845) / 5320], // 5.1043 mA at R·0.95, no load
    ['pzW', 5.355 * ((32 - 4.845) / 5320)], // 27.33 mW, conservative mix VZ,max·IZ,max (diode-formulas §4)
    ['prW', (32 - 4.845) ** 2 / 5320], // 138.6 mW
  ])('%s = %d', (figure, expected) => {
    expectRelClose(p.figures[figure]!, expected, 1e-9);
  });

  it('chooses the largest E24 value at or below R,max/(1 + tol): 5.6 kΩ, not 6.2 kΩ (IEC 60063)', () => {
    expect(p.steps.find((s) => s.symbol === 'R')!.source).toContain('IEC 60063');
  });

  it('asks for PD ≥ PZ/0.8 (commercial) and PZ/0.5 under high reliability (NASA EEE-INST-002 Zener power 50 %, from memory)', () => {
    expectRelClose(limit(p, 'pz').bound, p.figures.pzW! / 0.8, 1e-12);
    const hr = solved(reference, highRel);
    expectRelClose(limit(hr, 'pz').bound, hr.figures.pzW! / 0.5, 1e-12);
    expect(limit(hr, 'pz').derating).toMatchObject({ policyId: 'high-reliability', factor: 'pd', value: 0.5 });
  });

  it('asks for the nominal VZ exactly, with the sizing window as a preference', () => {
    expect(p.limits.map((l) => [l.id, l.check.kind, l.check.relation, l.bound, l.isHard])).toEqual([
      ['vz-min', 'rating', 'at-least', 5.1, true],
      ['vz-max', 'rating', 'at-most', 5.1, true],
      ['vz-window-min', 'computed', 'at-least', 5.1 * 0.95, false],
      ['vz-window-max', 'computed', 'at-most', 5.1 * 1.05, false],
      ['pz', 'computed', 'at-least', limit(p, 'pz').bound, true],
      ['tj', 'computed', 'at-most', 25, true],
    ]);
  });

  it('notes that without a tempco only the sign is estimated (5.1 V: mixed, near zero; Sze & Ng §2.4.3, from memory)', () => {
    expect(p.cautions.map((c) => c.text).join('\n')).toContain('Expected sign only: near-zero (mixed breakdown)');
  });

  it('records every step finite, with a source', () => {
    for (const step of p.steps) {
      expect(Number.isFinite(step.value), step.quantity).toBe(true);
      expect(step.source, step.quantity).toBeTruthy();
    }
  });
});

describe('zener-regulator: tempco sign and window', () => {
  it.each([
    ['3V3', 'negative (zener breakdown)'],
    ['12 V', 'positive (avalanche breakdown)'],
  ])('%s without tempco: sign %s (Sze & Ng §2.4.3, from memory; away from the crossover)', (vz, sign) => {
    const p = solved({ vin_min: '20 V', vin_max: '24 V', vz, load_max: '1 mA' });
    expect(p.cautions.map((c) => c.text).join('\n')).toContain(`Expected sign only: ${sign}`);
  });

  it('with tempco the window spans tolerance and drift: 12 V ±5 %, +0.08 %/K, −20…50 °C → 10.99–12.85 V (by hand)', () => {
    const p = solved({ vin_min: '20 V', vin_max: '24 V', vz: '12 V', tempco: '0.08 %/K', load_max: '1 mA' });
    expectRelClose(p.figures.vzMinV!, 12 * 0.95 * (1 + 8e-4 * -45), 1e-9);
    expectRelClose(p.figures.vzMaxV!, 12 * 1.05 * (1 + 8e-4 * 25), 1e-9);
  });

  it('warns when VZ is not an E24 value and names the nearest (IEC 60063)', () => {
    const p = solved({ ...reference, vz: '5 V' });
    expect(p.cautions[0]!.text).toMatchInlineSnapshot(`"VZ 5.00 V is not an E24 value (IEC 60063), so few parts exist: nearest 5.10 V (neighbours 4.70 V and 5.10 V)."`);
  });
});

describe('zener-regulator: allowed output window', () => {
  it('turns vout_min/vout_max into computed zener-voltage limits and sizes R for their edges', () => {
    const p = solved({ ...reference, vout_min: '4.9 V', vout_max: '5.3 V' });
    expect(p.limits.slice(0, 2).map((l) => [l.id, l.check, l.bound])).toEqual([
      ['vz-min', { kind: 'computed', what: 'zener-voltage', relation: 'at-least' }, 4.9],
      ['vz-max', { kind: 'computed', what: 'zener-voltage', relation: 'at-most' }, 5.3],
    ]);
    expectRelClose(p.figures.rMaxOhm!, (18 - 5.3) / 2e-3, 1e-12);
    expect(p.cautions.some((c) => c.text.includes('only tighter parts pass'))).toBe(true);
  });
});

describe('zener-regulator: line and load regulation from ZZT (Malvino & Bates ch. 5)', () => {
  it('line regulation rz/(R + rz) and load regulation −(rz ∥ R)', () => {
    const p = solved({ ...reference, zzt: '60 Ω' });
    expectRelClose(p.figures.lineRegulation!, 60 / 5660, 1e-12);
    expectRelClose(p.figures.loadRegulationOhm!, -(60 * 5600) / 5660, 1e-12);
  });
});

describe('zener-regulator: infeasible designs', () => {
  it('no headroom: Vin,min below VZ,max', () => {
    const r = solve({ vin_min: '6 V', vin_max: '9 V', vz: '6V2', load_max: '1 mA' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.infeasible.reason).toMatchInlineSnapshot(`"no feasible design because Vin,min 6.00 V leaves no headroom above VZ,max 6.51 V"`);
  });

  it('a given resistor too large for the load', () => {
    const r = solve({ ...reference, load_max: '3 mA', resistor: '3k9' });
    expect(!r.ok && r.infeasible.reason).toMatchInlineSnapshot(`"no feasible design because with R = 3.90 kΩ (4.10 kΩ at +5.00 %) the Zener current at Vin,min 18.0 V and IL,max 3.00 mA falls to 87.9 µA, below IZ,min 1.00 mA; R must be at most 3.16 kΩ"`);
    expect(!r.ok && r.infeasible.steps.every((s) => Number.isFinite(s.value))).toBe(true);
  });
});

describe('zener-regulator: bad conditions', () => {
  it('names the field and what was expected', () => {
    const cases = {
      'min above max': { ...reference, vin_min: '40 V' },
      'negative magnitude': { ...reference, vz: '-5 V' },
      'missing condition': { vin_min: '18 V', vin_max: '32 V', load_max: '1 mA' },
      'wrong unit': { ...reference, load_max: '1 V' },
      'half a window': { ...reference, vout_min: '4.9 V' },
      'vz outside the window': { ...reference, vout_min: '5.2 V', vout_max: '5.5 V' },
      'tolerance typo': { ...reference, tolerance: '50 %' },
      'unknown condition': { ...reference, colour: 'blue' },
    };
    expect(Object.fromEntries(Object.entries(cases).map(([name, c]) => [name, messages(c)]))).toMatchInlineSnapshot(`
      {
        "half a window": [
          "vout_max: vout_max is required with vout_min: give the allowed output window as both",
        ],
        "min above max": [
          "vin_min: vin_min 40.0 V is above vin_max 32.0 V",
        ],
        "missing condition": [
          "vz: required condition is missing: a voltage such as "600 V", "2 kV" or "5V1"",
        ],
        "negative magnitude": [
          "vz: expected a positive voltage, got "-5 V"",
        ],
        "tolerance typo": [
          "tolerance: expected a ratio of at most 20.0 %, got "50 %"",
        ],
        "unknown condition": [
          ": Unrecognized key: "colour"",
        ],
        "vz outside the window": [
          "vz: vz 5.10 V is outside the window vout_min 5.20 V … vout_max 5.50 V",
        ],
        "wrong unit": [
          "load_max: expected a current, got "1 V" (a voltage)",
        ],
      }
    `);
  });
});

describe('zener-regulator: a given tempco against the mechanism', () => {
  it('questions a negative tempco at 12 V, where avalanche gives a positive one (Sze & Ng §2.4.3, from memory)', () => {
    const p = solved({ vin_min: '20 V', vin_max: '24 V', vz: '12 V', tempco: '-0.08 %/K', load_max: '1 mA' });
    expect(p.cautions.some((c) => c.text.includes('opposite sign to avalanche breakdown'))).toBe(true);
  });
});
