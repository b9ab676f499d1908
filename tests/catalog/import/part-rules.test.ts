import { describe, expect, it } from 'vitest';
import { IR_POINT_RULES, NUMBER_RULES, VF_POINT_RULES, meetsRule, requiredNumbers, type NumberRule } from '../../../src/catalog/import/part-rules.js';
import { PART_KINDS } from '../../../src/parts/index.js';
import { irPointSchema, rectifyingPartSchema, tvsPartSchema, vfPointSchema, zenerPartSchema } from '../../../src/parts/part-schema.js';

type Schema = { safeParse(v: unknown): { success: boolean } };

/** Values at, just inside and just outside each bound, and a few far away. */
function probes(rule: NumberRule): number[] {
  const near = (x: number) => [x, x * (1 + 1e-12) + 1e-300, x * (1 - 1e-12) - 1e-300];
  return [...near(rule.min), ...near(rule.max), 0, -0, -1, 1, 1e-300, 1e300, (rule.min + rule.max) / 2];
}

function agrees(rule: NumberRule, schema: Schema): void {
  for (const v of probes(rule)) expect([v, meetsRule(rule, v)]).toEqual([v, schema.safeParse(v).success]);
}

describe('the fast decoder rules and part-schema.ts', () => {
  it.each(Object.entries(NUMBER_RULES))('agree on the bounds of %s', (key, rule) => {
    agrees(rule, (rectifyingPartSchema.shape as Record<string, Schema>)[key]!);
  });

  it('agree on the bounds of point values', () => {
    ['vfV', 'ifA', 'tjK'].forEach((k, i) => agrees(VF_POINT_RULES[i]!, (vfPointSchema.shape as Record<string, Schema>)[k]!));
    ['irA', 'vrV', 'tjK'].forEach((k, i) => agrees(IR_POINT_RULES[i]!, (irPointSchema.shape as Record<string, Schema>)[k]!));
  });

  it.each(PART_KINDS)('agree on the ratings a %s must give', (kind) => {
    const schema = kind === 'zener' ? zenerPartSchema : kind.startsWith('tvs') ? tvsPartSchema : rectifyingPartSchema;
    const shape = schema.shape as Record<string, Schema>;
    const required = Object.keys(NUMBER_RULES).filter((key) => shape[key] && !shape[key]!.safeParse(undefined).success);
    expect(required.sort()).toEqual([...requiredNumbers(kind)].sort());
  });
});
