import { z } from 'zod';
import { expectedForm } from '../../units/quantity-kinds.js';
import { formatQuantity, type QuantityKind } from '../../units/index.js';
import { quantitySchema, type QuantitySchemaOptions } from '../../units/quantity-schema.js';
import type { DeratingFactor, DeratingPolicy } from '../derating.js';
import type { Derivation } from '../derivation.js';
import type { Limit, OperatingPoint, RatedField } from '../limits.js';
import type { RoleInput, SolveResult } from '../role.js';

/*
 * Shared by the rectifying roles: the standard derated limits (VRRM, IF(AV), IFSM, Tj), the
 * ambient and board conditions every role takes, and small helpers for messages and results.
 */

const ZERO_C_K = 273.15;

/**
 * A condition the role cannot do without. zod 4 drops the input from issues, so a missing key would
 * otherwise read "expected a voltage as a number or text"; this says it is missing and what to write.
 */
export function requiredQuantity(kind: QuantityKind, options: QuantitySchemaOptions = {}): z.ZodType<number, number | string> {
  return z
    .custom<number | string>((input) => input !== undefined, `required condition is missing: ${expectedForm(kind)}`)
    .pipe(quantitySchema(kind, options));
}

/** Sanity range for ambients: anything outside is a typo (kelvin read as °C and the like). */
const AMBIENT_RANGE: QuantitySchemaOptions = { min: ZERO_C_K - 100, max: ZERO_C_K + 200 };
export const DEFAULT_AMBIENT_MIN_K = ZERO_C_K - 20;
export const DEFAULT_AMBIENT_MAX_K = ZERO_C_K + 50;

/** Conditions every role takes; spread into a role's z.object (built with it, see lazy-schema.ts). */
export const ambientShape = () => ({
  ambient_min: quantitySchema('temperature', AMBIENT_RANGE).default(DEFAULT_AMBIENT_MIN_K),
  ambient_max: quantitySchema('temperature', AMBIENT_RANGE).default(DEFAULT_AMBIENT_MAX_K),
  rth_ja: quantitySchema('thermal-resistance', { positive: true }).optional(),
});

export const AMBIENT_INPUTS: readonly RoleInput[] = [
  { name: 'ambient_min', label: 'Lowest ambient', quantity: 'temperature', default: '-20 °C', help: 'coldest air around the part in operation' },
  { name: 'ambient_max', label: 'Highest ambient', quantity: 'temperature', default: '50 °C', help: 'hottest air around the part, local hot spots included' },
  { name: 'rth_ja', label: 'Board RθJA', quantity: 'thermal-resistance', help: "junction-to-ambient on this board, if known; otherwise each part's datasheet value is used" },
];

export interface AmbientConditions {
  readonly ambient_min: number;
  readonly ambient_max: number;
  readonly rth_ja?: number | undefined;
}

export function ambientFields(c: AmbientConditions): Pick<OperatingPoint, 'ambientMinK' | 'ambientMaxK' | 'rthJaOverrideKPerW'> {
  return { ambientMinK: c.ambient_min, ambientMaxK: c.ambient_max, ...(c.rth_ja === undefined ? {} : { rthJaOverrideKPerW: c.rth_ja }) };
}

/** Cross-field rule "min ≤ max", reported on the min field: "vin_min 20.0 V is above vin_max 16.0 V". */
export function checkMinMax(ctx: z.RefinementCtx, data: Record<string, unknown>, minKey: string, maxKey: string, kind: QuantityKind): void {
  const low = data[minKey];
  const high = data[maxKey];
  if (typeof low === 'number' && typeof high === 'number' && low > high) {
    ctx.addIssue({ code: 'custom', path: [minKey], message: `${minKey} ${formatQuantity(low, kind)} is above ${maxKey} ${formatQuantity(high, kind)}` });
  }
}

/**
 * Two inputs that only mean something together: one without the other is an issue on the missing
 * one, with `why` after it. True when both are given.
 */
export function requireTogether(ctx: z.RefinementCtx, data: Record<string, unknown>, a: string, b: string, why?: string): boolean {
  const hasA = data[a] !== undefined;
  const hasB = data[b] !== undefined;
  if (hasA !== hasB) {
    const [missing, given] = hasA ? [b, a] : [a, b];
    ctx.addIssue({ code: 'custom', path: [missing], message: `${missing} is required with ${given}${why ? `: ${why}` : ''}` });
  }
  return hasA && hasB;
}

export function infeasible(d: Derivation, reason: string): SolveResult {
  return { ok: false, infeasible: { reason, steps: [...d.steps] } };
}

/** Worst reverse voltage with a ringing or spike allowance on top, as a step. */
export function withAllowance(d: Derivation, reverseV: number, allowance: number, source: string): number {
  return d.step({
    quantity: 'worst reverse voltage, ringing allowance included',
    symbol: 'VR,pk',
    formula: 'VR,pk = VR·(1 + kring)',
    substituted: `${formatQuantity(reverseV, 'voltage')}·(1 + ${formatQuantity(allowance, 'ratio')})`,
    value: reverseV * (1 + allowance),
    unit: 'voltage',
    source,
  });
}

interface DeratedSpec {
  readonly id: string;
  readonly label: string;
  readonly rating: RatedField;
  readonly quantity: QuantityKind;
  readonly factorName: 'vrrm' | 'ifAv' | 'ifsm';
  readonly factorLabel: string;
  /** Stress in words for the reason: "worst reverse voltage". */
  readonly what: string;
  readonly extra?: string;
}

