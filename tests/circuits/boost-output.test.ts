import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { roleHarness } from './role-harness.js';
import { boostOutputRole } from '../../src/circuits/roles/boost-output.js';
import { expectRelClose } from '../physics/expect-close.js';

const { solve, solved, issues } = roleHarness(boostOutputRole);

// Derived by hand from Erickson & Maksimović's boost CCM relations (M = 1/(1 − D), IL = Iout/(1 − D),
// ΔIL = Vin·D/(L·fs)): Vin 9–16 V, Vout 24 V, Iout 1 A, 200 kHz, L = 22 µH.
//   D = 1 − 9/24 = 0.625; IL = 1/0.375 = 2.6667 A; ΔIL = 9·0.625/(22 µH·200 kHz) = 1.27841 A;
//   IF,pk = 2.6667 + 0.63920 = 3.30587 A; IF(RMS) = √(0.375·(2.6667² + 1.27841²/12)) = 1.64856 A.
const example = { vin_min: '9 V', vin_max: '16 V', vout: '24 V', iout: '1 A', frequency: '200 kHz', inductance: '22 µH' };

describe('boost-output: hand-derived CCM case', () => {
  it('duty, inductor and diode currents at Vin,min', () => {
    const p = solved(example);
    expect(p.figures.duty_max).toBeCloseTo(0.625, 12);
    expectRelClose(p.figures.inductor_current_a ?? 0, 2.66667, 1e-5);
    expectRelClose(p.figures.ripple_current_a ?? 0, 1.27841, 1e-5);
    expectRelClose(p.operatingPoint.forwardPeakA ?? 0, 3.30587, 1e-5);
    expectRelClose(p.operatingPoint.forwardRmsA ?? 0, 1.64856, 1e-5);
    expect(p.operatingPoint.forwardAvgA).toBe(1); // IF(AV) = Iout
  });

  it('blocks Vout (or vout_max) plus the ringing allowance', () => {
    expect(solved(example).operatingPoint.reversePeakV).toBeCloseTo(28.8, 12); // 24 V·1.2
    const p = solved({ ...example, vout_max: '27 V', ringing_allowance: '50 %' });
    expect(p.operatingPoint).toMatchObject({ reverseWorkingV: 27, reversePeakV: 40.5, switchingVoltageV: 27 });
  });

  it('takes Vin,min as the worst peak: the peak falls with Vin in CCM', () => {
    const peakAt = (vin: number) => 24 / vin + (vin * (1 - vin / 24)) / (2 * 22e-6 * 200e3);
    const worst = Math.max(...[9, 10, 11, 12, 13, 14, 15, 16].map(peakAt));
    expect(solved(example).operatingPoint.forwardPeakA).toBeCloseTo(worst, 12);
  });

  it('bounds the start-up inrush by the LC resonance and the source resistance', () => {
    const p = solved({ ...example, output_capacitance: '100 µF', source_resistance: '0.1 Ω' });
    // Series LC step response [published physics]: 16 V·√(100 µF/22 µH) = 34.11 A < 16 V/0.1 Ω; half period π·√(LC) = 147.4 µs.
    expectRelClose(p.operatingPoint.surgeA ?? 0, 34.112, 1e-4);
    expectRelClose(p.operatingPoint.surgePulseS ?? 0, 147.35e-6, 1e-4);
    expect(p.limits.map((l) => l.id)).toEqual(['vrrm', 'if-av', 'ifsm', 'tj']);
    // Resistance alone: 16 V/2 Ω = 8 A for 3RC = 600 µs.
    const r = solved({ ...example, inductance: undefined, output_capacitance: '100 µF', source_resistance: '2 Ω' });
    expect(r.operatingPoint.surgeA).toBeCloseTo(8, 12);
    expect(r.operatingPoint.surgePulseS).toBeCloseTo(600e-6, 12);
  });

  it('suits a Schottky at 24 V and an ultrafast or SiC part at 400 V', () => {
    expect(solved(example).suitableKinds).toEqual(['schottky', 'ultrafast']);
    expect(solved({ vin_min: '200 V', vin_max: '380 V', vout: '400 V', iout: '0.11 A', frequency: '100 kHz' }).suitableKinds).toEqual(['ultrafast', 'sic-schottky']);
  });
});

describe('boost-output: infeasible and bad conditions', () => {
  it('refuses discontinuous conduction with a reason and finite steps', () => {
    const result = solve({ ...example, inductance: '2 µH' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.infeasible.reason).toMatch(/the inductor current falls to zero each cycle: the converter runs discontinuous at full load/);
    for (const s of result.infeasible.steps) expect(Number.isFinite(s.value)).toBe(true);
  });

  it('rejects an input above the output, min above max and an inrush it cannot bound', () => {
    expect(issues({ ...example, vin_max: '30 V', vout_max: '20 V' })).toEqual([
      'vin_max: vin_max 30.0 V is above vout 24.0 V: a boost converter cannot regulate below its input',
      'vout_max: vout_max 20.0 V is below vout 24.0 V',
    ]);
    expect(issues({ ...example, vin_min: '18 V' })).toEqual(['vin_min: vin_min 18.0 V is above vin_max 16.0 V']);
    expect(issues({ ...example, inductance: undefined, output_capacitance: '100 µF' })).toEqual([
      'output_capacitance: output_capacitance needs inductance or source_resistance to bound the start-up inrush',
    ]);
  });

  it('rejects missing conditions, wrong units and negative magnitudes', () => {
    expect(issues({ vin_min: '9 V', vin_max: '16 V', vout: '24 A', iout: '-1 A' })).toEqual([
      'vout: expected a voltage, got "24 A" (a current)',
      'iout: expected a positive current, got "-1 A"',
      'frequency: required condition is missing: a frequency such as "50 Hz", "100 kHz" or "2 MHz"',
    ]);
  });
});

describe('boost-output: derating, safety and finiteness', () => {
  it('divides by 0.7 under high-reliability and carries the factor on each limit', () => {
    const p = solved(example, 'high-reliability');
    const vrrm = p.limits.find((l) => l.id === 'vrrm');
    expect(vrrm?.bound).toBeCloseTo(28.8 / 0.7, 9);
    expect(vrrm?.derating).toMatchObject({ policyId: 'high-reliability', factor: 'vrrm', value: 0.7 });
  });

  it('adds the safety caution for a 400 V output and not for 24 V', () => {
    expect(solved(example).cautions).not.toContainEqual(SAFETY_CAUTION);
    expect(solved({ vin_min: '200 V', vin_max: '380 V', vout: '400 V', iout: '0.11 A', frequency: '100 kHz' }).cautions).toContainEqual(SAFETY_CAUTION);
  });

  it('shows every number finite', () => {
    const p = solved({ ...example, output_capacitance: '100 µF' });
    for (const s of p.steps) expect(Number.isFinite(s.value), s.quantity).toBe(true);
    for (const v of Object.values(p.figures)) expect(Number.isFinite(v)).toBe(true);
  });
});

describe('boost-output: example design', () => {
  // Imports the registry, so it needs all nine roles in place.
  it('catalog-demo/roles/boost-output.yaml loads and solves', async () => {
    const { readDesignText } = await import('../../src/circuits/design-file.js');
    const { solvePosition } = await import('../../src/circuits/solve-position.js');
    const text = readFileSync(new URL('../../catalog-demo/roles/boost-output.yaml', import.meta.url), 'utf8');
    const read = readDesignText('boost-output.yaml', text);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok && outcome.result.ok, position.ref).toBe(true);
    }
  });
});
