import { describe, expect, it } from 'vitest';
import { Derivation } from '../../src/circuits/derivation.js';
import { vrrmLimit } from '../../src/circuits/roles/common-limits.js';
import { runawayLeakageThreshold } from '../../src/physics/index.js';
import { evaluatePart } from '../../src/selection/index.js';
import { aPart } from '../helpers/a-part.js';
import { C, aPosition, commercial, plainLimit, tjLimit } from './positions.js';

const limitOf = (e: ReturnType<typeof evaluatePart>, id: string) => e.limits.find((l) => l.limitId === id)!;

describe('evaluatePart: junction temperature', () => {
  // A PN rectifier whose VF is 0.5 V at 1 A at 25 °C and at 125 °C: no tempco, no leakage points.
  const constantVf = aPart('schottky', {
    kind: 'rectifier', partNumber: 'TW-R1', vrrmV: 100, tjMaxK: C(150), rthJaKPerW: 50, irPoints: [],
    vfPoints: [{ vfV: 0.5, ifA: 1, tjK: C(25) }, { vfV: 0.5, ifA: 1, tjK: C(125) }],
  });
  const dc = aPosition({ ambientMaxK: C(50), forwardAvgA: 1, forwardRmsA: 1, forwardPeakA: 1, forwardDuty: 1, reverseDuty: 0, reversePeakV: 20 }, [tjLimit()]);

  it('a constant-VF part at DC: Tj = Ta + RθJA·VF·IF = 50 °C + 50 K/W × 0.5 V × 1 A = 75 °C exactly (diode-formulas §9)', () => {
    const e = evaluatePart(constantVf, dc, commercial);
    const tj = limitOf(e, 'tj');
    expect(tj.value).toBeCloseTo(C(75), 9);
    expect(e.thermal?.losses).toEqual({ conductionW: 0.5, reverseW: 0, switchingW: 0, totalW: 0.5 });
    // Commercial ceiling Tj max − 25 K = 125 °C; headroom = 1 − (75 − 50)/(125 − 50) = 2/3.
    expect(tj.bound).toBeCloseTo(C(125), 9);
    expect(tj.headroom).toBeCloseTo(2 / 3, 9);
    expect(tj.marginUnits).toBeCloseTo(50, 9);
    expect(tj.explanation).toBe('Tj 75.0 °C at 50.0 °C ambient (500 mW) against 125 °C allowed (Tj max 150 °C less 25.0 K): 50.0 K headroom');
    expect(e.verdict).toBe('pass');
  });

  it('says the ceiling comes from the policy when its absolute Tj limit is the lower one (industrial 115 °C)', () => {
    const industrial = { ...commercial, id: 'industrial', tj: { ceilingK: C(115), marginBelowMaxK: 25, source: 'test' } };
    const tj = limitOf(evaluatePart(constantVf, { ...dc, limits: [tjLimit(industrial)] }, industrial), 'tj');
    expect(tj.explanation).toBe("Tj 75.0 °C at 50.0 °C ambient (500 mW) against 115 °C allowed (the policy's absolute ceiling, below Tj max 150 °C less 25.0 K): 40.0 K headroom");
  });

  it('without any RθJA the temperature is unknown, and says why', () => {
    const e = evaluatePart(aPart('schottky', { ...constantVf, rthJaKPerW: undefined }), dc, commercial);
    expect(limitOf(e, 'tj')).toMatchObject({ verdict: 'unknown', value: null });
    expect(limitOf(e, 'tj').explanation).toBe('Tj: unknown, Tj cannot be solved: no RθJA (give rth_ja for the position)');
    expect(e.verdict).toBe('unknown');
    expect(evaluatePart(aPart('schottky', { ...constantVf, rthJaKPerW: undefined }), dc, commercial, { unknownIsFailure: true }).verdict).toBe('fail');
  });

  it("the position's board RθJA wins over the datasheet's", () => {
    const e = evaluatePart(constantVf, { ...dc, operatingPoint: { ...dc.operatingPoint, rthJaOverrideKPerW: 100 } }, commercial);
    expect(limitOf(e, 'tj').value).toBeCloseTo(C(100), 9);
    expect(e.thermal?.rthSource).toBe('board');
  });
});

