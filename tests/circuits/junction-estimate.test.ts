import { describe, expect, it } from 'vitest';
import { estimateJunction, type JunctionEstimate } from '../../src/circuits/junction-estimate.js';
import { expectRelClose } from '../physics/expect-close.js';

function estimate(input: Record<string, unknown>): JunctionEstimate {
  const result = estimateJunction(input);
  if (!result.ok) throw new Error(`expected an estimate, got ${JSON.stringify(result.issues)}`);
  return result.estimate;
}

describe('estimateJunction, one-sided abrupt (Sze & Gibbons 1966; Sze & Ng 3rd ed. §2.4.3, from memory)', () => {
  it('1e16 cm⁻³ breaks down at about 60 V (Sze & Ng §2.4.3, from memory)', () => {
    expectRelClose(estimate({ doping_cm3: '1e16 cm-3' }).breakdownV, 60, 0.03); // Eg 1.12 eV: 61.6 V
    expectRelClose(estimate({ doping_cm3: 1e16, bandgap_ev: 1.1 }).breakdownV, 60, 1e-12); // the fit's own point
  });

  it.each([
    [1e15, 60 * 10 ** 0.75], // 337 V
    [1e17, 60 * 10 ** -0.75], // 10.7 V
  ])('%d cm⁻³ follows the −0.75 power law at Eg = 1.1 eV (the fit, by hand)', (doping, volts) => {
    expectRelClose(estimate({ doping_cm3: doping, bandgap_ev: 1.1 }).breakdownV, volts, 1e-12);
  });

  it('critical field near 4e5 V/cm at 1e16 cm⁻³ (Sze & Ng §2.4.3 figure, from memory; loose)', () => {
    expectRelClose(estimate({ doping_cm3: 1e16 }).criticalFieldVPerM, 4e7, 0.15);
  });

  it('is self-consistent: the triangular field gives VB = Ec·W/2 (Poisson, by hand)', () => {
    const e = estimate({ doping_cm3: 3e15 });
    expectRelClose((e.criticalFieldVPerM * e.depletionWidthM) / 2, e.breakdownV, 1e-9);
  });

  it('calls 1e16 cm⁻³ avalanche with a positive tempco, and says nothing about validity', () => {
    const e = estimate({ doping_cm3: 1e16 });
    expect([e.mechanism, e.tempcoSign, e.isWithinValidity]).toEqual(['avalanche', 'positive', true]);
    expect(e.cautions.map((c) => c.level)).toEqual(['note']);
  });

  it('cautions above 5e17 cm⁻³, where tunnelling takes over (diode-formulas §8)', () => {
    const e = estimate({ doping_cm3: '1e18 cm⁻³' });
    expect(e.isWithinValidity).toBe(false);
    expect(e.mechanism).toBe('zener');
    expect(e.cautions.filter((c) => c.level === 'design').map((c) => c.text)).toMatchInlineSnapshot(`
      [
        "NB = 1.00e+18 cm⁻³ is above 5e17 cm⁻³: tunnelling takes over and the avalanche fit no longer applies.",
        "VB 1.95 V is not clearly avalanche (zener): the Sze–Gibbons avalanche fit overstates it where tunnelling takes over.",
      ]
    `);
  });

  it('records every step finite with a source', () => {
    for (const step of estimate({ doping_cm3: 1e16 }).steps) {
      expect(Number.isFinite(step.value), step.quantity).toBe(true);
      expect(step.source).toBeTruthy();
    }
  });
});

describe('estimateJunction, linearly graded (Sze & Ng §2.2 and §2.4.3, from memory)', () => {
  it('a = 3e20 cm⁻⁴ breaks down at 60 V with Eg = 1.1 eV (the fit\'s own point)', () => {
    expectRelClose(estimate({ profile: 'graded', gradient_cm4: '3e20 cm-4', bandgap_ev: 1.1 }).breakdownV, 60, 1e-12);
  });

  it('is self-consistent: the parabolic field gives VB = (2/3)·Ec·W (Poisson, by hand)', () => {
    const e = estimate({ profile: 'graded', gradient_cm4: 1e21 });
    expectRelClose((2 / 3) * e.criticalFieldVPerM * e.depletionWidthM, e.breakdownV, 1e-9);
  });
});

describe('estimateJunction: input', () => {
  it.each(['1e16', '1e16 cm-3', '1e16 cm⁻³', '1e16 /cm3', '1.0e+16 cm^-3'])('reads %s as 1e16 cm⁻³', (text) => {
    expectRelClose(estimate({ doping_cm3: text }).breakdownV, estimate({ doping_cm3: 1e16 }).breakdownV, 1e-12);
  });

  it('reports bad input by field', () => {
    const issues = (input: Record<string, unknown>) => {
      const r = estimateJunction(input);
      return r.ok ? [] : r.issues.map((i) => `${i.field}: ${i.message}`);
    };
    expect({
      missing: issues({}),
      'wrong profile field': issues({ profile: 'graded', doping_cm3: 1e16 }),
      'wrong unit': issues({ doping_cm3: '1e16 V' }),
      'out of range': issues({ doping_cm3: 1e25 }),
      'negative bandgap': issues({ doping_cm3: 1e16, bandgap_ev: -1 }),
    }).toMatchInlineSnapshot(`
      {
        "missing": [
          "doping_cm3: doping_cm3 is required for profile: abrupt",
        ],
        "negative bandgap": [
          "bandgap_ev: bandgap_ev must be above 0.1 eV",
        ],
        "out of range": [
          "doping_cm3: expected a doping between 1e+12 and 1e+21 cm⁻³, got 1.00e+25 cm⁻³",
        ],
        "wrong profile field": [
          "gradient_cm4: gradient_cm4 is required for profile: graded",
          "doping_cm3: doping_cm3 applies only to profile: abrupt",
        ],
        "wrong unit": [
          "doping_cm3: expected a doping in cm⁻³, e.g. "1e16 cm⁻³", got "1e16 V"",
        ],
      }
    `);
  });
});
