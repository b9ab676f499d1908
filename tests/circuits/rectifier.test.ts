import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../src/circuits/caution.js';
import { rectifierRole } from '../../src/circuits/roles/rectifier.js';
import { roleHarness } from './role-harness.js';
import { expectRelClose } from '../physics/expect-close.js';

const { solve, solved, step, issues } = roleHarness(rectifierRole);

// Sedra & Smith, peak-rectifier example (5th ed. Example 3.9, number from memory): half-wave,
// Vp = 100 V, 60 Hz, R = 10 kΩ (IL = 10 mA), Vr = 2 V. Driven with VD = 0 and no tolerance so Vp = 100 V.
const sedraSmith = { configuration: 'half-wave', v_secondary_rms: 100 / Math.SQRT2, line_tolerance: 0, frequency: '60 Hz', load_current: '10 mA', diode_drop: 0 };

describe('rectifier: Sedra & Smith peak-rectifier example', () => {
  it('from the ripple target: C, conduction angle, diode currents and PIV', () => {
    const p = solved({ ...sedraSmith, ripple_max: '2 V' });
    expectRelClose(p.figures.capacitance_f ?? 0, 83.3e-6, 0.01); // S&S: C = 83.3 µF
    expectRelClose(p.figures.conduction_angle_rad ?? 0, 0.2, 0.01); // S&S: ωΔt = 0.2 rad
    expectRelClose(step(p, 'iD,av'), 0.324, 0.01); // S&S: iD,av = 324 mA
    expectRelClose(p.operatingPoint.forwardPeakA ?? 0, 0.638, 0.01); // S&S: iD,max = 638 mA
    expectRelClose(p.operatingPoint.reversePeakV ?? 0, 200, 0.01); // S&S: PIV = 2·Vp = 200 V with VD = 0
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(0.01, 12); // half-wave: the diode carries IL
  });

  it('from the capacitor: the same ripple, and the exact conduction angle agrees within 1 %', () => {
    const p = solved({ ...sedraSmith, capacitance: '83.33 µF' });
    expectRelClose(p.figures.ripple_v ?? 0, 2, 0.01);
    // Exact form arccos(1 − Vr/Vp) = arccos(0.98) = 0.2003 rad (computed by hand).
    expectRelClose(step(p, 'ωΔt,exact'), 0.2003, 0.001);
  });
});

describe('rectifier: configurations (Sedra & Smith PIV table; numbers derived by hand)', () => {
  // Vs,pk = √2·10 V = 14.142 V, VD = 1 V, IL = 1 A, C = 10 mF, 50 Hz.
  const base = { v_secondary_rms: '10 V', line_tolerance: 0, load_current: '1 A', capacitance: '10 mF', diode_drop: '1 V' };
  it.each([
    ['half-wave', 13.142, 27.284, 1, 2.0],
    ['centre-tap', 13.142, 27.284, 0.5, 1.0],
    ['bridge', 12.142, 13.142, 0.5, 1.0],
  ])('%s: Vp %f V, PIV %f V, IF(AV) %f A, ripple %f V', (configuration, vp, piv, ifAv, ripple) => {
    const p = solved({ ...base, configuration });
    expectRelClose(p.figures.peak_v ?? 0, vp, 1e-4);
    expectRelClose(p.operatingPoint.reversePeakV ?? 0, piv, 1e-4);
    expect(p.operatingPoint.forwardAvgA).toBeCloseTo(ifAv, 12);
    expectRelClose(p.figures.ripple_v ?? 0, ripple, 1e-9); // IL/(f·C) half-wave, IL/(2f·C) full-wave
  });

  it('sizes for high line and takes the inrush from the series resistances', () => {
    const p = solved({ configuration: 'bridge', v_secondary_rms: '230 V', load_current: '0.1 A', capacitance: '47 µF', inrush_limiter: '20 Ω', is_mains_connected: true });
    const vsPk = Math.SQRT2 * 230 * 1.1; // 357.8 V: 230 V + 10 % (common practice)
    expectRelClose(step(p, 'Vs,pk'), vsPk, 1e-12);
    const r = 0.5 + 0.05 + 20; // default source resistance and ESR plus the NTC
    expectRelClose(p.operatingPoint.surgeA ?? 0, vsPk / r, 1e-12);
    expectRelClose(p.operatingPoint.surgePulseS ?? 0, 3 * r * 47e-6, 1e-12); // 2.9 ms, shorter than the 10 ms half cycle
    expect(p.suitableKinds[0]).toBe('rectifier');
  });

  it('uses a line surge for the worst reverse voltage, keeping the PIV as the working voltage', () => {
    const p = solved({ configuration: 'bridge', v_secondary_rms: '230 V', load_current: '0.1 A', capacitance: '47 µF', line_surge_peak: '710 V', is_mains_connected: true });
    expect(p.operatingPoint.reversePeakV).toBeCloseTo(709, 9); // Vsurge − VD
    expectRelClose(p.operatingPoint.reverseWorkingV ?? 0, Math.SQRT2 * 230 * 1.1 - 1, 1e-12);
    expect(p.limits[0]?.reason).toBe('reverse voltage during the line surge 709 V ÷ 0.80 (commercial VRRM factor)');
  });
});

