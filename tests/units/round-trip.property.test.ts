import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  describeKind,
  formatQuantity,
  formatWaveform,
  parseQuantity,
  parseWaveform,
  QUANTITY_KINDS,
  type QuantityKind,
} from '../../src/units/index.js';

const NUM_RUNS = 500;
const CODES = ['empty', 'not-a-number', 'wrong-quantity', 'unknown-unit', 'not-finite'];

/** sign × [1, 10) × 10^exponent: every decade equally likely, unlike fc.double. */
function decades(minExponent: number, maxExponent: number): fc.Arbitrary<number> {
  return fc
    .tuple(
      fc.double({ min: 1, max: 10, maxExcluded: true, noNaN: true }),
      fc.integer({ min: minExponent, max: maxExponent }),
      fc.boolean(),
    )
    .map(([mantissa, exponent, negative]) => (negative ? -1 : 1) * mantissa * 10 ** exponent);
}

const nonTemperatureKinds = QUANTITY_KINDS.filter((kind) => kind !== 'temperature');

function parsedValue(text: string, kind: QuantityKind): number {
  const result = parseQuantity(text, kind);
  if (!result.ok) throw new Error(`${JSON.stringify(text)} did not parse back: ${result.issue.message}`);
  return result.value;
}

describe('formatQuantity → parseQuantity round trip', () => {
  it('returns the value within the precision shown (relative 0.5 × 10^(1 − digits))', () => {
    fc.assert(
      fc.property(
        fc.oneof(decades(-18, 12), decades(-300, 300), fc.constant(0)),
        fc.constantFrom(...nonTemperatureKinds),
        fc.integer({ min: 1, max: 12 }),
        (value, kind, digits) => {
          const text = formatQuantity(value, kind, { digits });
          const back = parsedValue(text, kind);
          const tolerance = 0.5 * 10 ** (1 - digits) * Math.abs(value) + 4 * Number.EPSILON * Math.abs(value);
          expect(Math.abs(back - value), `${value} ${kind} → ${text} → ${back}`).toBeLessThanOrEqual(tolerance);
        },
      ),
      { numRuns: NUM_RUNS },
    );
  });

  it('returns a temperature within the absolute rounding shown in °C', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -273.15, max: 1e5, noNaN: true }),
        fc.integer({ min: 1, max: 8 }),
        (celsius, digits) => {
          const kelvin = celsius + 273.15;
          const text = formatQuantity(kelvin, 'temperature', { digits });
          const shown = /^-?\d+(?:\.(\d+))? °C$/.exec(text);
          expect(shown, text).not.toBeNull();
          const decimals = shown?.[1]?.length ?? 0;
          const back = parsedValue(text, 'temperature');
          expect(Math.abs(back - kelvin), `${kelvin} K → ${text} → ${back}`).toBeLessThanOrEqual(
            0.5 * 10 ** -decimals + 1e-9,
          );
        },
      ),
      { numRuns: NUM_RUNS },
    );
  });

  it('returns a waveform within three significant figures', () => {
    const time = decades(-12, 3).map(Math.abs);
    fc.assert(
      // A real surge decays after its front: the decay is at least twice the rise.
      fc.property(time, fc.double({ min: 2, max: 1000, noNaN: true }), (riseS, ratio) => {
        const decayS = riseS * ratio;
        const text = formatWaveform({ riseS, decayS });
        const back = parseWaveform(text);
        if (!back.ok) throw new Error(`${text}: ${back.issue.message}`);
        expect(Math.abs(back.value.riseS - riseS)).toBeLessThanOrEqual(5e-3 * riseS * (1 + 1e-9));
        expect(Math.abs(back.value.decayS - decayS)).toBeLessThanOrEqual(5e-3 * decayS * (1 + 1e-9));
      }),
      { numRuns: NUM_RUNS },
    );
  });
});

const PIECES = [
  '1', '4', '7', '0', '.', ',', 'e', 'E', '-', '+', '\u2212', ' ', '\u00a0', 'k', 'K', 'm', 'M', 'u',
  '\u00b5', '\u03bc', 'p', 'n', 'G', 'f', 'R', 'V', 'A', 'F', 'H', 'C', 'J', 'W', 's', 'Hz', '\u03a9',
  '\u2126', 'ohm', '\u00b0', '\u2103', 'deg', '/', '%', 'ppm', 'inf', 'NaN', '\u221e', "'", '_', '9'.repeat(400),
];

/** Random text, plus near-misses assembled from the pieces real input is made of. */
const anyText = fc.oneof(
  fc.string(),
  fc.string({ unit: 'binary' }),
  fc.string({ unit: 'grapheme' }),
  fc.array(fc.constantFrom(...PIECES), { maxLength: 8 }).map((pieces) => pieces.join('')),
);

function expectLocatedIssue(
  issue: { code: string; message: string; expected: string },
  text: string,
  noun: string,
): void {
  expect(CODES).toContain(issue.code);
  expect(issue.message.startsWith(`expected ${noun}, got `)).toBe(true);
  expect(issue.expected.startsWith(`${noun} such as "`)).toBe(true);
  const trimmed = text.trim();
  if (issue.code === 'empty') expect(trimmed).toBe('');
  else if (Array.from(trimmed).length <= 40) expect(issue.message).toContain(JSON.stringify(trimmed));
}

describe('parsers never throw', () => {
  it('parseQuantity returns a finite value or an issue that quotes the input', () => {
    fc.assert(
      fc.property(anyText, fc.constantFrom(...QUANTITY_KINDS), fc.option(anyText, { nil: undefined }), (text, kind, bareUnit) => {
        const result = parseQuantity(text, kind, { bareUnit });
        if (result.ok) {
          expect(Number.isFinite(result.value)).toBe(true);
          expect(typeof result.note === 'string').toBe(result.usedDefaultUnit);
        } else {
          expectLocatedIssue(result.issue, text, describeKind(kind).noun);
        }
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it('parseWaveform returns finite times or an issue that quotes the input', () => {
    fc.assert(
      fc.property(fc.oneof(anyText, anyText.map((text) => `8/${text}`)), (text) => {
        const result = parseWaveform(text);
        if (result.ok) {
          expect(Number.isFinite(result.value.riseS) && Number.isFinite(result.value.decayS)).toBe(true);
        } else {
          expectLocatedIssue(result.issue, text, 'a surge waveform');
        }
      }),
      { numRuns: NUM_RUNS },
    );
  });
});
