import type { SqlValue } from './row-values.js';

/*
 * What a part looked like when it was last imported (the import baseline, docs/team-workflow.md),
 * as a 53-bit hash of its stored column values: strings by their characters, numbers by their bits
 * (-0 as 0), each value's position and kind mixed in. A part read back from the catalog hashes the
 * same, so "changed here since the import" is one comparison. Two multiply-xor lanes with a final
 * avalanche (FNV-1a and MurmurHash3's finaliser, common practice): not cryptographic, which a check
 * against accidental edits does not need, and several times cheaper than the SHA-256 of the
 * exported cells that baselines from before migration 006 still use (import-conflicts.ts).
 */

const float = new Float64Array(1);
const words = new Uint32Array(float.buffer);

function finish(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

/** Hash of the first `count` values, a non-negative integer below 2^53. */
export function rowDigest(values: readonly SqlValue[], count = values.length): number {
  return digestOf(count, (i) => values[i] ?? null);
}

function digestOf(count: number, valueAt: (i: number) => SqlValue): number {
  let a = 0x811c9dc5;
  let b = 0x2545f491;
  for (let i = 0; i < count; i++) {
    const v = valueAt(i);
    if (v === null) {
      a = Math.imul(a ^ 0x7f4a7c15, 0x01000193);
      b = Math.imul(b ^ i, 0x5bd1e995);
    } else if (typeof v === 'number') {
      float[0] = v === 0 ? 0 : v;
      a = Math.imul(Math.imul(a ^ words[0]!, 0x01000193) ^ words[1]!, 0x01000193);
      b = Math.imul(Math.imul(b ^ words[1]!, 0x5bd1e995) ^ (words[0]! + i), 0x5bd1e995);
    } else {
      a = Math.imul(a ^ (v.length + 0x9e3779b9), 0x01000193);
      b = Math.imul(b ^ (v.length + i), 0x5bd1e995);
      // Two UTF-16 units a step.
      let j = 0;
      for (; j + 1 < v.length; j += 2) {
        const c = v.charCodeAt(j) | (v.charCodeAt(j + 1) << 16);
        a = Math.imul(a ^ c, 0x01000193);
        b = Math.imul((b ^ c) + (b >>> 15), 0x5bd1e995);
      }
      if (j < v.length) {
        a = Math.imul(a ^ v.charCodeAt(j), 0x01000193);
        b = Math.imul((b ^ v.charCodeAt(j)) + (b >>> 15), 0x5bd1e995);
      }
    }
  }
  return finish(a) * 2 ** 21 + (finish(b ^ count) >>> 11);
}
