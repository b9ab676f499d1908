import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { transientClampRole } from '../../src/circuits/roles/transient-clamp.js';
import { SURGE_PRESETS, findSurgePreset } from '../../src/circuits/roles/transient-clamp-presets.js';
import { expectRelClose } from '../physics/expect-close.js';

const commercial = findPolicy('commercial')!;

function solve(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial) {
  return transientClampRole.solve(transientClampRole.schema.parse(conditions), policy);
}

function solved(conditions: Record<string, unknown>, policy: DeratingPolicy = commercial): SolvedPosition {
  const result = solve(conditions, policy);
  if (!result.ok) throw new Error(`expected a design, got: ${result.infeasible.reason}`);
  return result.position;
}

const limit = (p: SolvedPosition, id: string) => p.limits.find((l) => l.id === id);
const industrialInput = { working_max: '30 V', withstand: '60 V', surge: 'iec61000-4-5-1kv-line-earth' };

describe('transient-clamp: surge presets', () => {
  it('IEC 61000-4-5 at 1 kV through the 2 Ω generator: short-circuit current Voc/Zs = 500 A (IEC 61000-4-5 combination wave [published])', () => {
    const p = solved({ working_max: '30 V', withstand: '60 V', surge: 'iec61000-4-5-1kv-line' });
    expect(p.figures.shortCircuitA).toBe(500);
    expect(p.operatingPoint.surge).toEqual({ openCircuitV: 1000, sourceOhm: 2, waveform: { riseS: 8e-6, decayS: 20e-6 }, withstandV: 60, workingV: 30 });
  });

  it.each([
    ['line', 2],
    ['line-earth', 12],
    ['signal', 42],
  ])('couples %s through %d Ω (IEC 61000-4-5 [published; coupling values from memory])', (suffix, ohm) => {
    for (const level of ['0.5kv', '1kv', '2kv', '4kv']) expect(findSurgePreset(`iec61000-4-5-${level}-${suffix}`)!.sourceOhm).toBe(ohm);
  });

  it('ESD 8 kV contact: first peak 30 A = 3.75 A/kV × 8 kV (IEC 61000-4-2 [published])', () => {
    const p = solved({ working_max: '5 V', withstand: '12 V', surge: 'iec61000-4-2-8kv-contact' });
    expect(p.figures.shortCircuitA).toBe(30);
    // The model's impedance makes a short draw the first peak: 8 kV / 30 A.
    expectRelClose(p.operatingPoint.surge!.sourceOhm, 8000 / 30, 1e-12);
    expect(findSurgePreset('iec61000-4-2-8kv-contact')!.sourceOhm).toBe(330);
  });

  it.each([
    [2, 7.5],
    [4, 15],
    [6, 22.5],
  ])('ESD %d kV contact: first peak %d A (IEC 61000-4-2 [published])', (kv, amps) => {
    expectRelClose(findSurgePreset(`iec61000-4-2-${kv}kv-contact`)!.shortCircuitA, amps, 1e-12);
  });

  it('ESD sets no pulse-power limit and says why', () => {
    const p = solved({ working_max: '5 V', withstand: '12 V', surge: 'iec61000-4-2-8kv-contact' });
    expect(limit(p, 'pppm')).toBeUndefined();
    expect(p.cautions.some((c) => c.text.includes('outside the pulse-width scaling rule'))).toBe(true);
  });

  it.each([
    ['iso16750-2-load-dump-12v', [79, 101], [0.5, 4], [0.04, 0.4], 101, 0.5, 0.4],
    ['iso16750-2-load-dump-24v', [151, 202], [1, 8], [0.1, 0.35], 202, 1, 0.35],
  ])('%s: the standard ranges and the worst corner (ISO 16750-2 [published])', (id, usV, riOhm, tdS, us, ri, td) => {
    const preset = findSurgePreset(id)!;
    expect(preset.range).toEqual({ usV, riOhm, tdS });
    expect([preset.openCircuitV, preset.sourceOhm, preset.waveform.decayS]).toEqual([us, ri, td]);
  });

  it('every preset names its source and has a finite, positive model', () => {
    expect(SURGE_PRESETS).toHaveLength(12 + 4 + 2);
    for (const p of SURGE_PRESETS) {
      expect(p.source, p.id).toMatch(/IEC|ISO/);
      expect(p.shortCircuitA, p.id).toBeGreaterThan(0);
      expectRelClose(p.openCircuitV / p.modelOhm, p.shortCircuitA, 1e-12);
    }
  });
});

