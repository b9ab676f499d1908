import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQuery } from '../../src/selection/query/index.js';
import { FUZZ_RUNS, FUZZ_TIMEOUT_MS } from './fuzz-runs.js';

const pieces = fc.constantFrom('vrrm', 'if', 'vz', 'tol', 'maker', 'kind', 'approval', '>=', '<=', '>', '<', '=', '..', '-', '"', ' ', '40V', '2A', '5.1', '%', 'sma', 'sod123', 'schottky', 'tvs', 'x', 'µ', '\u0000', '∞', 'e999', ':', '(');

describe('query syntax on generated malformed input', () => {
  it(`never throws; every rejection points at a term inside the text (${FUZZ_RUNS} inputs)`, () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary', maxLength: 60 }), fc.array(pieces, { maxLength: 14 }).map((p) => p.join(''))), (text) => {
        const r = parseQuery(text);
        if (r.ok) return;
        expect(r.issues.length).toBeGreaterThan(0);
        for (const issue of r.issues) {
          expect(issue.message.length).toBeGreaterThan(0);
          expect(issue.start).toBeGreaterThanOrEqual(0);
          expect(issue.end).toBeGreaterThanOrEqual(issue.start);
          expect(issue.end).toBeLessThanOrEqual(text.length);
        }
      }),
      { numRuns: FUZZ_RUNS },
    );
  }, FUZZ_TIMEOUT_MS);
});
