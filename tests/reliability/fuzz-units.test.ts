import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQuantity, QUANTITY_KINDS } from '../../src/units/index.js';
import { FUZZ_RUNS, FUZZ_TIMEOUT_MS } from './fuzz-runs.js';

const pieces = fc.constantFrom('4u7', 'µ', 'k', 'M', 'm', 'V', 'A', '°C', 'K', '%', '/K', 'e', '-', '+', '.', ',', ' ', '1', '9', '0', 'Ω', 'ohm', 'Hz', '/', '\u0000', '∞');

describe('unit parser on generated malformed input', () => {
  it(`never throws; returns a finite number or an issue saying what was expected (${FUZZ_RUNS} inputs per kind)`, () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary', maxLength: 40 }), fc.array(pieces, { maxLength: 12 }).map((p) => p.join(''))), fc.constantFrom(...QUANTITY_KINDS), (text, kind) => {
        const r = parseQuantity(text, kind);
        if (r.ok) expect(Number.isFinite(r.value)).toBe(true);
        else {
          expect(r.issue.message.length).toBeGreaterThan(0);
          expect(r.issue.expected.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: FUZZ_RUNS * QUANTITY_KINDS.length },
    );
  }, FUZZ_TIMEOUT_MS);
});
