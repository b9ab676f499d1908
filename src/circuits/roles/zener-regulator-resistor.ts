import { type Derivation, q } from '../derivation.js';
import { E24_SOURCE, e24AtOrBelow } from '../e24.js';

const MALVINO = 'Malvino & Bates, Electronic Principles 7th ed. ch. 5; Sedra & Smith, Zener shunt regulator [published]';
const CONVENTION = 'conservative mix VZ,max·(Vin,max − VZ,min)/R,min (diode-formulas §4)';

export interface ResistorInput {
  readonly vinMinV: number;
  readonly vinMaxV: number;
  /** The VZ range the resistor must work with: the tolerance-and-temperature window, or the allowed output window. */
  readonly vzMinV: number;
  readonly vzMaxV: number;
  readonly loadMinA: number;
  readonly loadMaxA: number;
  readonly izMinA: number;
  readonly resistorTolerance: number;
  /** Analyse this resistor instead of choosing one. */
  readonly givenOhm?: number | undefined;
}

export interface ResistorDesign {
  readonly rMaxOhm: number;
  readonly rOhm: number;
  readonly izLowA: number;
  readonly izHighA: number;
  readonly pzW: number;
  readonly prW: number;
}

export type ResistorResult = { readonly ok: true; readonly design: ResistorDesign } | { readonly ok: false; readonly reason: string };

/**
 * Sizes (or analyses) the series resistor of a shunt Zener regulator. Each worst case takes the
 * corner that hurts: least Zener current at Vin,min, VZ,max, R,max and IL,max; most at Vin,max,
 * VZ,min, R,min and IL,min.
 */
export function seriesResistor(d: Derivation, x: ResistorInput): ResistorResult {
  const headroomV = x.vinMinV - x.vzMaxV;
  if (!(headroomV > 0)) {
    return { ok: false, reason: `no feasible design because Vin,min ${q(x.vinMinV, 'voltage')} leaves no headroom above VZ,max ${q(x.vzMaxV, 'voltage')}` };
  }
  const rMaxOhm = d.step({
    quantity: 'largest series resistor that still regulates at Vin,min and IL,max', symbol: 'R,max',
    formula: 'R ≤ (Vin,min − VZ,max)/(IL,max + IZ,min)',
    substituted: `(${q(x.vinMinV, 'voltage')} − ${q(x.vzMaxV, 'voltage')})/(${q(x.loadMaxA, 'current')} + ${q(x.izMinA, 'current')})`,
    value: headroomV / (x.loadMaxA + x.izMinA), unit: 'resistance', source: MALVINO,
  });
  const rOhm = x.givenOhm !== undefined
    ? d.step({
        quantity: 'series resistor, given (analysed as built)', symbol: 'R', formula: 'R = resistor',
        substituted: q(x.givenOhm, 'resistance'), value: x.givenOhm, unit: 'resistance', source: 'design input',
      })
    : chooseE24(d, rMaxOhm, x.resistorTolerance);
  const tol = x.resistorTolerance;
  const rLowOhm = rOhm * (1 - tol);
  const rHighOhm = rOhm * (1 + tol);
  const izLowA = d.step({
    quantity: 'least Zener current: Vin,min, VZ,max, R at +tolerance, IL,max', symbol: 'IZ,low',
    formula: 'IZ = (Vin,min − VZ,max)/(R·(1 + tol)) − IL,max',
    substituted: `(${q(x.vinMinV, 'voltage')} − ${q(x.vzMaxV, 'voltage')})/${q(rHighOhm, 'resistance')} − ${q(x.loadMaxA, 'current')}`,
    value: headroomV / rHighOhm - x.loadMaxA, unit: 'current', source: MALVINO,
  });
  // Design mode meets IZ,min by construction; the slack absorbs decimal rounding of E24 values.
  if (izLowA < x.izMinA * (1 - 1e-9)) {
    return {
      ok: false,
      reason:
        `no feasible design because with R = ${q(rOhm, 'resistance')} (${q(rHighOhm, 'resistance')} at +${q(tol, 'ratio')}) the Zener current ` +
        `at Vin,min ${q(x.vinMinV, 'voltage')} and IL,max ${q(x.loadMaxA, 'current')} falls to ${q(izLowA, 'current')}, below IZ,min ${q(x.izMinA, 'current')}; ` +
        `R must be at most ${q(rMaxOhm, 'resistance')}`,
    };
  }
  const izHighA = d.step({
    quantity: 'most Zener current: Vin,max, VZ,min, R at −tolerance, IL,min', symbol: 'IZ,max',
    formula: 'IZ,max = (Vin,max − VZ,min)/(R·(1 − tol)) − IL,min',
    substituted: `(${q(x.vinMaxV, 'voltage')} − ${q(x.vzMinV, 'voltage')})/${q(rLowOhm, 'resistance')} − ${q(x.loadMinA, 'current')}`,
    value: (x.vinMaxV - x.vzMinV) / rLowOhm - x.loadMinA, unit: 'current', source: MALVINO,
  });
  const pzW = d.step({
    quantity: `worst Zener dissipation, ${CONVENTION}`, symbol: 'PZ', formula: 'PZ = VZ,max·IZ,max',
    substituted: `${q(x.vzMaxV, 'voltage')} × ${q(izHighA, 'current')}`, value: x.vzMaxV * izHighA, unit: 'power', source: MALVINO,
  });
  const prW = d.step({
    quantity: 'worst series-resistor dissipation', symbol: 'PR', formula: 'PR = (Vin,max − VZ,min)²/(R·(1 − tol))',
    substituted: `(${q(x.vinMaxV, 'voltage')} − ${q(x.vzMinV, 'voltage')})²/${q(rLowOhm, 'resistance')}`,
    value: (x.vinMaxV - x.vzMinV) ** 2 / rLowOhm, unit: 'power', source: MALVINO,
  });
  return { ok: true, design: { rMaxOhm, rOhm, izLowA, izHighA, pzW, prW } };
}

