import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readDesignText } from '../../src/circuits/design-file.js';
import { solvePosition } from '../../src/circuits/solve-position.js';
import { packageRoot } from '../../src/catalog/index.js';
import { FUZZ_RUNS, FUZZ_TIMEOUT_MS } from './fuzz-runs.js';

const base = readFileSync(join(packageRoot(), 'catalog-demo', 'fc-m24-tiller.yaml'), 'utf8');
const lines = base.split('\n');
const NASTY = ['-5 V', '5 A', '1e999', 'NaN', '', '[', '{a: 1}', '- x', '0', '-0', '∞', '4u7', '\u001b[2J', 'null', '~', '0x10', '1/0', '   ', '"', "'", ': :'];

/** The demo design with values replaced by nasty text, lines dropped or duplicated, bytes cut. */
const malformed = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 300 }),
  fc.array(fc.tuple(fc.nat(lines.length - 1), fc.constantFrom(...NASTY)), { minLength: 1, maxLength: 5 }).map((edits) => {
    const copy = [...lines];
    for (const [i, value] of edits) copy[i] = copy[i]!.includes(':') ? copy[i]!.replace(/:.*$/, `: ${value}`) : value;
    return copy.join('\n');
  }),
  fc.array(fc.nat(lines.length - 1), { minLength: 1, maxLength: 4 }).map((drop) => lines.filter((_, i) => !drop.includes(i)).join('\n')),
  fc.nat(base.length).map((n) => base.slice(0, n)),
);

describe('design-file loader on generated malformed files', () => {
  it(`never throws and locates every problem, and solving never yields NaN (${FUZZ_RUNS} inputs)`, () => {
    fc.assert(
      fc.property(malformed, (text) => {
        const read = readDesignText('fuzz.yaml', text);
        if (!read.ok) {
          for (const issue of read.issues) {
            expect(issue.file).toBe('fuzz.yaml');
            expect(issue.line > 0 || issue.field !== '').toBe(true);
            expect(issue.message.length).toBeGreaterThan(0);
          }
          return;
        }
        for (const position of read.design.positions) {
          const outcome = solvePosition(read.design, position);
          if (!outcome.ok) {
            for (const issue of outcome.issues) expect(issue.line).toBeGreaterThan(0);
            continue;
          }
          if (!outcome.result.ok) continue;
          for (const step of outcome.result.position.steps) expect(Number.isFinite(step.value)).toBe(true);
          for (const limit of outcome.result.position.limits) expect(Number.isFinite(limit.bound)).toBe(true);
        }
      }),
      { numRuns: FUZZ_RUNS },
    );
  }, FUZZ_TIMEOUT_MS);
});
