import { describe, expect, it } from 'vitest';
import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { signalClampRole } from '../../src/circuits/roles/signal-clamp.js';
import { expectRelClose } from '../physics/expect-close.js';

const commercial = findPolicy('commercial')!;

function solve(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial) {
  return signalClampRole.solve(signalClampRole.schema.parse(conditions), policy);
}

function solved(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial): SolvedPosition {
  const result = solve(conditions, policy);
  if (!result.ok) throw new Error(`expected a design, got: ${result.infeasible.reason}`);
  return result.position;
}

const limit = (p: SolvedPosition, id: string) => p.limits.find((l) => l.id === id);

// The demo catalog's D9/D10: steering two 24 V end-stop inputs, 5 mA, response ≤ 1 µs.
const steering = { reverse_max: '32 V', forward_peak: '5 mA', trr_max: '1 µs' };

describe('signal-clamp: ratings (derived by hand)', () => {
  it.each([
    ['commercial', 32 / 0.8, 5e-3 / 0.9],
    // NASA EEE-INST-002 (from memory): PIV 70 %, IF 50 %.
    ['high-reliability', 32 / 0.7, 5e-3 / 0.5],
  ])('%s: VRRM ≥ VR/k, IF(AV) ≥ IF/k, the peak taken as continuous without forward_avg', (policyId, vrrm, ifAv) => {
    const p = solved(steering, findPolicy(policyId)!);
    expectRelClose(limit(p, 'vrrm')!.bound, vrrm, 1e-12);
    expectRelClose(limit(p, 'if-av')!.bound, ifAv, 1e-12);
  });

  it('uses forward_avg for IF(AV) and the duty it implies', () => {
    const p = solved({ ...steering, forward_peak: '10 mA', forward_avg: '1 mA' });
    expectRelClose(limit(p, 'if-av')!.stress, 1e-3, 1e-12);
    expect(p.operatingPoint.forwardDuty).toBeCloseTo(0.1, 12);
    expect(p.operatingPoint.reverseDuty).toBeCloseTo(0.9, 12);
    expectRelClose(p.operatingPoint.forwardRmsA!, 10e-3 * Math.sqrt(0.1), 1e-12);
  });

  it('lists limits in order: VRRM, IF(AV), trr, then Tj', () => {
    expect(solved(steering).limits.map((l) => [l.id, l.check.kind, l.check.relation])).toEqual([
      ['vrrm', 'rating', 'at-least'],
      ['if-av', 'rating', 'at-least'],
      ['trr', 'rating', 'at-most'],
      ['tj', 'computed', 'at-most'],
    ]);
  });

  it('records every step finite', () => {
    const p = solved({ ...steering, cj_max: '15 pF', source_impedance: '1 kΩ', bandwidth: '1 MHz', signal_frequency: '100 kHz', leakage_max: '1 µA' });
    for (const step of p.steps) expect(Number.isFinite(step.value), step.quantity).toBe(true);
  });
});

describe('signal-clamp: capacitance', () => {
  it('derives Cj ≤ 1/(2π·R·f3dB) = 159.2 pF for 1 kΩ and 1 MHz (single-pole RC [published physics])', () => {
    const p = solved({ ...steering, source_impedance: '1 kΩ', bandwidth: '1 MHz' });
    expectRelClose(limit(p, 'cj')!.bound, 1 / (2 * Math.PI * 1e3 * 1e6), 1e-12);
    expect(limit(p, 'cj')!.check).toEqual({ kind: 'rating', rating: 'cjF', relation: 'at-most' });
  });

  it('keeps the stricter of cj_max and the bandwidth bound', () => {
    const p = solved({ ...steering, cj_max: '15 pF', source_impedance: '1 kΩ', bandwidth: '1 MHz' });
    expect(limit(p, 'cj')!.bound).toBe(15e-12);
  });

  it('is infeasible below the 0.1 pF of the lowest-capacitance parts (common practice)', () => {
    const r = solve({ ...steering, source_impedance: '50 Ω', bandwidth: '40 GHz' });
    expect(!r.ok && r.infeasible.reason).toMatchInlineSnapshot(`"no feasible design because Cj must stay below 79.6 fF, less than the 100 fF of the lowest-capacitance discrete diodes; lower the source impedance or the bandwidth"`);
  });
});

describe('signal-clamp: recovery', () => {
  it('derives trr ≤ 1/(20·f) = 500 ns at 100 kHz (common practice) and keeps the stricter bound', () => {
    expectRelClose(limit(solved({ ...steering, signal_frequency: '100 kHz' }), 'trr')!.bound, 500e-9, 1e-12);
    expect(limit(solved({ ...steering, trr_max: '100 ns', signal_frequency: '100 kHz' }), 'trr')!.bound).toBe(100e-9);
  });

  it('puts Schottky first when trr must beat the ~4 ns of the fastest PN signal diodes (common practice)', () => {
    const p = solved({ ...steering, signal_frequency: '20 MHz' });
    expect(p.suitableKinds).toEqual(['schottky', 'signal']);
    expect(p.cautions.some((c) => c.text.includes('only a Schottky'))).toBe(true);
    expect(solved(steering).suitableKinds).toEqual(['signal', 'schottky']);
  });
});

describe('signal-clamp: leakage', () => {
  it('checks IR at reverse_max and the hot junction', () => {
    const p = solved({ ...steering, leakage_max: '1 µA', ambient_max: '70 °C' });
    expect(limit(p, 'ir')).toMatchObject({ check: { kind: 'computed', what: 'leakage-at-temperature', relation: 'at-most' }, bound: 1e-6 });
    expect(limit(p, 'ir')!.reason).toContain('70.0 °C');
  });
});

describe('signal-clamp: bad conditions', () => {
  it('names the field and what was expected', () => {
    const messages = (c: Record<string, unknown>) => {
      const r = signalClampRole.schema.safeParse(c);
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    };
    const cases = {
      'average above peak': { ...steering, forward_avg: '10 mA' },
      'bandwidth alone': { ...steering, bandwidth: '1 MHz' },
      'negative magnitude': { ...steering, cj_max: '-15 pF' },
      'missing condition': { reverse_max: '32 V' },
      'wrong unit': { ...steering, trr_max: '1 µF' },
    };
    expect(Object.fromEntries(Object.entries(cases).map(([name, c]) => [name, messages(c)]))).toMatchInlineSnapshot(`
      {
        "average above peak": [
          "forward_avg: forward_avg 10.0 mA is above forward_peak 5.00 mA",
        ],
        "bandwidth alone": [
          "source_impedance: source_impedance is required with bandwidth: together they bound Cj",
        ],
        "missing condition": [
          "forward_peak: required condition is missing: a current such as "1.5 A", "500 mA" or "4m7"",
        ],
        "negative magnitude": [
          "cj_max: expected a positive capacitance, got "-15 pF"",
        ],
        "wrong unit": [
          "trr_max: expected a time, got "1 µF" (a capacitance)",
        ],
      }
    `);
  });
});
