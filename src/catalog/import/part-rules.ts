import { isRectifying, type PartKind } from '../../parts/index.js';

/**
 * The checks of src/parts/part-schema.ts as plain data, for the import's fast decoder. The zod
 * schema stays the reference: a row these rules do not accept is decoded by it, so its messages
 * are the ones reported. tests/catalog/import/part-rules.test.ts probes both at every bound.
 */

export interface NumberRule {
  readonly min: number;
  readonly max: number;
  readonly isMinExclusive: boolean;
}

const positive = (max: number): NumberRule => ({ min: 0, max, isMinExclusive: true });
const atLeastZero = (max: number): NumberRule => ({ min: 0, max, isMinExclusive: false });
const kelvin: NumberRule = { min: 173.15, max: 773.15, isMinExclusive: false };

/** By the part's key (part-fields.ts). */
export const NUMBER_RULES: Readonly<Record<string, NumberRule>> = {
  unitPrice: atLeastZero(1e6),
  vrrmV: positive(100_000),
  ifAvA: positive(100_000),
  ifAvRefK: kelvin,
  ifsmA: positive(1_000_000),
  ifsmPulseS: positive(10),
  cjF: positive(1e-3),
  cjVrV: atLeastZero(100_000),
  trrS: positive(1e-2),
  qrrC: positive(1),
  tjMaxK: kelvin,
  rthJaKPerW: positive(10_000),
  rthJlKPerW: positive(10_000),
  rthJcKPerW: positive(10_000),
  pdW: positive(100_000),
  vzV: positive(10_000),
  vzTol: positive(0.5),
  iztA: positive(100),
  zztOhm: atLeastZero(1e6),
  vzTempcoPerK: { min: -0.01, max: 0.01, isMinExclusive: false },
  vrwmV: positive(100_000),
  vbrMinV: positive(100_000),
  vbrMaxV: positive(100_000),
  vbrItA: positive(100),
  vcV: positive(100_000),
  ippA: positive(1_000_000),
  pppmW: positive(10_000_000),
  pppmRiseS: positive(1),
  pppmDecayS: positive(10),
};

/** The three values of a forward point (VF, IF, Tj) and of a reverse point (IR, VR, Tj). */
export const VF_POINT_RULES: readonly [NumberRule, NumberRule, NumberRule] = [positive(100), positive(100_000), kelvin];
export const IR_POINT_RULES: readonly [NumberRule, NumberRule, NumberRule] = [positive(10), positive(100_000), kelvin];

export function meetsRule(rule: NumberRule, value: number): boolean {
  return (rule.isMinExclusive ? value > rule.min : value >= rule.min) && value <= rule.max;
}

/** Names and group names: 1 to 120 characters, no control characters. */
export const IDENTITY_MAX_LENGTH = 120;
/** Descriptions, notes and approval notes. */
export const FREE_TEXT_MAX_LENGTH = 4000;
export const CONTROL_CHARACTER = /[\u0000-\u001f\u007f-\u009f]/;
export const CURRENCY_CODE = /^[A-Z]{3}$/;

/** Ratings each kind must give, by the part's key; rectifying kinds also need one VF point. */
const REQUIRED = {
  rectifying: ['vrrmV', 'ifAvA', 'tjMaxK'],
  zener: ['vzV', 'vzTol', 'iztA', 'pdW', 'tjMaxK'],
  tvs: ['vrwmV', 'vbrMinV', 'vcV', 'ippA', 'pppmW', 'pppmRiseS', 'pppmDecayS', 'tjMaxK'],
} as const;

export function requiredNumbers(kind: PartKind): readonly string[] {
  return isRectifying(kind) ? REQUIRED.rectifying : kind === 'zener' ? REQUIRED.zener : REQUIRED.tvs;
}
