import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { oneSlipVariants, slipProofPieces } from '../../../src/catalog/search/index.js';
import { editDistance } from '../../../src/selection/query/index.js';

const key = fc.string({ unit: fc.constantFrom(...'0123456789ABCDEFGHKLRSTVXZ'.split('')), minLength: 1, maxLength: 14 });

/** One slip of a hand at a position: wrong, missing, extra or two swapped. */
const slip = key.chain((k) =>
  fc.record({ k: fc.constant(k), at: fc.nat(k.length - 1), how: fc.constantFrom('wrong', 'missing', 'extra', 'swapped'), c: fc.constantFrom(...'0123456789ABCXYZ'.split('')) }),
).map(({ k, at, how, c }) => {
  const typed =
    how === 'wrong' ? k.slice(0, at) + c + k.slice(at + 1)
    : how === 'missing' ? k.slice(0, at) + k.slice(at + 1)
    : how === 'extra' ? k.slice(0, at) + c + k.slice(at)
    : k.slice(0, at) + (k[at + 1] ?? '') + k[at] + k.slice(at + 2);
  return { intended: k, typed };
});

describe('one-slip variants', () => {
  it('are each one slip from the word and include the intended key for any slip', () => {
    fc.assert(
      fc.property(slip, ({ intended, typed }) => {
        const variants = oneSlipVariants(typed);
        if (typed !== intended && typed.length > 0) expect(variants).toContain(intended);
        for (const v of variants.slice(0, 50)) expect(editDistance(v, typed)).toBe(1);
      }),
    );
  });

  it('grow linearly with the word: about 75 a character', () => {
    expect(oneSlipVariants('KTR1A1000L').length).toBeLessThan(800);
  });
});

describe('slip-proof pieces', () => {
  it('leave at least one piece inside the intended text after any slip', () => {
    fc.assert(
      fc.property(slip, ({ intended, typed }) => {
        fc.pre(typed.length >= 8);
        expect(slipProofPieces(typed).some((piece) => intended.includes(piece))).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it('are trigrams for words too short to split', () => {
    expect(slipProofPieces('BRACK')).toEqual(['BRA', 'RAC', 'ACK']);
    expect(slipProofPieces('KTR1A1000L')).toEqual(['KTR1', '000L']);
  });
});
