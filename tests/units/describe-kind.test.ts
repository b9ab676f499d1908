import { describe, expect, it } from 'vitest';
import { describeKind, parseQuantity, QUANTITY_KINDS } from '../../src/units/index.js';

describe('describeKind', () => {
  it('describes a current as the brief shows', () => {
    expect(describeKind('current')).toEqual({ noun: 'a current', unit: 'A', examples: ['1.5 A', '500 mA', '4m7'] });
  });

  it.each([
    ['temperature', 'a temperature', '\u00b0C'],
    ['temperature-difference', 'a temperature difference', 'K'],
    ['thermal-resistance', 'a thermal resistance', '\u00b0C/W'],
    ['ratio', 'a ratio', '%'],
    ['tempco', 'a temperature coefficient', '%/K'],
    ['inductance', 'an inductance', 'H'],
    ['resistance', 'a resistance', '\u03a9'],
  ] as const)('%s is %s shown in %s', (kind, noun, unit) => {
    expect(describeKind(kind)).toMatchObject({ noun, unit });
  });

  it.each(QUANTITY_KINDS.map((kind) => [kind]))('every example for %s parses in its own field', (kind) => {
    const { examples } = describeKind(kind);
    expect(examples.length).toBeGreaterThanOrEqual(2);
    for (const example of examples) expect(parseQuantity(example, kind)).toMatchObject({ ok: true });
  });

  it('returns a copy, so callers cannot change the table', () => {
    describeKind('voltage').examples.push('oops');
    expect(describeKind('voltage').examples).toEqual(['600 V', '2 kV', '5V1']);
  });
});
