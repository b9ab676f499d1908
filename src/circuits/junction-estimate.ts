import { z } from 'zod';
import {
  ELEMENTARY_CHARGE_C,
  SILICON_BANDGAP_EV,
  SILICON_PERMITTIVITY_F_PER_M,
  abruptJunctionBreakdown,
  breakdownMechanism,
  criticalFieldVPerM,
  depletionWidthM,
  gradedJunctionBreakdown,
  perCm3ToPerM3,
  perCm4ToPerM4,
  type BreakdownEstimate,
  type BreakdownMechanism,
  type TempcoSign,
} from '../physics/index.js';
import type { Caution } from './caution.js';
import { Derivation, q, type DerivationStep } from './derivation.js';

/**
 * For people who design their own junctions: from the doping of the lightly doped side (or the
 * grading constant of a linearly graded junction) to the avalanche breakdown voltage (Sze–Gibbons
 * fit), the peak field and depletion width at breakdown, and the mechanism that implies.
 */

const SZE = 'Sze & Gibbons 1966; Sze & Ng 3rd ed. §2.4.3 [published; from memory]';
const GRADED_PHYSICS = 'linearly graded junction, Sze & Ng 3rd ed. §2.2 [published physics; from memory]';

/** A number, or text such as "1e16", "1e16 cm-3", "1e16 cm⁻³", "1e16 /cm3". */
function densitySchema(power: 3 | 4, min: number, max: number) {
  const units = power === 3 ? /^(?:cm-3|cm⁻³|\/cm3|\/cm³|cm\^-3)$/ : /^(?:cm-4|cm⁻⁴|\/cm4|\/cm⁴|cm\^-4)$/;
  const unit = power === 3 ? 'cm⁻³' : 'cm⁻⁴';
  const noun = power === 3 ? 'a doping' : 'a grading constant';
  return z.union([z.number(), z.string()], { error: `expected ${noun} in ${unit}, e.g. "1e16 ${unit}"` }).transform((input, ctx) => {
    const text = typeof input === 'number' ? '' : input.trim();
    const match = /^([+-]?\d+(?:\.\d+)?(?:e[+-]?\d+)?)\s*(.*)$/i.exec(text);
    const value = typeof input === 'number' ? input : match && (match[2] === '' || units.test(match[2]!)) ? Number(match[1]) : Number.NaN;
    if (!Number.isFinite(value)) {
      ctx.addIssue({ code: 'custom', message: `expected ${noun} in ${unit}, e.g. "1e16 ${unit}", got ${JSON.stringify(input)}`, input });
      return z.NEVER;
    }
    if (value < min || value > max) {
      ctx.addIssue({ code: 'custom', message: `expected ${noun} between ${min.toExponential(0)} and ${max.toExponential(0)} ${unit}, got ${value.toExponential(2)} ${unit}`, input });
      return z.NEVER;
    }
    return value;
  });
}

export const junctionEstimateSchema = z
  .object({
    profile: z.enum(['abrupt', 'graded']).default('abrupt'),
    /** Doping of the lightly doped side of a one-sided abrupt junction, cm⁻³. */
    doping_cm3: densitySchema(3, 1e12, 1e21).optional(),
    /** Grading constant a of a linearly graded junction, cm⁻⁴. */
    gradient_cm4: densitySchema(4, 1e16, 1e26).optional(),
    bandgap_ev: z.number().gt(0.1, 'bandgap_ev must be above 0.1 eV').max(7, 'bandgap_ev must be at most 7 eV').default(SILICON_BANDGAP_EV),
  })
  .strict()
  .superRefine((input, ctx) => {
    if (input.profile === 'abrupt' && input.doping_cm3 === undefined) {
      ctx.addIssue({ code: 'custom', path: ['doping_cm3'], message: 'doping_cm3 is required for profile: abrupt' });
    }
    if (input.profile === 'graded' && input.gradient_cm4 === undefined) {
      ctx.addIssue({ code: 'custom', path: ['gradient_cm4'], message: 'gradient_cm4 is required for profile: graded' });
    }
    if (input.profile === 'abrupt' && input.gradient_cm4 !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['gradient_cm4'], message: 'gradient_cm4 applies only to profile: graded' });
    }
    if (input.profile === 'graded' && input.doping_cm3 !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['doping_cm3'], message: 'doping_cm3 applies only to profile: abrupt' });
    }
  });

