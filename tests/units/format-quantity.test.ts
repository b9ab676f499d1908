import { describe, expect, it } from 'vitest';
import { formatQuantity, type QuantityKind } from '../../src/units/index.js';

describe('formatQuantity: engineering notation with SI prefixes', () => {
  it.each([
    [4.7e-6, 'current', '4.70 \u00b5A'],
    [600, 'voltage', '600 V'],
    [0.0123, 'voltage', '12.3 mV'],
    [1500, 'voltage', '1.50 kV'],
    [0, 'voltage', '0 V'],
    [-0, 'voltage', '0 V'],
    [-4.7e-6, 'current', '-4.70 \u00b5A'],
    [4700, 'resistance', '4.70 k\u03a9'],
    [1e4, 'resistance', '10.0 k\u03a9'],
    [2.2e6, 'resistance', '2.20 M\u03a9'],
    [1.5e9, 'resistance', '1.50 G\u03a9'],
    [4.7e-9, 'capacitance', '4.70 nF'],
    [150e-12, 'capacitance', '150 pF'],
    [1e-15, 'capacitance', '1.00 fF'],
    [220e-6, 'capacitance', '220 \u00b5F'],
    [2.2e-3, 'inductance', '2.20 mH'],
    [3e-9, 'charge', '3.00 nC'],
    [45e-3, 'energy', '45.0 mJ'],
    [1500, 'power', '1.50 kW'],
    [8.3e-3, 'time', '8.30 ms'],
    [50, 'frequency', '50.0 Hz'],
    [1e5, 'frequency', '100 kHz'],
  ] as const)('%d %s → %s', (value, kind, text) => {
    expect(formatQuantity(value, kind)).toBe(text);
  });

  it.each([
    [0.9997, '1.00 V'],
    [999.7e-3, '1.00 V'],
    [999.4e-3, '999 mV'],
    [999_600, '1.00 MV'],
    [-0.9997, '-1.00 V'],
  ])('rounds across the prefix boundary: %d → %s', (value, text) => {
    expect(formatQuantity(value, 'voltage')).toBe(text);
  });

  it('beyond f … G falls back to an engineering exponent that still parses', () => {
    expect(formatQuantity(1.5e12, 'voltage')).toBe('1.50e12 V');
    expect(formatQuantity(1e-18, 'current')).toBe('1.00e-18 A');
    expect(formatQuantity(5e-324, 'current')).toBe('4.94e-324 A');
  });

  it.each([
    [1, 4.7e-6, '5 \u00b5A'],
    [2, 4.7e-6, '4.7 \u00b5A'],
    [4, 4.7e-6, '4.700 \u00b5A'],
    [1, 600, '600 A'],
    [1, 650, '700 A'],
    [2, 123_456, '120 kA'],
    [0, 4.7e-6, '5 \u00b5A'],
    [2.6, 4.7e-6, '4.70 \u00b5A'],
    [99, 0.5, '500.00000000000000 mA'],
  ])('digits %d: %d A → %s (clamped to 1 … 17, rounded)', (digits, value, text) => {
    expect(formatQuantity(value, 'current', { digits })).toBe(text);
  });

  it('shows non-finite values instead of throwing', () => {
    expect(formatQuantity(Number.NaN, 'voltage')).toBe('NaN V');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'voltage')).toBe('\u221e V');
    expect(formatQuantity(Number.NEGATIVE_INFINITY, 'temperature')).toBe('-\u221e \u00b0C');
  });
});

describe('formatQuantity: temperature shown in °C, never fewer digits than the integer part', () => {
  // T/°C = T/K − 273.15 (SI Brochure, 9th ed., §2.3.1).
  it.each([
    [298.15, 3, '25.0 \u00b0C'],
    [398.15, 3, '125 \u00b0C'],
    [233.15, 3, '-40.0 \u00b0C'],
    [273.15, 3, '0.00 \u00b0C'],
    [273.0, 3, '-0.15 \u00b0C'],
    [273.149, 3, '0.00 \u00b0C'],
    [283.146, 3, '10.0 \u00b0C'],
    [373.1, 3, '100 \u00b0C'],
    [1500, 3, '1227 \u00b0C'],
    [0, 3, '-273 \u00b0C'],
    [298.15, 4, '25.00 \u00b0C'],
    [298.15, 1, '25 \u00b0C'],
  ])('%d K with %d digits → %s', (kelvin, digits, text) => {
    expect(formatQuantity(kelvin, 'temperature', { digits })).toBe(text);
  });
});

describe('formatQuantity: unprefixed quantities', () => {
  it.each([
    [10, 'temperature-difference', '10.0 K'],
    [62, 'thermal-resistance', '62.0 \u00b0C/W'],
    [0.5, 'thermal-resistance', '0.500 \u00b0C/W'],
    [1234, 'thermal-resistance', '1230 \u00b0C/W'],
    [0.8, 'ratio', '80.0 %'],
    [0.05, 'ratio', '5.00 %'],
    [1, 'ratio', '100 %'],
    [0, 'ratio', '0 %'],
    [1e-7, 'ratio', '1.00e-5 %'],
    [6e-4, 'tempco', '0.0600 %/K'],
    [-6e-4, 'tempco', '-0.0600 %/K'],
    [2e4, 'thermal-resistance', '20000 \u00b0C/W'],
    [2e6, 'thermal-resistance', '2.00e6 \u00b0C/W'],
  ] as const)('%d %s → %s', (value, kind: QuantityKind, text) => {
    expect(formatQuantity(value, kind)).toBe(text);
  });
});
