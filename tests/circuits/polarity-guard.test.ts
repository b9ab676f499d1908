import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { polarityGuardRole } from '../../src/circuits/roles/polarity-guard.js';
import { expectRelClose } from '../physics/expect-close.js';

const commercial = findPolicy('commercial')!;

function solve(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial) {
  return polarityGuardRole.solve(polarityGuardRole.schema.parse(conditions), policy);
}

function solved(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial): SolvedPosition {
  const result = solve(conditions, policy);
  if (!result.ok) throw new Error(`expected a design, got: ${result.infeasible.reason}`);
  return result.position;
}

const limit = (p: SolvedPosition, id: string) => p.limits.find((l) => l.id === id);
const bounds = (p: SolvedPosition) => Object.fromEntries(p.limits.map((l) => [l.id, l.bound]));

// The demo catalog's D1: 24 V control feed, a reversed surge clamped by the TVS at about 53 V.
const controlFeed = { supply_max: '32 V', reverse_max: '53 V', load_max: '0.6 A', load_peak: '1.5 A', peak_duration: '5 ms' };

describe('polarity-guard, series (derived by hand)', () => {
  it.each([
    ['commercial', { vrrm: 53 / 0.8, 'if-av': 0.6 / 0.9, ifsm: 1.5 / 0.8 }],
    // NASA EEE-INST-002 diode derating (from memory): PIV 70 %, IF 50 %, surge 50 %.
    ['high-reliability', { vrrm: 53 / 0.7, 'if-av': 0.6 / 0.5, ifsm: 1.5 / 0.5 }],
  ])('%s policy: VRRM, IF(AV) and IFSM are the stresses over the policy factors', (policyId, expected) => {
    const b = bounds(solved(controlFeed, findPolicy(policyId)!));
    for (const [id, value] of Object.entries(expected)) expectRelClose(b[id]!, value, 1e-12);
  });

  it('takes the reverse voltage as the supply maximum when reverse_max is not given', () => {
    const p = solved({ supply_max: '32 V', load_max: '0.6 A' });
    expect(limit(p, 'vrrm')!.stress).toBe(32);
    expect(limit(p, 'ifsm')).toBeUndefined();
  });

  it('conducts continuously: duty 1, IF(AV) = load; no blocking loss in normal running', () => {
    expect(solved(controlFeed).operatingPoint).toMatchObject({ forwardAvgA: 0.6, forwardDuty: 1, reverseDuty: 0, surgeA: 1.5, surgePulseS: 0.005 });
  });

  it('estimates the forward loss with a stated assumed VF, for orientation: 0.5 V × 0.6 A = 0.3 W (common practice)', () => {
    const p = solved(controlFeed);
    expectRelClose(p.figures.lossEstimateW!, 0.3, 1e-12);
    expect(p.steps.find((s) => s.symbol === 'PF')!.quantity).toContain('assumed VF 500 mV');
  });

  it('always adds the Tj limit with the policy margin', () => {
    expect(limit(solved(controlFeed), 'tj')).toMatchObject({ check: { kind: 'computed', what: 'junction-temperature' }, bound: 25, quantity: 'temperature-difference' });
  });

  it('turns drop and dissipation budgets into computed limits', () => {
    const p = solved({ ...controlFeed, drop_max: '0.45 V', dissipation_max: '0.5 W' });
    expect(limit(p, 'vf')).toMatchObject({ check: { kind: 'computed', what: 'forward-drop', relation: 'at-most' }, bound: 0.45 });
    expect(limit(p, 'dissipation')).toMatchObject({ check: { kind: 'computed', what: 'dissipation', relation: 'at-most' }, bound: 0.5 });
  });

  it('suits a Schottky first at low voltage and a rectifier above 100 V (common practice)', () => {
    expect(solved(controlFeed).suitableKinds[0]).toBe('schottky');
    expect(solved({ supply_max: '230 V', load_max: '0.2 A' }).suitableKinds[0]).toBe('rectifier');
  });

  it('adds the safety caution above 120 V DC only (IEC 60449 band I, from memory)', () => {
    expect(solved({ supply_max: '230 V', load_max: '0.2 A' }).cautions).toContainEqual(SAFETY_CAUTION);
    expect(solved(controlFeed).cautions).not.toContainEqual(SAFETY_CAUTION);
  });

  it('warns when the peak outlasts the 10 ms IFSM rating pulse', () => {
    const p = solved({ ...controlFeed, peak_duration: '50 ms' });
    expect(p.cautions.some((c) => c.text.includes('surge-current-versus-time'))).toBe(true);
  });

  it('records every step finite', () => {
    for (const step of solved(controlFeed).steps) expect(Number.isFinite(step.value), step.quantity).toBe(true);
  });
});