export type JunctionEstimateInput = z.input<typeof junctionEstimateSchema>;

export interface JunctionEstimate {
  readonly profile: 'abrupt' | 'graded';
  readonly breakdownV: number;
  /** Peak field at breakdown, V/m. */
  readonly criticalFieldVPerM: number;
  /** Depletion width at breakdown, m (built-in potential neglected). */
  readonly depletionWidthM: number;
  readonly mechanism: BreakdownMechanism;
  readonly tempcoSign: TempcoSign;
  /** False where the avalanche fit does not apply (tunnelling). */
  readonly isWithinValidity: boolean;
  readonly steps: readonly DerivationStep[];
  readonly cautions: readonly Caution[];
}

export type JunctionEstimateResult =
  | { readonly ok: true; readonly estimate: JunctionEstimate }
  | { readonly ok: false; readonly issues: readonly { readonly field: string; readonly message: string }[] };

const fieldText = (vPerM: number) => `${(vPerM / 1e5).toPrecision(3)} kV/cm`;
const lengthText = (m: number) => `${(m * 1e6).toPrecision(3)} µm`;

/** Validates the input and estimates the junction; bad input comes back as issues, not throws. */
export function estimateJunction(input: unknown): JunctionEstimateResult {
  const parsed = junctionEstimateSchema.safeParse(input);
  if (!parsed.success) {
    return { ok: false, issues: parsed.error.issues.map((i) => ({ field: i.path.map(String).join('.'), message: i.message })) };
  }
  const { profile, doping_cm3, gradient_cm4, bandgap_ev: eg } = parsed.data;
  const d = new Derivation();
  const epsText = `εs = 11.7·ε0 = ${SILICON_PERMITTIVITY_F_PER_M.toPrecision(4)} F/m`;
  let breakdown: BreakdownEstimate;
  let ecVPerM: number;
  let wM: number;
  if (profile === 'abrupt') {
    const nCm3 = doping_cm3!;
    const nM3 = perCm3ToPerM3(nCm3);
    breakdown = abruptJunctionBreakdown(nM3, eg);
    const vb = d.step({
      quantity: 'avalanche breakdown voltage, one-sided abrupt junction', symbol: 'VB',
      formula: 'VB ≈ 60·(Eg/1.1)^1.5·(NB/1e16 cm⁻³)^−0.75 V',
      substituted: `60·(${eg}/1.1)^1.5·(${nCm3.toExponential(2)}/1e16)^−0.75`, value: breakdown.value, unit: 'voltage', source: SZE,
    });
    ecVPerM = criticalFieldVPerM(nM3, vb);
    wM = depletionWidthM(nM3, vb);
    // Length and field have no quantity kind: the value stays SI and the text carries the unit.
    d.step({
      quantity: 'critical field at breakdown (V/m)', symbol: 'Ec', formula: 'Ec = √(2·q·NB·VB/εs)',
      substituted: `√(2·q·${nCm3.toExponential(2)} cm⁻³·${q(vb, 'voltage')}/εs), ${epsText} → ${fieldText(ecVPerM)}`,
      value: ecVPerM, unit: 'dimensionless', source: 'Poisson equation, one-sided abrupt junction [published physics]',
    });
    d.step({
      quantity: 'depletion width at breakdown (m)', symbol: 'W', formula: 'W = √(2·εs·VB/(q·NB)), built-in potential neglected',
      substituted: `√(2·εs·${q(vb, 'voltage')}/(q·${nCm3.toExponential(2)} cm⁻³)) → ${lengthText(wM)}`,
      value: wM, unit: 'dimensionless', source: 'Poisson equation, one-sided abrupt junction [published physics]',
    });
  } else {
    const aCm4 = gradient_cm4!;
    const aM4 = perCm4ToPerM4(aCm4);
    breakdown = gradedJunctionBreakdown(aM4, eg);
    const vb = d.step({
      quantity: 'avalanche breakdown voltage, linearly graded junction', symbol: 'VB',
      formula: 'VB ≈ 60·(Eg/1.1)^1.2·(a/3e20 cm⁻⁴)^−0.4 V',
      substituted: `60·(${eg}/1.1)^1.2·(${aCm4.toExponential(2)}/3e20)^−0.4`, value: breakdown.value, unit: 'voltage', source: SZE,
    });
    // Charge q·a·x over −W/2 … W/2: V = q·a·W³/(12·εs), peak field q·a·W²/(8·εs).
    wM = Math.cbrt((12 * SILICON_PERMITTIVITY_F_PER_M * vb) / (ELEMENTARY_CHARGE_C * aM4));
    ecVPerM = (ELEMENTARY_CHARGE_C * aM4 * wM * wM) / (8 * SILICON_PERMITTIVITY_F_PER_M);
    d.step({
      quantity: 'depletion width at breakdown (m)', symbol: 'W', formula: 'W = (12·εs·VB/(q·a))^(1/3), built-in potential neglected',
      substituted: `(12·εs·${q(vb, 'voltage')}/(q·${aCm4.toExponential(2)} cm⁻⁴))^(1/3), ${epsText} → ${lengthText(wM)}`,
      value: wM, unit: 'dimensionless', source: GRADED_PHYSICS,
    });
    d.step({
      quantity: 'critical field at breakdown (V/m)', symbol: 'Ec', formula: 'Ec = q·a·W²/(8·εs)',
      substituted: `q·${aCm4.toExponential(2)} cm⁻⁴·(${lengthText(wM)})²/(8·εs) → ${fieldText(ecVPerM)}`,
      value: ecVPerM, unit: 'dimensionless', source: GRADED_PHYSICS,
    });
  }
  const mechanism = breakdownMechanism(breakdown.value, eg);
  d.step({
    quantity: `breakdown mechanism: ${mechanism.mechanism}, tempco ${mechanism.tempcoSign}`, symbol: 'VB/(Eg/q)',
    formula: 'tunnelling below 4·Eg/q, avalanche above 6·Eg/q, mixed between',
    substituted: `${q(breakdown.value, 'voltage')}/${eg} V = ${(breakdown.value / eg).toPrecision(3)}`,
    value: breakdown.value / eg, unit: 'dimensionless', source: mechanism.method,
  });
  const cautions: Caution[] = [];
  if (breakdown.caution) cautions.push({ level: 'design', text: breakdown.caution });
  if (mechanism.mechanism !== 'avalanche') {
    cautions.push({
      level: 'design',
      text: `VB ${q(breakdown.value, 'voltage')} is not clearly avalanche (${mechanism.mechanism}): the Sze–Gibbons avalanche fit overstates it where tunnelling takes over.`,
    });
  }
  cautions.push({
    level: 'note',
    text: "Fits differ: Baliga's (Fundamentals of Power Semiconductor Devices, ch. 3) gives about 15 % lower VB. Edge curvature lowers real breakdown further; treat VB as the plane-junction ceiling.",
  });
  return {
    ok: true,
    estimate: {
      profile, breakdownV: breakdown.value, criticalFieldVPerM: ecVPerM, depletionWidthM: wM,
      mechanism: mechanism.mechanism, tempcoSign: mechanism.tempcoSign,
      isWithinValidity: breakdown.isWithinValidity, steps: d.steps, cautions,
    },
  };
}
