import { expect } from 'vitest';

/** |actual − expected| ≤ relTol·|expected|. */
export function expectRelClose(actual: number, expected: number, relTol: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (±${relTol * 100} %)`).toBeLessThanOrEqual(relTol * Math.abs(expected));
}

/** Root of f in [a, b] by plain bisection; an independent check of the solver. Needs f(a) > 0 ≥ f(b). */
export function bisect(f: (x: number) => number, a: number, b: number): number {
  let low = a;
  let high = b;
  for (let i = 0; i < 200; i++) {
    const mid = (low + high) / 2;
    if (f(mid) > 0) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}
