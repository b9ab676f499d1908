import { describe, expect, it } from 'vitest';
import { E24, e24AtOrAbove, e24AtOrBelow, isE24, nearestE24 } from '../../src/circuits/e24.js';

describe('E24 series (IEC 60063 [published])', () => {
  it('is the standard table, in order', () => {
    expect(E24).toEqual([1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1]);
  });

  it('differs from rounding 10^(i/24) exactly at 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7 and 8.2 (diode-formulas §4: eight wrong)', () => {
    const naive = E24.map((_, i) => Math.round(10 * 10 ** (i / 24)) / 10);
    const differing = E24.filter((value, i) => value !== naive[i]);
    expect(differing).toEqual([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2]);
    // Naive rounding would give 2.6, 2.9, 3.2, 3.5, 3.8, 4.2, 4.6 and 8.3 there.
    expect(naive.filter((value, i) => value !== E24[i])).toEqual([2.6, 2.9, 3.2, 3.5, 3.8, 4.2, 4.6, 8.3]);
  });
});

describe('e24AtOrBelow / e24AtOrAbove over all decades (derived by hand from the table)', () => {
  it.each([
    [6021, 5600, 6200],
    [820, 820, 820],
    [9.5, 9.1, 10],
    [0.99, 0.91, 1.0],
    [4.8e-3, 4.7e-3, 5.1e-3],
    [0.0082, 0.0082, 0.0082],
    [1.05e6, 1.0e6, 1.1e6],
    [3.0, 3.0, 3.0],
  ])('%d → below %d, above %d', (value, below, above) => {
    expect(e24AtOrBelow(value)).toBe(below);
    expect(e24AtOrAbove(value)).toBe(above);
  });

  it('returns decimal-exact doubles (0.0082, not 0.008199999999999999)', () => {
    expect(e24AtOrBelow(0.00821)).toBe(0.0082);
    expect(e24AtOrAbove(8.1e-9)).toBe(8.2e-9);
  });

  it('throws on a non-positive or non-finite value (programmer error)', () => {
    expect(() => e24AtOrBelow(0)).toThrow(RangeError);
    expect(() => e24AtOrAbove(Number.NaN)).toThrow(RangeError);
  });
});

describe('nearestE24 (log distance, the series being geometric)', () => {
  it.each([
    [5.0, 5.1],
    [4.85, 4.7], // below √(4.7·5.1) = 4.896
    [12, 12],
    [9.6, 10],
    [2.548, 2.7], // above √(2.4·2.7) = 2.5456, below the arithmetic midpoint 2.55
  ])('%d → %d', (value, nearest) => {
    expect(nearestE24(value)).toBe(nearest);
  });
});

describe('isE24', () => {
  it.each([5.1, 820, 0.0047, 1e6, 15, 3.3e-12])('%d is E24', (value) => expect(isE24(value)).toBe(true));
  it.each([5.0, 2.6, 8.3, 0, -5.1, Number.NaN, Number.POSITIVE_INFINITY])('%d is not E24', (value) => expect(isE24(value)).toBe(false));
});
