import { z } from 'zod';
import {
  APPROVAL_STATES,
  LIFECYCLES,
  RATING_REFERENCE_POINTS,
  RECTIFYING_KINDS,
  TVS_KINDS,
} from './part-kinds.js';
import { normalisePackage } from './packages.js';
import { checkPartConsistency } from './part-consistency.js';

// Every number is SI: volts, amperes, seconds, farads, coulombs, watts, ohms, K/W, and kelvin.
const KELVIN_MIN = 173.15; // −100 °C
const KELVIN_MAX = 773.15; // 500 °C

// A rating a kind must give says so when missing, instead of a bare type error.
const missingIsRequired = {
  error: (issue: { input?: unknown }) =>
    issue.input === undefined ? 'required for this kind of part' : undefined,
};
const VF_REQUIRED = 'at least one VF point is required for this kind of part';
const num = (isRequired: boolean) => z.number(isRequired ? missingIsRequired : undefined);
const positive = (max: number, isRequired = false) => num(isRequired).positive().max(max);
const kelvin = (isRequired = false) => num(isRequired).min(KELVIN_MIN).max(KELVIN_MAX);
// C0/C1 control characters would corrupt terminals and keys.
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;

// Only the type error: a too-long name keeps its own message rather than reading "must be text".
const identityText = z
  .string({ error: (issue) => (issue.code !== 'invalid_type' ? undefined : issue.input === undefined ? 'required' : 'must be text') })
  .trim()
  .min(1, 'must not be empty')
  .max(120)
  .refine((s) => !CONTROL.test(s), 'must not contain control characters');
const freeText = z.string().trim().max(4000);

export const vfPointSchema = z.object({
  vfV: positive(100),
  ifA: positive(100_000),
  tjK: kelvin(),
});
export type VfPoint = z.infer<typeof vfPointSchema>;

export const irPointSchema = z.object({
  irA: positive(10),
  vrV: positive(100_000),
  tjK: kelvin(),
});
export type IrPoint = z.infer<typeof irPointSchema>;

const commonShape = {
  manufacturer: identityText,
  partNumber: identityText,
  package: identityText.transform(normalisePackage),
  description: freeText.default(''),
  lifecycle: z.enum(LIFECYCLES).default('active'),
  approval: z.enum(APPROVAL_STATES).default('pending'),
  approvalNote: freeText.optional(),
  secondSourceGroup: identityText.optional(),
  unitPrice: z.number().nonnegative().max(1e6).optional(),
  currency: z
    .string()
    .regex(/^[A-Z]{3}$/, 'must be a three-letter ISO 4217 code such as EUR')
    .optional(),
  datasheetUrl: z.url({ protocol: /^https?$/ }).optional(),
  notes: freeText.optional(),
  // Ratings, each with its test condition beside it.
  vrrmV: positive(100_000).optional(),
  ifAvA: positive(100_000).optional(),
  ifAvRefK: kelvin().optional(),
  ifAvRef: z.enum(RATING_REFERENCE_POINTS).optional(),
  ifsmA: positive(1_000_000).optional(),
  ifsmPulseS: positive(10).optional(),
  vfPoints: z.array(vfPointSchema).default([]),
  irPoints: z.array(irPointSchema).default([]),
  cjF: positive(1e-3).optional(),
  cjVrV: z.number().nonnegative().max(100_000).optional(),
  trrS: positive(1e-2).optional(),
  qrrC: positive(1).optional(),
  tjMaxK: kelvin().optional(),
  rthJaKPerW: positive(10_000).optional(),
  rthJlKPerW: positive(10_000).optional(),
  rthJcKPerW: positive(10_000).optional(),
  pdW: positive(100_000).optional(),
  vzV: positive(10_000).optional(),
  vzTol: positive(0.5).optional(),
  iztA: positive(100).optional(),
  zztOhm: z.number().nonnegative().max(1e6).optional(),
  vzTempcoPerK: z.number().min(-0.01).max(0.01).optional(),
  vrwmV: positive(100_000).optional(),
  vbrMinV: positive(100_000).optional(),
  vbrMaxV: positive(100_000).optional(),
  vbrItA: positive(100).optional(),
  vcV: positive(100_000).optional(),
  ippA: positive(1_000_000).optional(),
  pppmW: positive(10_000_000).optional(),
  pppmRiseS: positive(1).optional(),
  pppmDecayS: positive(10).optional(),
};

/** Rectifying parts: blocking voltage, average current, a forward point and a junction limit. */
export const rectifyingPartSchema = z.object({
  ...commonShape,
  kind: z.enum(RECTIFYING_KINDS),
  vrrmV: positive(100_000, true),
  ifAvA: positive(100_000, true),
  tjMaxK: kelvin(true),
  // Missing (an empty cell) and an empty list are the same to the person filling it in.
  vfPoints: z
    .array(vfPointSchema, { error: (issue) => (issue.input === undefined ? VF_REQUIRED : undefined) })
    .min(1, VF_REQUIRED),
});

/** Zener parts work in breakdown: voltage, tolerance, test current and power. */
export const zenerPartSchema = z.object({
  ...commonShape,
  kind: z.literal('zener'),
  vzV: positive(10_000, true),
  vzTol: positive(0.5, true),
  iztA: positive(100, true),
  pdW: positive(100_000, true),
  tjMaxK: kelvin(true),
});

/** Transient suppressors: stand-off, breakdown, clamp at a rated pulse. */
export const tvsPartSchema = z.object({
  ...commonShape,
  kind: z.enum(TVS_KINDS),
  vrwmV: positive(100_000, true),
  vbrMinV: positive(100_000, true),
  vcV: positive(100_000, true),
  ippA: positive(1_000_000, true),
  pppmW: positive(10_000_000, true),
  pppmRiseS: positive(1, true),
  pppmDecayS: positive(10, true),
  tjMaxK: kelvin(true),
});

export const partSchema = z
  .discriminatedUnion('kind', [rectifyingPartSchema, zenerPartSchema, tvsPartSchema])
  .superRefine((part, ctx) => {
    for (const issue of checkPartConsistency(part)) {
      ctx.addIssue({ code: 'custom', path: [issue.field], message: issue.message });
    }
  });

export type Part = z.output<typeof partSchema>;
export type PartInput = z.input<typeof partSchema>;