/** rating ≥ stress ÷ factor, recorded as a step so the bound is derived like every other number. */
function deratedLimit(d: Derivation, stress: number, policy: DeratingPolicy, spec: DeratedSpec): Limit {
  const factor: DeratingFactor = policy.factors[spec.factorName];
  const stressText = `${formatQuantity(stress, spec.quantity)}${spec.extra ?? ''}`;
  const bound = d.step({
    quantity: `least ${spec.label} under the ${policy.id} policy`,
    symbol: `${spec.label},min`,
    formula: `${spec.label} ≥ stress ÷ k${spec.label}`,
    substituted: `${formatQuantity(stress, spec.quantity)} ÷ ${factor.value.toFixed(2)}`,
    value: stress / factor.value,
    unit: spec.quantity,
    source: factor.source,
  });
  return {
    id: spec.id,
    label: spec.label,
    check: { kind: 'rating', rating: spec.rating, relation: 'at-least' },
    bound,
    quantity: spec.quantity,
    stress,
    derating: { policyId: policy.id, factor: spec.factorName, value: factor.value, source: factor.source },
    reason: `${spec.what} ${stressText} ÷ ${factor.value.toFixed(2)} (${policy.id} ${spec.factorLabel} factor)`,
    isHard: true,
  };
}

export function vrrmLimit(d: Derivation, reverseV: number, policy: DeratingPolicy, what = 'worst reverse voltage'): Limit {
  return deratedLimit(d, reverseV, policy, { id: 'vrrm', label: 'VRRM', rating: 'vrrmV', quantity: 'voltage', factorName: 'vrrm', factorLabel: 'VRRM', what });
}

export function ifAvLimit(d: Derivation, averageA: number, policy: DeratingPolicy, what = 'average forward current'): Limit {
  return deratedLimit(d, averageA, policy, { id: 'if-av', label: 'IF(AV)', rating: 'ifAvA', quantity: 'current', factorName: 'ifAv', factorLabel: 'IF(AV)', what });
}

/** The pulse width goes into the reason: IFSM is rated for one 8.3 ms or 10 ms half-sine. */
export function ifsmLimit(d: Derivation, surgeA: number, pulseS: number, policy: DeratingPolicy, what = 'surge current'): Limit {
  const extra = ` for ${formatQuantity(pulseS, 'time')}`;
  return deratedLimit(d, surgeA, policy, { id: 'ifsm', label: 'IFSM', rating: 'ifsmA', quantity: 'current', factorName: 'ifsm', factorLabel: 'IFSM', what, extra });
}

/**
 * The junction-temperature limit is computed in selection, because Tj depends on the part's VF, IR,
 * Qrr and RθJA together. A Limit's bound must be finite and part-independent, so it carries the
 * policy's margin below Tj max (quantity 'temperature-difference'); `stress` repeats that margin
 * (there is no circuit stress to derate here) and `derating.value` is the margin in kelvin, not a
 * fraction. Selection turns it into a ceiling with tjCeilingK(policy, part.tjMaxK), which also
 * applies the policy's absolute ceiling when it has one.
 */
export function junctionTemperatureLimit(policy: DeratingPolicy): Limit {
  const margin = policy.tj.marginBelowMaxK;
  const ceiling = policy.tj.ceilingK === undefined ? '' : ` and at most ${formatQuantity(policy.tj.ceilingK, 'temperature')}, whichever is lower`;
  return {
    id: 'tj',
    label: 'Tj',
    check: { kind: 'computed', what: 'junction-temperature', relation: 'at-most' },
    bound: margin,
    quantity: 'temperature-difference',
    stress: margin,
    derating: { policyId: policy.id, factor: 'tj', value: margin, source: policy.tj.source },
    reason: `Tj at least ${+margin.toFixed(1)} K below the part's Tj max${ceiling} (${policy.id})`,
    isHard: true,
  };
}

export interface StressWords {
  readonly reverse?: string;
  readonly average?: string;
  readonly surge?: string;
}

/**
 * The standard limits of a rectifying position, from its operating point: VRRM from reversePeakV,
 * IF(AV) from forwardAvgA, IFSM from surgeA and surgePulseS (each only when present), then Tj.
 */
export function rectifyingLimits(d: Derivation, op: OperatingPoint, policy: DeratingPolicy, words: StressWords = {}): Limit[] {
  const limits: Limit[] = [];
  if (op.reversePeakV !== undefined) limits.push(vrrmLimit(d, op.reversePeakV, policy, words.reverse));
  if (op.forwardAvgA !== undefined) limits.push(ifAvLimit(d, op.forwardAvgA, policy, words.average));
  if (op.surgeA !== undefined && op.surgePulseS !== undefined) limits.push(ifsmLimit(d, op.surgeA, op.surgePulseS, policy, words.surge));
  limits.push(junctionTemperatureLimit(policy));
  return limits;
}

/**
 * Kinds for a hard-switched position, by the VRRM the part needs [common practice]: Schottky
 * diodes are common to 150 V and exist to 200 V; above that an ultrafast or a SiC Schottky.
 */
export function switchingKinds(vrrmBoundV: number): string[] {
  if (vrrmBoundV <= 150) return ['schottky', 'ultrafast'];
  if (vrrmBoundV <= 200) return ['ultrafast', 'schottky'];
  return ['ultrafast', 'sic-schottky'];
}
