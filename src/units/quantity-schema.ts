import { z } from 'zod';
import { formatQuantity } from './format-quantity.js';
import { parseQuantity } from './parse-quantity.js';
import { describeKind, type QuantityKind } from './quantity-kinds.js';
import { quoteInput } from './unit-issue.js';

export interface QuantitySchemaOptions {
  /** Inclusive bounds, in SI units (kelvin for temperature). */
  min?: number;
  max?: number;
  positive?: boolean;
  nonNegative?: boolean;
  bareUnit?: string;
}

function shown(input: number | string, value: number, kind: QuantityKind): string {
  return typeof input === 'string' ? quoteInput(input) : formatQuantity(value, kind);
}

function describeNoun(noun: string, qualifier: string): string {
  const bare = noun.replace(/^an? /, '');
  return `${/^[aeiou]/.test(qualifier) ? 'an' : 'a'} ${qualifier} ${bare}`;
}

/** Why the value breaks the options' range, or undefined if it is in range. */
function rangeProblem(value: number, kind: QuantityKind, options: QuantitySchemaOptions): string | undefined {
  const { noun } = describeKind(kind);
  if (options.positive && !(value > 0)) return describeNoun(noun, 'positive');
  if (options.nonNegative && !(value >= 0)) return describeNoun(noun, 'non-negative');
  if (options.min !== undefined && value < options.min) {
    return `${noun} of at least ${formatQuantity(options.min, kind)}`;
  }
  if (options.max !== undefined && value > options.max) {
    return `${noun} of at most ${formatQuantity(options.max, kind)}`;
  }
  return undefined;
}

/**
 * Accepts an SI number or text such as "600 V" and outputs the SI number.
 * Failures are zod custom issues whose message names what was expected and
 * what was got; `params` carries the UnitIssue code and accepted form.
 */
export function quantitySchema(
  kind: QuantityKind,
  options: QuantitySchemaOptions = {},
): z.ZodType<number, number | string> {
  const { noun } = describeKind(kind);
  return z
    .custom<number | string>(
      (input) => typeof input === 'number' || typeof input === 'string',
      `expected ${noun} as a number or text`,
    )
    .transform((input, ctx) => {
      let value: number;
      if (typeof input === 'number') {
        if (!Number.isFinite(input)) {
          ctx.addIssue({ code: 'custom', message: `expected ${noun}, got ${String(input)}`, input });
          return z.NEVER;
        }
        value = input;
      } else {
        const parsed = parseQuantity(input, kind, { bareUnit: options.bareUnit });
        if (!parsed.ok) {
          const { code, expected } = parsed.issue;
          ctx.addIssue({ code: 'custom', message: parsed.issue.message, input, params: { code, expected } });
          return z.NEVER;
        }
        value = parsed.value;
      }
      const problem = rangeProblem(value, kind, options);
      if (problem) {
        ctx.addIssue({ code: 'custom', message: `expected ${problem}, got ${shown(input, value, kind)}`, input });
        return z.NEVER;
      }
      return value;
    });
}
