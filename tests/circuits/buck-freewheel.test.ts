import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { buckFreewheelRole } from '../../src/circuits/roles/buck-freewheel.js';
import { roleHarness } from './role-harness.js';
import { expectRelClose } from '../physics/expect-close.js';

const { solve, solved, step, issues } = roleHarness(buckFreewheelRole);

// diode-formulas §2 [derived from Erickson & Maksimović, buck CCM steady state]: Vin 9–16 V, Vout 5 V, Iout 2 A.
const example = { vin_min: '9 V', vin_max: '16 V', vout: '5 V', iout: '2 A', frequency: '400 kHz' };

describe('buck-freewheel: diode-formulas §2 example', () => {
  it('D = 0.3125 and IF(AV) = 1.375 A at Vin,max; VR = 16 V before the allowance', () => {
    const p = solved(example);
    expect(p.figures.duty_min).toBeCloseTo(0.3125, 12); // 5/16
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(1.375, 12); // 2 A·(1 − 0.3125)
    expect(p.operatingPoint.reverseWorkingV).toBe(16);
    expect(p.operatingPoint.reversePeakV).toBeCloseTo(19.2, 12); // 16 V·1.2, default 20 % allowance (common practice)
    expect(p.limits[0]).toMatchObject({ id: 'vrrm', bound: expect.closeTo(24, 9) }); // 19.2 V ÷ 0.8
    expect(p.operatingPoint).toMatchObject({ switchingFrequencyHz: 400e3, switchingVoltageV: 16, reverseDuty: 0.3125, forwardDuty: 0.6875 });
  });

  it('peak and RMS from the inductor ripple (derived by hand)', () => {
    const p = solved({ ...example, inductance: '10 µH' });
    // ΔIL = (16 − 5)·0.3125/(10 µH·400 kHz) = 0.859375 A; peak = 2 + 0.4297 = 2.4297 A.
    expect(p.figures.ripple_current_a).toBeCloseTo(0.859375, 12);
    expect(p.operatingPoint.forwardPeakA).toBeCloseTo(2.4296875, 12);
    // RMS of the trapezoid: √(0.6875·(2² + 0.859375²/12)) = 1.67102 A.
    expectRelClose(p.operatingPoint.forwardRmsA ?? 0, 1.67102, 1e-5);
  });

  it('without an inductance takes 30 % ripple and says so', () => {
    const p = solved(example);
    expect(p.operatingPoint.forwardPeakA).toBeCloseTo(2.3, 12); // 2 A + 0.3·2 A/2
    expect(p.cautions.map((c) => c.text)).toContain('No inductance given: the ripple is taken as 30.0 % of Iout; give inductance for the real peak current.');
  });

  it('suits a Schottky at 16 V and an ultrafast or SiC part on a 400 V bus', () => {
    expect(solved(example).suitableKinds).toEqual(['schottky', 'ultrafast']);
    expect(solved({ ...example, vin_min: '300 V', vin_max: '400 V', vout: '48 V' }).suitableKinds).toEqual(['ultrafast', 'sic-schottky']);
  });
});

describe('buck-freewheel: infeasible designs', () => {
  it('cannot regulate when vout is not below vin_min', () => {
    const result = solve({ ...example, vin_min: '4.5 V' });
    expect(result).toMatchObject({
      ok: false,
      infeasible: { reason: 'at vin_min 4.50 V a buck cannot make vout 5.00 V: it would need a duty cycle of 111 %; raise vin_min or use a buck-boost' },
    });
  });

  it('does not pretend to model discontinuous conduction', () => {
    // ΔIL = 11 V·0.3125/(1 µH·100 kHz) = 34.4 A, more than twice the 2 A load.
    const result = solve({ ...example, frequency: '100 kHz', inductance: '1 µH' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.infeasible.reason).toMatch(/^the inductor ripple 34\.4 A is at least twice iout 2\.00 A/);
    for (const s of result.infeasible.steps) expect(Number.isFinite(s.value)).toBe(true);
  });
});

describe('buck-freewheel: bad conditions', () => {
  it('names missing conditions', () => {
    expect(issues({ vin_min: '9 V', vin_max: '16 V', vout: '5 V' })).toEqual([
      'iout: required condition is missing: a current such as "1.5 A", "500 mA" or "4m7"',
      'frequency: required condition is missing: a frequency such as "50 Hz", "100 kHz" or "2 MHz"',
    ]);
  });

  it('rejects min above max and a step-up', () => {
    expect(issues({ ...example, vin_min: '20 V' })).toEqual(['vin_min: vin_min 20.0 V is above vin_max 16.0 V']);
    expect(issues({ ...example, vout: '24 V' })).toEqual(['vout: vout 24.0 V is not below vin_max 16.0 V: a buck converter only steps down']);
  });

  it('rejects wrong units and negative magnitudes', () => {
    expect(issues({ ...example, vout: '5 A', iout: '-2 A', ringing_allowance: '300 %' })).toEqual([
      'vout: expected a voltage, got "5 A" (a current)',
      'iout: expected a positive current, got "-2 A"',
      'ringing_allowance: expected a ratio of at most 200 %, got "300 %"',
    ]);
  });
});

describe('buck-freewheel: derating, safety and finiteness', () => {
  it('divides by 0.7 under high-reliability and carries the policy on each limit', () => {
    const p = solved(example, 'high-reliability');
    expect(p.limits.find((l) => l.id === 'vrrm')?.bound).toBeCloseTo(19.2 / 0.7, 9);
    expect(p.limits.find((l) => l.id === 'if-av')?.bound).toBeCloseTo(1.375 / 0.5, 9);
    for (const l of p.limits) expect(l.derating?.policyId).toBe('high-reliability');
    expect(p.limits.map((l) => l.id)).toEqual(['vrrm', 'if-av', 'tj']);
  });

  it('adds the safety caution only above 120 V DC', () => {
    expect(solved(example).cautions).not.toContainEqual(SAFETY_CAUTION);
    expect(solved({ ...example, vin_min: '300 V', vin_max: '400 V', vout: '48 V' }).cautions).toContainEqual(SAFETY_CAUTION);
  });

  it('shows every number finite and the switching loss per part as a note', () => {
    const p = solved({ ...example, inductance: '10 µH' });
    for (const s of p.steps) expect(Number.isFinite(s.value), s.quantity).toBe(true);
    expect(step(p, 'VR')).toBe(16);
    // 16 V·400 kHz·1 nC = 6.4 mW; ½·100 pF·(16 V)²·400 kHz = 5.12 mW (derived by hand).
    expect(p.cautions.find((c) => c.text.startsWith('Recovery loss'))?.text).toContain('each nC of Qrr costs 6.40 mW and each 100 pF of Cj 5.12 mW');
  });
});

describe('buck-freewheel: example design', () => {
  // Imports the registry, so it needs all nine roles in place.
  it('catalog-demo/roles/buck-freewheel.yaml loads and solves', async () => {
    const { readDesignText } = await import('../../src/circuits/design-file.js');
    const { solvePosition } = await import('../../src/circuits/solve-position.js');
    const text = readFileSync(new URL('../../catalog-demo/roles/buck-freewheel.yaml', import.meta.url), 'utf8');
    const read = readDesignText('buck-freewheel.yaml', text);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok && outcome.result.ok, position.ref).toBe(true);
    }
  });
});
