import { describe, expect, it } from 'vitest';
import { parseQuantity, type QuantityKind, type UnitIssue } from '../../src/units/index.js';

type Case = [text: string, kind: QuantityKind, si: number];

function valueOf(text: string, kind: QuantityKind): number {
  const result = parseQuantity(text, kind);
  if (!result.ok) throw new Error(`"${text}" as ${kind} failed: ${result.issue.message}`);
  return result.value;
}

function issueOf(text: string, kind: QuantityKind, options?: { bareUnit?: string }): UnitIssue {
  const result = parseQuantity(text, kind, options);
  if (result.ok) throw new Error(`"${text}" as ${kind} unexpectedly parsed to ${result.value}`);
  return result.issue;
}

describe('parseQuantity: units written out, converted to SI', () => {
  const cases: Case[] = [
    ['600 V', 'voltage', 600],
    ['600V', 'voltage', 600],
    ['600v', 'voltage', 600],
    ['2 kV', 'voltage', 2000],
    ['2 KV', 'voltage', 2000],
    ['10 mV', 'voltage', 0.01],
    ['10 MV', 'voltage', 1e7],
    ['+5 V', 'voltage', 5],
    ['-5 V', 'voltage', -5],
    ['\u221212 V', 'voltage', -12],
    ['  600 V  ', 'voltage', 600],
    ['600\u00a0V', 'voltage', 600],
    ['.5 V', 'voltage', 0.5],
    ['5. V', 'voltage', 5],
    ['1.5A', 'current', 1.5],
    ['4.7\u00b5A', 'current', 4.7e-6],
    ['4.7\u03bcA', 'current', 4.7e-6],
    ['4.7uA', 'current', 4.7e-6],
    ['4.7 \u00b5 A', 'current', 4.7e-6],
    ['500 mA', 'current', 0.5],
    ['1e-6 A', 'current', 1e-6],
    ['1E-6A', 'current', 1e-6],
    ['1.5e3 mA', 'current', 1.5],
    ['2 amps', 'current', 2],
    ['10 m\u03a9', 'resistance', 0.01],
    ['10mohm', 'resistance', 0.01],
    ['10 Mohm', 'resistance', 1e7],
    ['10 M\u03a9', 'resistance', 1e7],
    ['10 k\u03a9', 'resistance', 1e4],
    ['10 k\u2126', 'resistance', 1e4],
    ['10 kOhm', 'resistance', 1e4],
    ['100R', 'resistance', 100],
    ['220 \u00b5F', 'capacitance', 220e-6],
    ['220uf', 'capacitance', 220e-6],
    ['150 pF', 'capacitance', 150e-12],
    ['10 \u00b5H', 'inductance', 10e-6],
    ['2.2 mH', 'inductance', 2.2e-3],
    ['3 nC', 'charge', 3e-9],
    ['45 mJ', 'energy', 45e-3],
    ['600 W', 'power', 600],
    ['1.5 kW', 'power', 1500],
    ['8.3 ms', 'time', 8.3e-3],
    ['10 us', 'time', 10e-6],
    ['10 \u00b5s', 'time', 10e-6],
    ['5 msec', 'time', 5e-3],
    ['50 Hz', 'frequency', 50],
    ['100kHz', 'frequency', 1e5],
    ['100 KHZ', 'frequency', 1e5],
    ['2 MHz', 'frequency', 2e6],
    ['62 \u00b0C/W', 'thermal-resistance', 62],
    ['62 K/W', 'thermal-resistance', 62],
    ['62 C/W', 'thermal-resistance', 62],
    ['62 \u00b0C / W', 'thermal-resistance', 62],
    ['5 %', 'ratio', 0.05],
    ['80 %', 'ratio', 0.8],
    ['100 ppm', 'ratio', 1e-4],
    ['0.06 %/\u00b0C', 'tempco', 6e-4],
    ['0.06 %/K', 'tempco', 6e-4],
    ['600 ppm/K', 'tempco', 6e-4],
    ['6e-4 /K', 'tempco', 6e-4],
    ['-0.06 %/C', 'tempco', -6e-4],
  ];
  it.each(cases)('%s as %s → %d', (text, kind, si) => {
    expect(parseQuantity(text, kind)).toEqual({ ok: true, value: si, usedDefaultUnit: false });
  });
});

