import { describe, expect, it } from 'vitest';
import { evaluatePart } from '../../src/selection/index.js';
import { aPart } from '../helpers/a-part.js';
import { expectRelClose } from '../physics/expect-close.js';
import { C, aPosition, commercial, plainLimit, solveRole, tjLimit } from './positions.js';

const limitOf = (e: ReturnType<typeof evaluatePart>, id: string) => e.limits.find((l) => l.limitId === id)!;

describe('clamp voltage and pulse power at an IEC 61000-4-5 surge', () => {
  // 1 kV combination wave through the 2 Ω generator, 8/20 µs [IEC 61000-4-5, published].
  const surge = solveRole('transient-clamp', { working_max: '30 V', withstand: '400 V', surge: 'iec61000-4-5-1kv-line' });
  // The builder's TVS: VBR 36.7 … 40.6 V, VC 53.3 V at IPP 11.3 A, 600 W at 10/1000 µs.
  const tvs = aPart('tvs');
  const e = evaluatePart(tvs, surge, commercial);

  it('Rdyn = (53.3 − 40.6)/11.3 Ω, IPP = (1000 − 40.6)/(2 + Rdyn), VC = 40.6 + IPP·Rdyn [common practice]', () => {
    const rdyn = (53.3 - 40.6) / 11.3; // 1.12389 Ω
    const ipp = (1000 - 40.6) / (2 + rdyn); // 307.12 A
    const vc = 40.6 + ipp * rdyn; // 385.77 V
    const clamp = limitOf(e, 'vc');
    expectRelClose(clamp.value!, vc, 1e-12);
    expect(clamp).toMatchObject({ verdict: 'pass', bound: 400 });
    expect(clamp.explanation).toBe('VC 386 V at IPP 307 A against 400 V allowed: 3.6 % headroom');
    expect(clamp.method).toContain('VBR,max from the datasheet');
  });

  it("PPPM 600 W at 1000 µs scales to 600·√(1000/20) = 4.24 kW at 20 µs (Wunsch & Bell [from memory], ±30 %), far below this part's VC·IPP", () => {
    const rdyn = (53.3 - 40.6) / 11.3;
    const ipp = (1000 - 40.6) / (2 + rdyn);
    const demandW = (40.6 + ipp * rdyn) * ipp; // ≈ 118.5 kW
    const pulse = limitOf(e, 'pppm');
    expectRelClose(pulse.value!, 600 * Math.sqrt(1000 / 20), 1e-12);
    expectRelClose(pulse.stress!, demandW, 1e-12);
    expectRelClose(pulse.bound!, demandW / 0.8, 1e-12);
    expect(pulse.verdict).toBe('fail');
    expect(pulse.explanation).toMatch(/^PPPM 4\.24 kW \(600 W at 10\/1000 µs, scaled to 20\.0 µs by the √t rule, ±30 %\) is below the circuit's own 118 kW/);
    expect(e.verdict).toBe('fail');
  });

  it('without VBR max takes 1.1 × VBR min and says so', () => {
    const clamp = limitOf(evaluatePart(aPart('tvs', { vbrMaxV: undefined }), surge, commercial), 'vc');
    const vbrMax = 1.1 * 36.7;
    const rdyn = (53.3 - vbrMax) / 11.3;
    expectRelClose(clamp.value!, vbrMax + ((1000 - vbrMax) / (2 + rdyn)) * rdyn, 1e-12);
    expect(clamp.method).toContain('VBR,max ≈ 1.1 × VBR,min');
  });
});

describe('Zener window and power', () => {
  const windowLimits = [
    plainLimit('vz-min', 'VZ,min', { kind: 'computed', what: 'zener-voltage', relation: 'at-least' }, 4.7, 'voltage'),
    plainLimit('vz-max', 'VZ,max', { kind: 'computed', what: 'zener-voltage', relation: 'at-most' }, 5.5, 'voltage'),
  ];
  const at = aPosition({ ambientMinK: C(-20), ambientMaxK: C(70), zenerCurrentMinA: 3e-3, zenerCurrentMaxA: 7e-3 }, windowLimits, ['zener']);

  it('VZ·(1 ± tol)·(1 + α·(T − 25 °C)) + ZZT·(IZ − IZT) over −20 … 70 °C and 3 … 7 mA (diode-formulas §4)', () => {
    const e = evaluatePart(aPart('zener', { vzTempcoPerK: 1e-4, zztOhm: 40, iztA: 5e-3 }), at, commercial);
    // Low corner: 5.1 × 0.95 × (1 + 1e-4 × (−45)) + (3 − 5) mA × 40 Ω = 4.8231975 − 0.08 = 4.7431975 V.
    expect(limitOf(e, 'vz-min').value).toBeCloseTo(4.7431975, 12);
    // High corner: 5.1 × 1.05 × (1 + 1e-4 × 45) + (7 − 5) mA × 40 Ω = 5.3790975 + 0.08 = 5.4590975 V.
    expect(limitOf(e, 'vz-max').value).toBeCloseTo(5.4590975, 12);
    expect(e.verdict).toBe('pass');
    expect(limitOf(e, 'vz-max').explanation).toBe("VZ,max 5.46 V (the part's highest VZ) against 5.50 V allowed: 0.7 % headroom");
  });

  it('without αVZ uses the sign of the breakdown mechanism: avalanche at 12 V, typical +0.07 %/K [common practice]', () => {
    const twelve = aPosition({ ambientMinK: C(25), ambientMaxK: C(125) }, [
      plainLimit('vz-max', 'VZ,max', { kind: 'computed', what: 'zener-voltage', relation: 'at-most' }, 14, 'voltage'),
    ], ['zener']);
    const l = evaluatePart(aPart('zener', { vzV: 12 }), twelve, commercial).limits[0]!;
    expect(l.value).toBeCloseTo(12 * 1.05 * (1 + 7e-4 * 100), 12);
    expect(l.method).toContain('avalanche breakdown, typical 0.0700 %/K');
  });

  it('PD derated linearly to zero at Tj max when no RθJA is known: 0.5 W × (150 − 70)/(150 − 25) = 320 mW [common practice]', () => {
    const pz = { ...plainLimit('pz', 'PZ', { kind: 'computed', what: 'zener-power', relation: 'at-least' }, 0.05, 'power'), stress: 0.04 };
    const e = evaluatePart(aPart('zener'), aPosition({ ambientMaxK: C(70), zenerCurrentMaxA: 7e-3 }, [pz, tjLimit()], ['zener']), commercial);
    expect(limitOf(e, 'pz').value).toBeCloseTo(0.32, 12);
    // No RθJA: Tj cannot be solved, which is unknown, not a pass.
    expect(limitOf(e, 'tj').verdict).toBe('unknown');
    const withRth = evaluatePart(aPart('zener', { rthJaKPerW: 250 }), aPosition({ ambientMaxK: C(70), zenerCurrentMaxA: 7e-3 }, [pz, tjLimit()], ['zener']), commercial);
    // (150 − 70) K / 250 K/W = 320 mW too; Tj = 70 °C + 250 K/W × 5.355 V × 7 mA.
    expect(limitOf(withRth, 'pz').value).toBeCloseTo(0.32, 12);
    expect(limitOf(withRth, 'tj').value).toBeCloseTo(C(70) + 250 * 5.1 * 1.05 * 7e-3, 9);
  });
});

describe('leakage and forward drop at temperature', () => {
  const ir = plainLimit('ir', 'IR', { kind: 'computed', what: 'leakage-at-temperature', relation: 'at-most' }, 1e-6, 'current');
  const blocking = { ambientMaxK: C(70), reversePeakV: 30, reverseWorkingV: 30, reverseDuty: 1 };

  it('IR at the working voltage and the solved Tj, from a two-point fit', () => {
    const part = aPart('schottky', { kind: 'signal', rthJaKPerW: 300, irPoints: [{ irA: 25e-9, vrV: 30, tjK: C(25) }, { irA: 5e-6, vrV: 30, tjK: C(125) }] });
    const l = evaluatePart(part, aPosition(blocking, [ir, tjLimit()]), commercial).limits[0]!;
    expect(l.verdict).toBe('pass');
    expect(l.explanation).toMatch(/^IR \d+ nA at 30\.0 V and Tj 70\.\d °C against 1\.00 µA allowed: \d+ % headroom$/);
    expect(l.method).toContain('two-point exponential fit');
  });

  it('without RθJA a pass at the ambient alone stays unknown (self-heating left out)', () => {
    const part = aPart('schottky', { kind: 'signal', irPoints: [{ irA: 25e-9, vrV: 30, tjK: C(25) }, { irA: 5e-6, vrV: 30, tjK: C(125) }] });
    const l = evaluatePart(part, aPosition(blocking, [ir]), commercial).limits[0]!;
    expect(l.verdict).toBe('unknown');
    expect(l.value).toBeGreaterThan(0);
    expect(l.explanation).toMatch(/but Tj is unknown \(no RθJA/);
  });

  it('VF is held at the coldest ambient, where it is highest', () => {
    const vf = plainLimit('vf', 'VF', { kind: 'computed', what: 'forward-drop', relation: 'at-most' }, 0.6, 'voltage');
    const part = aPart('schottky', { rthJaKPerW: 60, vfPoints: [{ vfV: 0.5, ifA: 1, tjK: C(25) }, { vfV: 0.4, ifA: 1, tjK: C(125) }] });
    const l = evaluatePart(part, aPosition({ ambientMinK: C(-20), ambientMaxK: C(50), forwardAvgA: 1, forwardDuty: 1 }, [vf]), commercial).limits[0]!;
    // Tempco from the two points: −0.1 V/100 K, so VF(−20 °C) = 0.5 + 45 × 1 mV = 0.545 V.
    expect(l.value).toBeCloseTo(0.545, 12);
    expect(l.explanation).toBe('VF 545 mV at 1.00 A and Tj -20.0 °C against 600 mV allowed: 9.2 % headroom');
  });
});
