import { describe, expect, expectTypeOf, it } from 'vitest';
import { z } from 'zod';
import { quantitySchema } from '../../src/units/quantity-schema.js';

function messagesOf(schema: z.ZodType<number, number | string>, input: unknown): string[] {
  const result = schema.safeParse(input);
  return result.success ? [] : result.error.issues.map((issue) => issue.message);
}

describe('quantitySchema', () => {
  it('accepts SI numbers as they are and text through parseQuantity', () => {
    const schema = quantitySchema('current');
    expect(schema.parse(2)).toBe(2);
    expect(schema.parse('1.5 A')).toBe(1.5);
    expect(schema.parse('4m7')).toBe(4.7e-3);
    expect(quantitySchema('temperature').parse('85 \u00b0C')).toBe(358.15);
  });

  it('has number output and number | string input', () => {
    const schema = quantitySchema('voltage');
    expectTypeOf<z.output<typeof schema>>().toEqualTypeOf<number>();
    expectTypeOf<z.input<typeof schema>>().toEqualTypeOf<number | string>();
    expect(schema.parse('600 V')).toBe(600);
  });

  it('passes bareUnit through to the parser', () => {
    expect(quantitySchema('temperature', { bareUnit: 'K' }).parse('300')).toBe(300);
    expect(quantitySchema('temperature').parse('300')).toBe(573.15);
  });

  it('reports parse failures as custom issues carrying the unit issue', () => {
    const result = quantitySchema('current').safeParse('5 V');
    expect(result.success).toBe(false);
    expect(result.error?.issues).toEqual([
      {
        code: 'custom',
        message: 'expected a current, got "5 V" (a voltage)',
        params: { code: 'wrong-quantity', expected: 'a current such as "1.5 A", "500 mA" or "4m7"' },
        path: [],
      },
    ]);
  });

  it('rejects non-finite numbers and other types without NaN leaking out', () => {
    const schema = quantitySchema('current');
    expect(messagesOf(schema, Number.NaN)).toEqual(['expected a current, got NaN']);
    expect(messagesOf(schema, Number.POSITIVE_INFINITY)).toEqual(['expected a current, got Infinity']);
    expect(messagesOf(schema, true)).toEqual(['expected a current as a number or text']);
    expect(messagesOf(schema, undefined)).toEqual(['expected a current as a number or text']);
  });

  it.each([
    [{ positive: true }, 'voltage', '-5 V', 'expected a positive voltage, got "-5 V"'],
    [{ positive: true }, 'voltage', '0 V', 'expected a positive voltage, got "0 V"'],
    [{ positive: true }, 'voltage', -5, 'expected a positive voltage, got -5.00 V'],
    [{ positive: true }, 'inductance', '-1 mH', 'expected a positive inductance, got "-1 mH"'],
    [{ nonNegative: true }, 'current', '-1 mA', 'expected a non-negative current, got "-1 mA"'],
    [{ nonNegative: true }, 'energy', -1, 'expected a non-negative energy, got -1.00 J'],
    [{ min: 1 }, 'voltage', '500 mV', 'expected a voltage of at least 1.00 V, got "500 mV"'],
    [{ max: 600 }, 'voltage', '1 kV', 'expected a voltage of at most 600 V, got "1 kV"'],
    [{ max: 423.15 }, 'temperature', '175 \u00b0C', 'expected a temperature of at most 150 \u00b0C, got "175 \u00b0C"'],
    [{ min: 0, max: 1 }, 'ratio', '120 %', 'expected a ratio of at most 100 %, got "120 %"'],
  ] as const)('%j %s rejects %j', (options, kind, input, message) => {
    expect(messagesOf(quantitySchema(kind, options), input)).toEqual([message]);
  });

  it.each([
    [{ positive: true }, 'voltage', '5 V', 5],
    [{ nonNegative: true }, 'current', '0 A', 0],
    [{ min: 1, max: 600 }, 'voltage', '600 V', 600],
    [{ min: 1, max: 600 }, 'voltage', 1, 1],
  ] as const)('%j %s accepts %j at or inside the bounds', (options, kind, input, value) => {
    expect(quantitySchema(kind, options).parse(input)).toBe(value);
  });

  it('places the issue at the field inside an object schema', () => {
    const schema = z.object({ reverseVoltage: quantitySchema('voltage') });
    const result = schema.safeParse({ reverseVoltage: '5 A' });
    expect(result.error?.issues.map(({ path, message }) => ({ path, message }))).toEqual([
      { path: ['reverseVoltage'], message: 'expected a voltage, got "5 A" (a current)' },
    ]);
  });
});