// T/°C = T/K − 273.15 exactly (SI Brochure, 9th ed., §2.3.1); temperature is kelvin inside.
describe('parseQuantity: temperature in kelvin', () => {
  const cases: Case[] = [
    ['85 \u00b0C', 'temperature', 358.15],
    ['85C', 'temperature', 358.15],
    ['85 degC', 'temperature', 358.15],
    ['85 deg C', 'temperature', 358.15],
    ['85 \u2103', 'temperature', 358.15],
    ['85 celsius', 'temperature', 358.15],
    ['-40 \u00b0C', 'temperature', 233.15],
    ['0 \u00b0C', 'temperature', 273.15],
    ['-273.15 \u00b0C', 'temperature', 0],
    ['300 K', 'temperature', 300],
    ['300K', 'temperature', 300],
    ['10 K', 'temperature-difference', 10],
    ['10 \u00b0C', 'temperature-difference', 10],
    ['10 C', 'temperature-difference', 10],
  ];
  it.each(cases)('%s as %s → %d K', (text, kind, si) => {
    expect(valueOf(text, kind)).toBe(si);
  });
});

describe('parseQuantity: a bare number takes the default unit and says so', () => {
  it.each([
    ['600', 'voltage', 600, 'no unit given; read as 600 V'],
    ['1.5', 'current', 1.5, 'no unit given; read as 1.5 A'],
    ['85', 'temperature', 358.15, 'no unit given; read as 85 \u00b0C'],
    ['-40', 'temperature', 233.15, 'no unit given; read as -40 \u00b0C'],
    ['10', 'temperature-difference', 10, 'no unit given; read as 10 K'],
    ['62', 'thermal-resistance', 62, 'no unit given; read as 62 K/W'],
    ['0.8', 'ratio', 0.8, 'no unit given; read as the fraction 0.8 (80.0 %)'],
    ['6e-4', 'tempco', 6e-4, 'no unit given; read as 6e-4 /K'],
    ['10k', 'resistance', 1e4, 'no unit given; read as 10 k\u03a9'],
    ['10K', 'resistance', 1e4, 'no unit given; read as 10 k\u03a9'],
    ['47n', 'capacitance', 47e-9, 'no unit given; read as 47 nF'],
    // A lone "f" is the femto prefix, never farad: 10 f is 10 fF.
    ['10f', 'capacitance', 10e-15, 'no unit given; read as 10 fF'],
  ] as const)('%s as %s', (text, kind, si, note) => {
    expect(parseQuantity(text, kind)).toEqual({ ok: true, value: si, usedDefaultUnit: true, note });
  });

  it('reads a bare number in options.bareUnit, as the catalog does for kelvin columns', () => {
    expect(parseQuantity('300', 'temperature', { bareUnit: 'K' })).toEqual({
      ok: true,
      value: 300,
      usedDefaultUnit: true,
      note: 'no unit given; read as 300 K',
    });
    expect(parseQuantity('5', 'current', { bareUnit: 'mA' })).toEqual({
      ok: true,
      value: 0.005,
      usedDefaultUnit: true,
      note: 'no unit given; read as 5 mA',
    });
  });

  it('ignores options.bareUnit when a unit is written', () => {
    expect(parseQuantity('85 \u00b0C', 'temperature', { bareUnit: 'K' })).toEqual({
      ok: true,
      value: 358.15,
      usedDefaultUnit: false,
    });
  });
});