describe('rectifier: infeasible designs are reasons, not NaN', () => {
  it.each([
    // Derived by hand: Vr = 1 A/(2·50 Hz·470 µF) = 21.3 V against Vp = √2·10 V − 2·1 V = 12.1 V.
    [{ capacitance: '470 µF' }, 'the ripple 21.3 V is not below the peak 12.1 V: the capacitor empties every cycle, so this is no longer a peak rectifier; use a larger capacitor'],
    // Vr = 1 A/(100 Hz·10 mF) = 1 V; 0.5 V needs 1 A/(100 Hz·0.5 V) = 20 mF.
    [{ capacitance: '10 mF', ripple_max: '0.5 V' }, '10.0 mF gives 1.00 V ripple, above ripple_max 500 mV: it needs at least 20.0 mF'],
    [{ capacitance: '1000 µF', v_secondary_rms: '1 V' }, 'the diode drops take the whole 1.41 V peak: there is no DC output'],
  ])('%j', (extra, reason) => {
    const result = solve({ configuration: 'bridge', v_secondary_rms: '10 V', line_tolerance: 0, load_current: '1 A', diode_drop: '1 V', ...extra });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.infeasible.reason).toBe(reason);
    for (const s of result.infeasible.steps) expect(Number.isFinite(s.value)).toBe(true);
  });
});

describe('rectifier: bad conditions', () => {
  it('names missing conditions and the either-or rule', () => {
    expect(issues({})).toEqual([
      'configuration: required condition is missing: one of half-wave, centre-tap, bridge',
      'v_secondary_rms: required condition is missing: a voltage such as "600 V", "2 kV" or "5V1"',
      'load_current: required condition is missing: a current such as "1.5 A", "500 mA" or "4m7"',
    ]);
    expect(issues({ configuration: 'bridge', v_secondary_rms: '12 V', load_current: '1 A' })).toEqual([
      'capacitance: give capacitance (the filter capacitor) or ripple_max (the ripple you accept); neither is set',
    ]);
  });

  it('rejects wrong units, negative magnitudes, unknown words and keys', () => {
    expect(issues({ configuration: 'full-bridge', v_secondary_rms: '5 A', load_current: '-1 A', capacitance: '1 mF', cap: 1 })).toEqual([
      'configuration: expected one of half-wave, centre-tap, bridge',
      'v_secondary_rms: expected a voltage, got "5 A" (a current)',
      'load_current: expected a positive current, got "-1 A"',
      ': Unrecognized key: "cap"',
    ]);
  });

  it('rejects an unlimited inrush and an ambient range upside down', () => {
    const ok = { configuration: 'bridge', v_secondary_rms: '12 V', load_current: '1 A', capacitance: '1 mF' };
    expect(issues({ ...ok, source_resistance: 0, capacitor_esr: 0, ambient_min: '60 °C', ambient_max: '40 °C' })).toEqual([
      'ambient_min: ambient_min 60.0 °C is above ambient_max 40.0 °C',
      'source_resistance: source_resistance, capacitor_esr and inrush_limiter add up to 0 Ω, so nothing limits the switch-on inrush; give the winding and line resistance',
    ]);
  });
});

describe('rectifier: derating, safety and finiteness', () => {
  const transformer = { configuration: 'bridge', v_secondary_rms: '12 V', load_current: '1 A', capacitance: '4700 µF' };

  it('divides by the high-reliability VRRM factor 0.7 and names the policy on every limit', () => {
    const p = solved(transformer, 'high-reliability');
    const vrrm = p.limits.find((l) => l.id === 'vrrm');
    expect(vrrm?.bound).toBeCloseTo((p.operatingPoint.reversePeakV ?? 0) / 0.7, 9);
    expect(p.limits.map((l) => [l.id, l.derating?.policyId])).toEqual([
      ['vrrm', 'high-reliability'],
      ['if-av', 'high-reliability'],
      ['ifsm', 'high-reliability'],
      ['tj', 'high-reliability'],
    ]);
  });

  it('adds the safety caution on the mains and leaves it out for a 12 V transformer', () => {
    expect(solved(transformer).cautions).not.toContainEqual(SAFETY_CAUTION);
    expect(solved({ ...transformer, v_secondary_rms: '230 V', capacitance: '47 µF' }).cautions).toContainEqual(SAFETY_CAUTION);
    expect(solved({ ...transformer, is_mains_connected: true }).cautions).toContainEqual(SAFETY_CAUTION);
  });

  it('shows every number finite', () => {
    const p = solved(transformer);
    for (const s of p.steps) expect(Number.isFinite(s.value), s.quantity).toBe(true);
    for (const v of [...Object.values(p.figures), ...p.limits.map((l) => l.bound)]) expect(Number.isFinite(v)).toBe(true);
    for (const v of Object.values(p.operatingPoint)) expect(Number.isFinite(v as number)).toBe(true);
  });
});

describe('rectifier: example design', () => {
  // Imports the registry, so it needs all nine roles in place.
  it('catalog-demo/roles/rectifier.yaml loads and solves', async () => {
    const { readDesignText } = await import('../../src/circuits/design-file.js');
    const { solvePosition } = await import('../../src/circuits/solve-position.js');
    const text = readFileSync(new URL('../../catalog-demo/roles/rectifier.yaml', import.meta.url), 'utf8');
    const read = readDesignText('rectifier.yaml', text);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok && outcome.result.ok, position.ref).toBe(true);
    }
  });
});
