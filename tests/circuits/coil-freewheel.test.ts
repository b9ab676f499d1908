import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { coilFreewheelRole } from '../../src/circuits/roles/coil-freewheel.js';
import { expectRelClose } from '../physics/expect-close.js';

function solved(input: Record<string, unknown>, policyId = 'commercial'): SolvedPosition {
  const parsed = coilFreewheelRole.schema.safeParse(input);
  if (!parsed.success) throw new Error(parsed.error.message);
  const result = coilFreewheelRole.solve(parsed.data, findPolicy(policyId) as DeratingPolicy);
  if (!result.ok) throw new Error(result.infeasible.reason);
  return result.position;
}
const issues = (input: Record<string, unknown>) => {
  const r = coilFreewheelRole.schema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

/** Independent check: integrate L·di/dt = −(R·i + Vcl) with small Euler steps until the current reaches zero. */
function integrateDecay(l: number, r: number, i0: number, vcl: number): number {
  const dt = l / r / 1e5;
  let i = i0;
  let t = 0;
  while (i > 0) {
    i -= ((r * i + vcl) / l) * dt;
    t += dt;
  }
  return t;
}

// Published physics (RL circuit, diode-formulas §3): 24 V, 480 Ω, 1 H relay coil.
const relay = { supply_max: '24 V', coil_resistance: '480 Ω', coil_inductance: '1 H' };

describe('coil-freewheel: relay coil released once', () => {
  it('I0 = 50 mA, τ = 2.083 ms, E = 1.25 mJ', () => {
    const p = solved(relay);
    expect(p.figures.coil_current_a).toBeCloseTo(0.05, 12); // 24 V/480 Ω
    expect(p.figures.time_constant_s).toBeCloseTo(1 / 480, 12); // 1 H/480 Ω = 2.083 ms
    expect(p.figures.energy_j).toBeCloseTo(1.25e-3, 12); // ½·1 H·(50 mA)²
  });

  it.each([
    ['a plain diode (VF 0.7 V)', 0, 24.7],
    ['a 24 V Zener in series', 24, 48.7],
  ])('decay time with %s matches a numerical integration; switch sees %f V', (_, vz, vsw) => {
    const p = solved({ ...relay, zener_clamp: vz });
    expectRelClose(p.figures.decay_time_s ?? 0, integrateDecay(1, 480, 0.05, 0.7 + vz), 1e-3);
    expect(p.figures.switch_voltage_v).toBeCloseTo(vsw, 12); // Vsupply + VF + VZ
  });

  it('blocks the supply and compares the release pulse with IFSM', () => {
    const p = solved(relay);
    expect(p.operatingPoint).toMatchObject({ reversePeakV: 24, surgeA: 0.05, surgePulseS: 1 / 480 });
    expect(p.operatingPoint.forwardAvgA).toBeUndefined();
    expect(p.limits.map((l) => l.id)).toEqual(['vrrm', 'ifsm', 'tj']);
    expect(p.suitableKinds).toEqual(['signal', 'rectifier']);
  });

  it('tells the engineer what a Zener would buy', () => {
    // τ·ln((24 + 24.7)/24.7) = 1.41 ms and 24 + 24 + 0.7 = 48.7 V (derived by hand).
    const text = solved(relay).cautions.map((c) => c.text).join('\n');
    expect(text).toContain('A plain diode keeps the coil current flowing for about 7.42 ms after switch-off');
    expect(text).toContain('would end it in 1.41 ms, at a switch voltage of 48.7 V');
  });
});

describe('coil-freewheel: PWM drive', () => {
  it('a coil whose current follows the duty hands the diode at most I0/4 (D = ½)', () => {
    const p = solved({ supply_max: '24 V', coil_resistance: '12 Ω', coil_inductance: '10 mH', pwm_frequency: '20 kHz' });
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(0.5, 12); // ½·½·2 A
    expect(p.operatingPoint.forwardRmsA).toBeCloseTo((2 / 3) * Math.sqrt(1 / 3) * 2, 12); // D·√(1 − D)·I0 at D = ⅔
    expect(p.operatingPoint).toMatchObject({ switchingFrequencyHz: 20e3, switchingVoltageV: 24 });
    expect(p.suitableKinds).toEqual(['schottky', 'ultrafast']);
  });

  it('a duty range above ½ moves the worst case to its lower end', () => {
    const p = solved({ supply_max: '24 V', coil_resistance: '12 Ω', coil_inductance: '10 mH', pwm_frequency: '20 kHz', duty_min: '70 %', duty_max: '90 %' });
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(0.7 * 0.3 * 2, 12);
  });

  it('a motor held at its current limit: IF(AV) = I0·(1 − Dmin), as catalog-demo D3 (3 A, duty ≥ 30 % → 2.1 A)', () => {
    const p = solved({ supply_max: '32 V', coil_resistance: '1.2 Ω', coil_inductance: '1.5 mH', coil_current: '3 A', pwm_frequency: '20 kHz', duty_min: '30 %' });
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(2.1, 12);
    expect(p.operatingPoint.forwardPeakA).toBe(3);
  });
});

describe('coil-freewheel: bad conditions', () => {
  it.each([
    [{ supply_max: '24 V', coil_resistance: '480 Ω' }, ['coil_inductance: required condition is missing: an inductance such as "10 µH", "2.2 mH" or "4u7"']],
    [{ ...relay, coil_resistance: '480 V' }, ['coil_resistance: expected a resistance, got "480 V" (a voltage)']],
    [{ ...relay, diode_drop: '0 V' }, ['diode_drop: expected a positive voltage, got "0 V"']],
    [{ ...relay, zener_clamp: '-12 V' }, ['zener_clamp: expected a non-negative voltage, got "-12 V"']],
    [{ ...relay, duty_max: '50 %' }, ['duty_max: duty_max needs pwm_frequency: duty only applies to a PWM-driven coil']],
    [{ ...relay, pwm_frequency: '20 kHz', duty_min: '80 %', duty_max: '50 %' }, ['duty_min: duty_min 80.0 % is above duty_max 50.0 %']],
  ])('%j', (input, expected) => {
    expect(issues(input)).toEqual(expected);
  });
});

describe('coil-freewheel: derating, safety and finiteness', () => {
  it('divides by the high-reliability factors and names them', () => {
    const p = solved(relay, 'high-reliability');
    expect(p.limits.find((l) => l.id === 'vrrm')?.bound).toBeCloseTo(24 / 0.7, 9);
    expect(p.limits.find((l) => l.id === 'ifsm')).toMatchObject({ bound: expect.closeTo(0.1, 9), derating: { factor: 'ifsm', value: 0.5 } });
  });

  it('adds the safety caution when the switch sees more than 120 V', () => {
    expect(solved(relay).cautions).not.toContainEqual(SAFETY_CAUTION);
    expect(solved({ ...relay, supply_max: '48 V', zener_clamp: '100 V' }).cautions).toContainEqual(SAFETY_CAUTION); // 148.7 V at release
  });

  it('shows every number finite', () => {
    const p = solved({ ...relay, zener_clamp: '24 V' });
    for (const s of p.steps) expect(Number.isFinite(s.value), s.quantity).toBe(true);
    for (const v of Object.values(p.figures)) expect(Number.isFinite(v)).toBe(true);
  });
});

describe('coil-freewheel: example design', () => {
  // Imports the registry, so it needs all nine roles in place.
  it('catalog-demo/roles/coil-freewheel.yaml loads and solves both positions', async () => {
    const { readDesignText } = await import('../../src/circuits/design-file.js');
    const { solvePosition } = await import('../../src/circuits/solve-position.js');
    const text = readFileSync(new URL('../../catalog-demo/roles/coil-freewheel.yaml', import.meta.url), 'utf8');
    const read = readDesignText('coil-freewheel.yaml', text);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    expect(read.design.positions.map((p) => p.ref)).toEqual(['D5', 'D3']);
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok && outcome.result.ok, position.ref).toBe(true);
    }
  });
});
