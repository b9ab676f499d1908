import { describe, expect, it } from 'vitest';
import { parseQuantity, type QuantityKind } from '../../src/units/index.js';

describe('IEC 60062 (RKM code): the letter stands where the decimal point is', () => {
  it.each([
    ['4k7', 'resistance', 4700, 'no unit given; read as 4.7 k\u03a9'],
    ['2M2', 'resistance', 2.2e6, 'no unit given; read as 2.2 M\u03a9'],
    ['1G5', 'resistance', 1.5e9, 'no unit given; read as 1.5 G\u03a9'],
    ['2K2', 'resistance', 2200, 'no unit given; read as 2.2 k\u03a9'],
    ['47n', 'capacitance', 47e-9, 'no unit given; read as 47 nF'],
    ['4n7', 'capacitance', 4.7e-9, 'no unit given; read as 4.7 nF'],
    ['1p5', 'capacitance', 1.5e-12, 'no unit given; read as 1.5 pF'],
    ['n47', 'capacitance', 0.47e-9, 'no unit given; read as 0.47 nF'],
    ['\u00b547', 'capacitance', 0.47e-6, 'no unit given; read as 0.47 \u00b5F'],
    ['4u7', 'capacitance', 4.7e-6, 'no unit given; read as 4.7 \u00b5F'],
    ['4u7', 'current', 4.7e-6, 'no unit given; read as 4.7 \u00b5A'],
    ['4\u03bc7', 'inductance', 4.7e-6, 'no unit given; read as 4.7 \u00b5H'],
    ['4m7', 'current', 4.7e-3, 'no unit given; read as 4.7 mA'],
  ] as const)('%s as %s → %d (prefix letter, unit assumed)', (text, kind, si, note) => {
    expect(parseQuantity(text, kind)).toEqual({ ok: true, value: si, usedDefaultUnit: true, note });
  });

  it.each([
    ['R47', 'resistance', 0.47],
    ['4R7', 'resistance', 4.7],
    ['0R1', 'resistance', 0.1],
    ['4V7', 'voltage', 4.7],
    ['5V1', 'voltage', 5.1],
    ['-4V7', 'voltage', -4.7],
    ['1A5', 'current', 1.5],
    ['2W5', 'power', 2.5],
    ['4k7\u03a9', 'resistance', 4700],
    ['4k7 ohm', 'resistance', 4700],
    ['4u7F', 'capacitance', 4.7e-6],
    ['4u7 F', 'capacitance', 4.7e-6],
    ['1p5 F', 'capacitance', 1.5e-12],
  ] as const)('%s as %s → %d (unit written)', (text, kind, si) => {
    expect(parseQuantity(text, kind)).toEqual({ ok: true, value: si, usedDefaultUnit: false });
  });

  it.each([
    ['4R7', 'voltage', 'expected a voltage, got "4R7" (a resistance)'],
    ['4V7', 'current', 'expected a current, got "4V7" (a voltage)'],
    ['4u7V', 'current', 'expected a current, got "4u7V" (a voltage)'],
  ] as const)('%s as %s names the quantity its letter belongs to', (text, kind: QuantityKind, message) => {
    const result = parseQuantity(text, kind);
    expect(result).toMatchObject({ ok: false, issue: { code: 'wrong-quantity', message } });
  });

  it.each([
    ['4V7V', 'voltage', 'expected a voltage, got "4V7V": unknown unit "VV"'],
    ['4k7', 'temperature', 'expected a temperature, got "4k7": unknown unit "k"'],
  ] as const)('%s as %s is an unknown unit', (text, kind: QuantityKind, message) => {
    expect(parseQuantity(text, kind)).toMatchObject({ ok: false, issue: { code: 'unknown-unit', message } });
  });

  it('reads a digit after a space as a separate (refused) group, not as RKM', () => {
    expect(parseQuantity('4k7 5', 'resistance')).toMatchObject({
      ok: false,
      issue: { code: 'unknown-unit', message: 'expected a resistance, got "4k7 5": unknown unit "k7 5"' },
    });
  });
});
