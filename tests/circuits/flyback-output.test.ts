import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { roleHarness } from './role-harness.js';
import { flybackOutputRole } from '../../src/circuits/roles/flyback-output.js';
import { expectRelClose } from '../physics/expect-close.js';

const { solve, solved, issues } = roleHarness(flybackOutputRole);

// Offline flyback, derived by hand (Erickson & Maksimović flyback relations): 85–265 V AC rectified
// gives at most 265·√2 ≈ 375 V DC (and about 100 V in the valley at low line); Ns/Np = 0.1; 12 V, 2 A; 65 kHz.
const offline = { vin_min: '100 V', vin_max: '375 V', vout: '12 V', iout: '2 A', frequency: '65 kHz', turns_ratio_ns_np: 0.1 };

describe('flyback-output: reverse voltage', () => {
  it('VR = Vout + Vin,max·Ns/Np = 12 + 37.5 = 49.5 V before the 30 % spike allowance', () => {
    const p = solved(offline);
    expect(p.figures.reverse_voltage_v).toBeCloseTo(49.5, 12);
    expect(p.operatingPoint.reversePeakV).toBeCloseTo(64.35, 12); // 49.5 V·1.3 (assumed allowance, common practice)
    expect(p.limits[0]?.bound).toBeCloseTo(64.35 / 0.8, 9);
  });

  it('takes the turns as ns and np, and the OVP level as vout_max', () => {
    // FC-L40 D107 (catalog-demo README): 45 V + 430 V/4 = 152.5 V.
    const p = solved({ ...offline, turns_ratio_ns_np: undefined, ns: 1, np: 4, vin_max: '430 V', vout: '36 V', vout_max: '45 V' });
    expect(p.figures.turns_ratio).toBe(0.25);
    expect(p.figures.reverse_voltage_v).toBeCloseTo(152.5, 12);
    expect(p.suitableKinds).toEqual(['ultrafast', 'sic-schottky']); // VRRM bound 152.5·1.3/0.8 = 248 V
  });
});

describe('flyback-output: currents', () => {
  it('ccm with the default ripple (derived by hand)', () => {
    const p = solved(offline);
    const dMax = 12.7 / (12.7 + 0.1 * 100); // (Vout + VF)/(Vout + VF + n·Vin,min) = 0.55947
    const is = 2 / (1 - dMax); // 4.540 A during conduction
    expectRelClose(p.operatingPoint.forwardPeakA ?? 0, is * 1.15, 1e-12); // Is + 30 %·Is/2
    expectRelClose(p.operatingPoint.forwardDuty ?? 0, 1 - dMax, 1e-12);
    expect(p.operatingPoint.forwardAvgA).toBe(2);
  });

  it('ccm with the magnetising inductance: worst average plus worst ripple', () => {
    const p = solved({ ...offline, primary_inductance: '10 mH' });
    const dMax = 12.7 / 22.7;
    const dMin = 12.7 / (12.7 + 37.5);
    const ripple = (375 * dMin) / (10e-3 * 65e3 * 0.1); // primary ripple × Np/Ns = 1.4596 A
    expectRelClose(p.operatingPoint.forwardPeakA ?? 0, 2 / (1 - dMax) + ripple / 2, 1e-12);
  });

  it('dcm from the energy per cycle (derived by hand)', () => {
    const p = solved({ ...offline, mode: 'dcm', primary_inductance: '600 µH' });
    const ipri = Math.sqrt((2 * 12.7 * 2) / (600e-6 * 65e3)); // ½·Lm·Ipri²·fs = (Vout + VF)·Iout → 1.1413 A
    const peak = ipri / 0.1; // 11.41 A
    const delta2 = (2 * 2) / peak; // triangle area = Iout → 0.3505
    expectRelClose(p.operatingPoint.forwardPeakA ?? 0, peak, 1e-12);
    expectRelClose(p.operatingPoint.forwardRmsA ?? 0, peak * Math.sqrt(delta2 / 3), 1e-12);
    // The boundary value 2·Iout/(1 − D) is a floor for the DCM peak (diode-formulas, triangle area).
    const dOn = (ipri * 600e-6 * 65e3) / 100;
    expect(peak).toBeGreaterThan((2 * 2) / (1 - dOn));
  });
});