describe('transient-clamp: limits on a 24 V industrial input (derived by hand)', () => {
  const p = solved(industrialInput);

  it('asks VRWM ≥ 1.05 × working: 31.5 V (MIL-HDBK-419A vol. 2 §1.3.3.7.7 [published])', () => {
    expect(limit(p, 'vrwm')).toMatchObject({ check: { kind: 'rating', rating: 'vrwmV', relation: 'at-least' }, stress: 30 });
    expectRelClose(limit(p, 'vrwm')!.bound, 31.5, 1e-12);
  });

  it('asks VC at the circuit current ≤ the withstand', () => {
    expect(limit(p, 'vc')).toMatchObject({ check: { kind: 'computed', what: 'clamp-voltage', relation: 'at-most' }, bound: 60 });
  });

  it('IPP at the withstand (1000 − 60)/12 = 78.3 A; PPP = 60 V × 78.3 A = 4.70 kW; ÷ 0.8 = 5.875 kW', () => {
    expectRelClose(p.figures.ippAtWithstandA!, 940 / 12, 1e-12);
    expectRelClose(p.figures.pulsePowerW!, 4700, 1e-12);
    expectRelClose(limit(p, 'pppm')!.bound, 5875, 1e-12);
  });

  it('shows the same need as a 10/1000 µs rating: 5875·(20/1000)^0.5 = 830.9 W (Wunsch & Bell 1968 [from memory])', () => {
    expectRelClose(p.figures.equivalent10x1000W!, 5875 * Math.sqrt(0.02), 1e-12);
  });

  it('pulse energy VC·IPP·td/ln 2 = 60 × 78.33 × 20 µs / ln 2 = 135.6 mJ [published physics]', () => {
    expectRelClose(p.figures.pulseEnergyJ!, (60 * (940 / 12) * 20e-6) / Math.LN2, 1e-12);
  });

  it('applies the high-reliability PPPM factor 50 % (NASA EEE-INST-002, from memory)', () => {
    const hr = solved(industrialInput, findPolicy('high-reliability')!);
    expectRelClose(limit(hr, 'pppm')!.bound, 9400, 1e-12);
    expect(limit(hr, 'pppm')!.derating).toMatchObject({ policyId: 'high-reliability', factor: 'pppm', value: 0.5 });
  });

  it('always carries the safety caution (surge protection)', () => {
    expect(p.cautions).toContainEqual(SAFETY_CAUTION);
  });

  it('records every step finite', () => {
    for (const step of p.steps) expect(Number.isFinite(step.value), step.quantity).toBe(true);
  });
});

describe('transient-clamp: explicit surges', () => {
  it('takes the worst clamp voltage Voc/2 when it lies between VRWM and withstand: 50 V × 50 V / 2 Ω = 1.25 kW (by hand)', () => {
    const p = solved({ working_max: '30 V', withstand: '80 V', open_circuit_voltage: '100 V', source_impedance: '2 Ω', waveform: '10/1000 µs' });
    expectRelClose(p.figures.pulsePowerW!, 1250, 1e-12);
    expect(p.operatingPoint.surge!.waveform).toEqual({ riseS: 10e-6, decayS: 1000e-6 });
  });

  it('sets no pulse-power limit when the surge never exceeds the withstand', () => {
    const p = solved({ working_max: '12 V', withstand: '60 V', open_circuit_voltage: '50 V', source_impedance: '2 Ω', waveform: '8/20 µs' });
    expect(limit(p, 'pppm')).toBeUndefined();
    expect(p.cautions.some((c) => c.text.includes('survives it without a clamp'))).toBe(true);
  });

  it('warns that the √t rule does not reach a load dump', () => {
    const p = solved({ working_max: '16 V', withstand: '40 V', surge: 'iso16750-2-load-dump-12v' });
    expect(p.cautions.some((c) => c.text.includes('adiabatic'))).toBe(true);
  });

  it('suits bidirectional parts only for polarity: bi', () => {
    expect(solved({ ...industrialInput, polarity: 'bi' }).suitableKinds).toEqual(['tvs-bi']);
    expect(solved(industrialInput).suitableKinds).toEqual(['tvs-uni', 'tvs-bi']);
  });
});

describe('transient-clamp: infeasible designs', () => {
  it('no room for a clamp between stand-off and withstand', () => {
    const r = solve({ working_max: '30 V', withstand: '31 V', surge: 'iec61000-4-5-1kv-line' });
    expect(!r.ok && r.infeasible.reason).toMatchInlineSnapshot(`"no feasible design because the withstand 31.0 V leaves no room for a clamp above the stand-off 31.5 V (working 30.0 V + 5.00 %)"`);
  });
});

describe('transient-clamp: bad conditions', () => {
  it('names the field and what was expected', () => {
    const messages = (c: Record<string, unknown>) => {
      const r = transientClampRole.schema.safeParse(c);
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    };
    const cases = {
      'no surge': { working_max: '30 V', withstand: '60 V' },
      'preset and explicit': { ...industrialInput, open_circuit_voltage: '1 kV' },
      'explicit, incomplete': { working_max: '30 V', withstand: '60 V', open_circuit_voltage: '1 kV' },
      'bad waveform': { working_max: '30 V', withstand: '60 V', open_circuit_voltage: '1 kV', source_impedance: '2 Ω', waveform: '8-20 us' },
      'negative magnitude': { ...industrialInput, withstand: '-60 V' },
      'wrong unit': { ...industrialInput, working_max: '30 A' },
      'min above max': { ...industrialInput, ambient_min: '60 °C' },
    };
    expect(Object.fromEntries(Object.entries(cases).map(([name, c]) => [name, messages(c)]))).toMatchInlineSnapshot(`
      {
        "bad waveform": [
          "waveform: expected a surge waveform, got "8-20 us": write it as rise/decay time, e.g. "8/20 µs"",
        ],
        "explicit, incomplete": [
          "source_impedance: source_impedance is required with open_circuit_voltage",
          "waveform: waveform is required with open_circuit_voltage",
        ],
        "min above max": [
          "ambient_min: ambient_min 60.0 °C is above ambient_max 50.0 °C",
        ],
        "negative magnitude": [
          "withstand: expected a positive voltage, got "-60 V"",
        ],
        "no surge": [
          "surge: a surge is required: a preset such as iec61000-4-5-1kv-line, or open_circuit_voltage, source_impedance, waveform",
        ],
        "preset and explicit": [
          "open_circuit_voltage: give either surge (a preset) or open_circuit_voltage, source_impedance, waveform, not both",
        ],
        "wrong unit": [
          "working_max: expected a voltage, got "30 A" (a current)",
        ],
      }
    `);
  });

  it('rejects an unknown preset, listing the known ones', () => {
    const r = transientClampRole.schema.safeParse({ ...industrialInput, surge: 'iec-1kv' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toContain('iec61000-4-5-1kv-line-earth');
  });
});
