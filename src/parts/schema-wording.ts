import type { z } from 'zod';
import { formatQuantity, type QuantityKind } from '../units/index.js';
import { PART_FIELDS } from './part-fields.js';

/*
 * Plain words for the part schema's checks that carry no message of their own: zod's default
 * reads "Too big: expected number to be <=100000", in SI and without a unit. Given to safeParse
 * as its error map, so a message the schema sets itself still wins.
 */

/** The values of a VF or IR point, by the key part-schema.ts gives them. */
const POINT_VALUES: Readonly<Record<string, readonly [string, QuantityKind]>> = {
  vfV: ['VF', 'voltage'],
  ifA: ['IF', 'current'],
  irA: ['IR', 'current'],
  vrV: ['VR', 'voltage'],
  tjK: ['Tj', 'temperature'],
};

/** A bound in the field's display unit; temperatures in kelvin too, as files give them. */
function bound(value: number, kind: QuantityKind | undefined): string {
  if (kind === undefined) return String(value);
  const shown = formatQuantity(value, kind);
  return kind === 'temperature' ? `${shown} (${value} K)` : shown;
}

export const plainSchemaWording: z.core.$ZodErrorMap = (issue) => {
  const path = issue.path ?? [];
  const point = path.length === 3 ? POINT_VALUES[String(path[2])] : undefined;
  const kind = point ? point[1] : PART_FIELDS.find((f) => f.key === path[0])?.quantity;
  let words: string | undefined;
  if (issue.code === 'too_small' && issue.origin === 'number') {
    words = `must be ${issue.inclusive ? 'at least' : 'above'} ${bound(Number(issue.minimum), kind)}`;
  } else if (issue.code === 'too_big' && issue.origin === 'number') {
    words = `must be ${issue.inclusive ? 'at most' : 'below'} ${bound(Number(issue.maximum), kind)}`;
  } else if (issue.code === 'too_big' && issue.origin === 'string') {
    words = `must be at most ${Number(issue.maximum)} characters`;
  } else if (issue.code === 'invalid_value') {
    words = 'not one of the accepted values';
  } else if (issue.code === 'invalid_format' && issue.format === 'url') {
    words = 'not an http or https address';
  }
  if (words === undefined || !point) return words;
  return `point ${Number(path[1]) + 1}: ${point[0]} ${words}`;
};