describe('flyback-output: infeasible designs', () => {
  it.each([
    [{ primary_inductance: '1 mH' }, /^at vin_max 375 V the secondary current falls to zero each cycle: the flyback runs discontinuous at full load; set mode: dcm$/],
    [{ mode: 'dcm', primary_inductance: '5 mH' }, /^at vin_min 100 V the on time .* fill the whole period: the flyback is not discontinuous at full load/],
  ])('%j', (extra, reason) => {
    const result = solve({ ...offline, ...extra });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.infeasible.reason).toMatch(reason);
    for (const s of result.infeasible.steps) expect(Number.isFinite(s.value)).toBe(true);
  });
});

describe('flyback-output: bad conditions', () => {
  const noTurns = { ...offline, turns_ratio_ns_np: undefined };
  it.each([
    [noTurns, ['turns_ratio_ns_np: required condition is missing: give turns_ratio_ns_np (e.g. 0.25), or ns and np']],
    [{ ...offline, ns: 1, np: 10 }, ['turns_ratio_ns_np: give turns_ratio_ns_np or ns and np, not both']],
    [{ ...noTurns, ns: 1 }, ['np: ns and np go together: give both turn counts']],
    [{ ...offline, turns_ratio_ns_np: '1:4' }, ['turns_ratio_ns_np: expected the turns ratio Ns/Np as a plain number']],
    [{ ...offline, turns_ratio_ns_np: -0.1 }, ['turns_ratio_ns_np: expected a positive number for the turns ratio Ns/Np']],
    [{ ...offline, mode: 'dcm' }, ['primary_inductance: mode dcm needs primary_inductance: the peak current follows from the energy stored each cycle']],
    [{ ...offline, mode: 'crm' }, ['mode: expected ccm or dcm']],
    [{ ...offline, vin_min: '400 V', vout: '12 A' }, ['vout: expected a voltage, got "12 A" (a current)']],
    [{ ...offline, vin_min: '400 V' }, ['vin_min: vin_min 400 V is above vin_max 375 V']],
    [{ ...offline, iout: '-2 A' }, ['iout: expected a positive current, got "-2 A"']],
  ])('%j', (input, expected) => {
    expect(issues(input)).toEqual(expected);
  });
});

describe('flyback-output: derating, safety and finiteness', () => {
  it('divides by 0.7 under high-reliability', () => {
    const p = solved(offline, 'high-reliability');
    expect(p.limits.find((l) => l.id === 'vrrm')).toMatchObject({ bound: expect.closeTo(64.35 / 0.7, 9), derating: { policyId: 'high-reliability', value: 0.7 } });
  });

  it('adds the safety caution offline and not for a 12 V input', () => {
    expect(solved(offline).cautions).toContainEqual(SAFETY_CAUTION);
    expect(solved({ ...offline, vin_min: '9 V', vin_max: '16 V', vout: '5 V', turns_ratio_ns_np: 0.5 }).cautions).not.toContainEqual(SAFETY_CAUTION);
  });

  it('shows every number finite', () => {
    for (const p of [solved(offline), solved({ ...offline, mode: 'dcm', primary_inductance: '600 µH' })]) {
      for (const s of p.steps) expect(Number.isFinite(s.value), s.quantity).toBe(true);
    }
  });
});

describe('flyback-output: example design', () => {
  // Imports the registry, so it needs all nine roles in place.
  it('catalog-demo/roles/flyback-output.yaml loads and solves', async () => {
    const { readDesignText } = await import('../../src/circuits/design-file.js');
    const { solvePosition } = await import('../../src/circuits/solve-position.js');
    const text = readFileSync(new URL('../../catalog-demo/roles/flyback-output.yaml', import.meta.url), 'utf8');
    const read = readDesignText('flyback-output.yaml', text);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok && outcome.result.ok, position.ref).toBe(true);
    }
  });
});