describe('polarity-guard, OR-ing (derived by hand)', () => {
  const oring = { mode: 'oring', supply_max: '24 V', other_source_max: '28 V', load_max: '2 A', leakage_max: '1 mA' };

  it('blocks the other source when this one is off: VR = 28 V', () => {
    expect(limit(solved(oring), 'vrrm')!.stress).toBe(28);
  });

  it('adds a reversed input to the other source: VR = 28 V + 24 V', () => {
    expect(limit(solved({ ...oring, reverse_max: '24 V' }), 'vrrm')!.stress).toBe(52);
  });

  it('checks back-feed leakage at the hot junction and cautions about Schottky leakage', () => {
    const p = solved(oring);
    expect(limit(p, 'ir')).toMatchObject({ check: { kind: 'computed', what: 'leakage-at-temperature', relation: 'at-most' }, bound: 1e-3 });
    expect(limit(p, 'ir')!.reason).toContain('back-fed');
    expect(p.cautions.some((c) => c.text.includes("Schottky's reverse leakage"))).toBe(true);
  });
});

describe('polarity-guard: infeasible designs', () => {
  it.each([
    [{ ...controlFeed, drop_max: '50 mV' }],
    [{ ...controlFeed, load_max: '1 A', dissipation_max: '10 mW' }],
  ])('%o', (conditions) => {
    const r = solve(conditions);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.infeasible.reason).toMatch(/^no feasible design because .* ideal-diode \(MOSFET\) controller$/);
  });
});

describe('polarity-guard: bad conditions', () => {
  it('names the field and what was expected', () => {
    const messages = (c: Record<string, unknown>) => {
      const r = polarityGuardRole.schema.safeParse(c);
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    };
    const cases = {
      'negative magnitude': { ...controlFeed, reverse_max: '-32 V' },
      'peak below load': { ...controlFeed, load_peak: '0.3 A' },
      'peak without duration': { supply_max: '32 V', load_max: '0.6 A', load_peak: '1.5 A' },
      'oring without the other source': { mode: 'oring', supply_max: '24 V', load_max: '2 A' },
      'missing condition': { supply_max: '32 V' },
      'wrong unit': { ...controlFeed, load_max: '0.6 V' },
      'unknown mode': { ...controlFeed, mode: 'parallel' },
    };
    expect(Object.fromEntries(Object.entries(cases).map(([name, c]) => [name, messages(c)]))).toMatchInlineSnapshot(`
      {
        "missing condition": [
          "load_max: required condition is missing: a current such as "1.5 A", "500 mA" or "4m7"",
        ],
        "negative magnitude": [
          "reverse_max: expected a positive voltage, got "-32 V"",
        ],
        "oring without the other source": [
          "other_source_max: other_source_max is required for mode: oring",
        ],
        "peak below load": [
          "load_peak: load_peak 300 mA is below load_max 600 mA",
        ],
        "peak without duration": [
          "peak_duration: peak_duration is required with load_peak",
        ],
        "unknown mode": [
          "mode: Invalid option: expected one of "series"|"oring"",
        ],
        "wrong unit": [
          "load_max: expected a current, got "0.6 V" (a voltage)",
        ],
      }
    `);
  });
});