describe('evaluatePart: leakage runaway', () => {
  // IR 1 mA at 25 °C and 100 mA at 125 °C, both at 40 V: c = ln(100)/100 K⁻¹.
  const leaky = aPart('schottky', {
    partNumber: 'TW-SK-LEAKY', vrrmV: 45, rthJaKPerW: 100, tjMaxK: C(150),
    irPoints: [{ irA: 1e-3, vrV: 40, tjK: C(25) }, { irA: 0.1, vrV: 40, tjK: C(125) }],
  });
  const blocking = (ambientC: number) => aPosition({ ambientMaxK: C(ambientC), reversePeakV: 40, reverseWorkingV: 40, reverseDuty: 1 }, [tjLimit()]);

  it('runs away at 100 °C ambient: IR there (31.6 mA) exceeds 1/(VR·c·RθJA) = 5.43 mA (diode-formulas §7), so Tj fails with the reason', () => {
    const c = Math.log(100) / 100;
    expect(1e-3 * Math.exp(c * 75)).toBeGreaterThan(runawayLeakageThreshold(40, 0, c, 100));
    const e = evaluatePart(leaky, blocking(100), commercial);
    expect(e.verdict).toBe('fail');
    expect(e.thermal?.outcome.kind).toBe('runaway');
    expect(limitOf(e, 'tj').explanation).toMatch(/^Tj: thermal runaway at 100 °C ambient\. .*heat balance/);
    expect(e.summary).toMatch(/^fails Tj: /);
  });

  it('holds at 25 °C ambient, where the loop gain RθJA·VR·c·IR ≈ 0.2 is below one', () => {
    const e = evaluatePart(leaky, blocking(25), commercial);
    expect(e.verdict).toBe('pass');
    expect(e.thermal?.outcome).toMatchObject({ kind: 'stable' });
    expect(e.thermal?.losses?.reverseW).toBeGreaterThan(0.04);
  });

  it('gives the same verdicts and margins when it does not write explanations', () => {
    for (const ambient of [25, 60, 100]) {
      const a = evaluatePart(leaky, blocking(ambient), commercial);
      const b = evaluatePart(leaky, blocking(ambient), commercial, { isExplaining: false });
      expect(b.limits.map((l) => [l.verdict, l.headroom, l.value])).toEqual(a.limits.map((l) => [l.verdict, l.headroom, l.value]));
      expect(b.limits.every((l) => l.explanation === '')).toBe(true);
    }
  });
});

describe('evaluatePart: rating limits', () => {
  // 298.4 V of reverse stress ÷ 0.8 (commercial VRRM factor) = 373 V needed.
  const vrrm = vrrmLimit(new Derivation(), 298.4, commercial);
  const at = aPosition({}, [vrrm]);
  it.each([
    [600, 'pass', 'VRRM 600 V against 373 V needed after 80 % derating: 38 % headroom'],
    [350, 'marginal', "VRRM 350 V against 373 V needed after 80 % derating: 6.6 % short; meets the circuit's own 298 V"],
    [250, 'fail', "VRRM 250 V is below the circuit's own 298 V (373 V needed after 80 % derating)"],
  ])('VRRM %d V: %s, "%s"', (vrrmV, verdict, explanation) => {
    const l = limitOf(evaluatePart(aPart('schottky', { vrrmV }), at, commercial), 'vrrm');
    expect(l).toMatchObject({ verdict, explanation, value: vrrmV, stress: 298.4 });
    expect(l.bound).toBeCloseTo(373, 9);
    // Headroom = 1 − 373/VRRM: the share of the rating left unused.
    expect(l.headroom).toBeCloseTo(1 - 373 / vrrmV, 12);
  });

  it('a missing rating is unknown, never a silent pass', () => {
    const cj = plainLimit('cj', 'Cj', { kind: 'rating', rating: 'cjF', relation: 'at-most' }, 10e-12, 'capacitance');
    const e = evaluatePart(aPart('schottky'), aPosition({}, [cj]), commercial);
    expect(e.limits[0]).toMatchObject({ verdict: 'unknown', value: null, headroom: null, explanation: 'Cj: unknown, the catalog gives no Cj for this part' });
    expect(e.verdict).toBe('unknown');
    expect(evaluatePart(aPart('schottky'), aPosition({}, [cj]), commercial, { unknownIsFailure: true }).verdict).toBe('fail');
  });

  it('a Schottky without trr recovers instantly (no stored charge); a PN part without trr is unknown', () => {
    const trr = plainLimit('trr', 'trr', { kind: 'rating', rating: 'trrS', relation: 'at-most' }, 1e-6, 'time');
    const schottky = evaluatePart(aPart('schottky'), aPosition({}, [trr]), commercial).limits[0]!;
    expect(schottky).toMatchObject({ verdict: 'pass', value: 0, headroom: 1 });
    expect(schottky.method).toMatch(/Schottky junction stores no minority carriers/);
    expect(evaluatePart(aPart('schottky', { kind: 'signal' }), aPosition({}, [trr]), commercial).limits[0]!.verdict).toBe('unknown');
  });

  it('a soft limit missed is marginal, not a failure', () => {
    const preferred = { ...plainLimit('ifsm', 'IFSM', { kind: 'rating', rating: 'ifsmA', relation: 'at-least' }, 50, 'current'), isHard: false };
    const e = evaluatePart(aPart('schottky', { ifsmA: 30 }), aPosition({}, [preferred]), commercial);
    expect(e.limits[0]!.verdict).toBe('marginal');
    expect(e.limits[0]!.explanation).toBe('IFSM 30.0 A against 50.0 A preferred: 67 % short (a preference, not a requirement)');
    expect(e.verdict).toBe('marginal');
  });
});
