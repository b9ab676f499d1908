import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readPartsText, writePartsText, type PartFileFormat } from '../../src/catalog/index.js';
import { partSchema } from '../../src/parts/part-schema.js';
import { aPart } from '../helpers/a-part.js';
import { FUZZ_RUNS, FUZZ_TIMEOUT_MS } from './fuzz-runs.js';

const valid = [aPart('schottky', { irPoints: [{ irA: 5e-5, vrV: 40, tjK: 298.15 }], description: 'a, "quoted" one' }), aPart('zener', { vzTempcoPerK: -3e-4 }), aPart('tvs')];

/** A valid export with some of its characters or lines replaced, cut or repeated. */
function mutated(format: PartFileFormat) {
  const text = writePartsText(valid, format);
  return fc.oneof(
    fc.string({ unit: 'binary', maxLength: 400 }),
    fc.tuple(fc.nat(text.length), fc.nat(60), fc.string({ unit: 'binary', maxLength: 20 })).map(([at, cut, insert]) => text.slice(0, at) + insert + text.slice(at + cut)),
    fc.tuple(fc.nat(text.length)).map(([at]) => text.slice(0, at)),
    fc.array(fc.tuple(fc.nat(text.length), fc.constantFrom('"', ',', '\n', '\r', '@', ';', '\u0000', '\u001b[31m', 'NaN', '1e999', '-', '=cmd')), { maxLength: 6 }).map((edits) =>
      edits.reduce((t, [at, s]) => t.slice(0, at) + s + t.slice(at), text),
    ),
  );
}

describe.each(['csv', 'json'] as const)('import of generated malformed %s', (format) => {
  it(`never throws, locates every rejection, and lets only valid parts through (${FUZZ_RUNS} inputs)`, () => {
    fc.assert(
      fc.property(mutated(format), (text) => {
        const r = readPartsText('fuzz.' + format, text, format);
        for (const issue of r.issues) {
          expect(issue.file).toBe('fuzz.' + format);
          expect(issue.line).toBeGreaterThanOrEqual(0);
          expect(issue.message.length).toBeGreaterThan(0);
          // A row-level problem names its line; only whole-file problems may use line 0.
          if (!r.isUnreadable) expect(issue.line).toBeGreaterThan(0);
        }
        for (const { part } of r.parts) expect(partSchema.safeParse(part).success).toBe(true);
      }),
      { numRuns: FUZZ_RUNS },
    );
  }, FUZZ_TIMEOUT_MS);
});