/** Largest E24 value whose +tolerance end stays below R,max: a larger R wastes less power. */
function chooseE24(d: Derivation, rMaxOhm: number, tolerance: number): number {
  const targetOhm = d.step({
    quantity: 'largest nominal resistor whose +tolerance end stays within R,max', symbol: 'R,nom,max', formula: 'R,nom ≤ R,max/(1 + tol)',
    substituted: `${q(rMaxOhm, 'resistance')}/(1 + ${q(tolerance, 'ratio')})`, value: rMaxOhm / (1 + tolerance), unit: 'resistance', source: 'worst case over resistor tolerance',
  });
  const rOhm = e24AtOrBelow(targetOhm);
  return d.step({
    quantity: 'series resistor chosen: the largest E24 value at or below R,nom,max (larger R, less dissipation)', symbol: 'R',
    formula: 'R = E24 value ≤ R,nom,max', substituted: `E24 ≤ ${q(targetOhm, 'resistance')}`, value: rOhm, unit: 'resistance', source: E24_SOURCE,
  });
}

/** Line and load regulation from the Zener's dynamic resistance. */
export function regulation(d: Derivation, rOhm: number, zztOhm: number): { line: number; loadOhm: number } {
  const line = d.step({
    quantity: 'line regulation (output change per input change)', symbol: 'ΔVout/ΔVin', formula: 'rz/(R + rz)',
    substituted: `${q(zztOhm, 'resistance')}/(${q(rOhm, 'resistance')} + ${q(zztOhm, 'resistance')})`, value: zztOhm / (rOhm + zztOhm), unit: 'dimensionless', source: MALVINO,
  });
  const parallel = zztOhm === 0 ? 0 : (zztOhm * rOhm) / (zztOhm + rOhm);
  const loadOhm = d.step({
    quantity: 'load regulation (output change per load-current change)', symbol: 'ΔVout/ΔIL', formula: '−(rz ∥ R)',
    substituted: `−(${q(zztOhm, 'resistance')} ∥ ${q(rOhm, 'resistance')})`, value: -parallel, unit: 'resistance', source: MALVINO,
  });
  return { line, loadOhm };
}