describe('parseQuantity: errors say what was expected and what was got', () => {
  const currentForm = 'a current such as "1.5 A", "500 mA" or "4m7"';
  const voltageForm = 'a voltage such as "600 V", "2 kV" or "5V1"';

  it.each([
    ['', 'nothing'],
    ['   ', 'nothing'],
  ])('empty input %j', (text) => {
    expect(issueOf(text, 'current')).toEqual({
      code: 'empty',
      message: 'expected a current, got nothing',
      expected: currentForm,
    });
  });

  it.each([
    ['5 V', 'current', 'expected a current, got "5 V" (a voltage)'],
    ['4V7', 'current', 'expected a current, got "4V7" (a voltage)'],
    ['5 C', 'current', 'expected a current, got "5 C" (a charge or a temperature)'],
    ['85 \u00b0C', 'voltage', 'expected a voltage, got "85 \u00b0C" (a temperature)'],
    ['5 %', 'voltage', 'expected a voltage, got "5 %" (a ratio)'],
    ['62 K', 'thermal-resistance', 'expected a thermal resistance, got "62 K" (a temperature)'],
    ['62 K/W', 'temperature', 'expected a temperature, got "62 K/W" (a thermal resistance)'],
    ['10 \u00b5F', 'inductance', 'expected an inductance, got "10 \u00b5F" (a capacitance)'],
  ] as const)('%s as %s is the wrong quantity', (text, kind, message) => {
    expect(issueOf(text, kind)).toMatchObject({ code: 'wrong-quantity', message });
  });

  it('gives the accepted form with examples in every issue', () => {
    expect(issueOf('5 V', 'current')).toEqual({
      code: 'wrong-quantity',
      message: 'expected a current, got "5 V" (a voltage)',
      expected: currentForm,
    });
  });

  it.each([
    ['5 xyz', 'current', 'expected a current, got "5 xyz": unknown unit "xyz"'],
    ['85 \u00b0F', 'temperature', 'expected a temperature, got "85 \u00b0F": unknown unit "\u00b0F"'],
    ['4k7', 'temperature', 'expected a temperature, got "4k7": unknown unit "k"'],
    ['10 m', 'temperature', 'expected a temperature, got "10 m": unknown unit "m"'],
    ['4k7.5', 'resistance', 'expected a resistance, got "4k7.5": unknown unit "k7.5"'],
  ] as const)('%s as %s has an unknown unit', (text, kind, message) => {
    expect(issueOf(text, kind)).toMatchObject({ code: 'unknown-unit', message });
  });

  it('rejects options.bareUnit that is not a unit of the field', () => {
    expect(issueOf('5', 'current', { bareUnit: 'V' })).toEqual({
      code: 'unknown-unit',
      message: 'expected a current, got "5": unknown unit "V"',
      expected: currentForm,
    });
  });

  it.each([
    ['abc', 'expected a voltage, got "abc", which is not a number'],
    ['V', 'expected a voltage, got "V", which is not a number'],
    ['--5 V', 'expected a voltage, got "--5 V", which is not a number'],
    ['1.2.3 V', 'expected a voltage, got "1.2.3 V", which is not a number'],
    ['1,5 V', 'expected a voltage, got "1,5 V": use a dot as the decimal point, e.g. "1.5 V"'],
    [
      '1,000 V',
      'expected a voltage, got "1,000 V": use a dot as the decimal point and no thousands separators, e.g. "1.000 V" or "1000 V"',
    ],
    ['1,000.5 V', 'expected a voltage, got "1,000.5 V": leave out thousands separators, e.g. "1000.5 V"'],
    ['1,000,000 V', 'expected a voltage, got "1,000,000 V": leave out thousands separators, e.g. "1000000 V"'],
    ['1 000 V', 'expected a voltage, got "1 000 V": leave out thousands separators, e.g. "1000 V"'],
    ["1'000 V", 'expected a voltage, got "1\'000 V": leave out thousands separators, e.g. "1000 V"'],
  ])('%j is not a number', (text, message) => {
    expect(issueOf(text, 'voltage')).toEqual({ code: 'not-a-number', message, expected: voltageForm });
  });

  it.each([
    ['1e999 V', 'expected a voltage, got "1e999 V", which is not a finite number'],
    ['1e308 GV', 'expected a voltage, got "1e308 GV", which is not a finite number'],
    ['NaN', 'expected a voltage, got "NaN", which is not a finite number'],
    ['Infinity V', 'expected a voltage, got "Infinity V", which is not a finite number'],
    ['-inf', 'expected a voltage, got "-inf", which is not a finite number'],
    ['\u221e V', 'expected a voltage, got "\u221e V", which is not a finite number'],
  ])('%j is not finite', (text, message) => {
    expect(issueOf(text, 'voltage')).toEqual({ code: 'not-finite', message, expected: voltageForm });
  });

  it('shortens long input in messages and escapes control characters', () => {
    const issue = issueOf(`${'x'.repeat(60)}\u0007`, 'voltage');
    expect(issue.message).toBe(`expected a voltage, got "${'x'.repeat(39)}\u2026", which is not a number`);
    expect(issueOf('5 \u0007', 'voltage').message).toBe('expected a voltage, got "5 \\u0007": unknown unit "\\u0007"');
  });
});

describe('parseQuantity: edge values', () => {
  it('keeps the sign and never returns -0', () => {
    expect(valueOf('-0 V', 'voltage')).toBe(0);
    expect(Object.is(valueOf('-0 V', 'voltage'), 0)).toBe(true);
    expect(valueOf('-1.5 mA', 'current')).toBe(-0.0015);
  });

  it('reads an underflowing value as zero rather than failing', () => {
    expect(valueOf('1e-400 V', 'voltage')).toBe(0);
  });

  it('reads the decimal exactly before converting (no binary drift from prefixes)', () => {
    expect(valueOf('4.7 \u00b5A', 'current')).toBe(4.7e-6);
    expect(valueOf('0.1 mV', 'voltage')).toBe(1e-4);
    expect(valueOf('25.3 \u00b0C', 'temperature')).toBe(298.45);
  });
});
