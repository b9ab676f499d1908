import { solveJunctionTemperature, type RunawayReason } from './junction-temperature.js';
import { requirePositive } from './guards.js';

export interface AmbientSweepPoint {
  readonly ambientK: number;
  readonly tjK: number | null;
  readonly powerW: number | null;
  readonly isRunaway: boolean;
}

export type MaxAmbientResult =
  /** Highest ambient with a stable heat balance below Tj max, to within the tolerance. */
  | { readonly kind: 'limit'; readonly ambientK: number; readonly tjK: number; readonly limitedBy: RunawayReason }
  | { readonly kind: 'stable-throughout'; readonly ambientK: number; readonly tjK: number }
  | { readonly kind: 'runaway-throughout' };

/** Tj against ambient for a chart: `steps` intervals, so steps + 1 points from fromK to toK inclusive. */
export function sweepAmbient(
  lossAt: (tjK: number) => number,
  rthJaKPerW: number,
  tjMaxK: number,
  fromK: number,
  toK: number,
  steps: number,
): AmbientSweepPoint[] {
  if (!(Number.isInteger(steps) && steps >= 1)) throw new RangeError(`steps must be an integer ≥ 1, got ${steps}`);
  return Array.from({ length: steps + 1 }, (_, i) => {
    const ambientK = i === steps ? toK : fromK + ((toK - fromK) * i) / steps;
    const result = solveJunctionTemperature({ lossAt, ambientK, rthJaKPerW, tjMaxK });
    return result.kind === 'stable'
      ? { ambientK, tjK: result.tjK, powerW: result.powerW, isRunaway: false }
      : { ambientK, tjK: null, powerW: null, isRunaway: true };
  });
}

/**
 * Highest ambient in [fromK, toK] with a stable solution below Tj max, by bisection.
 * Assumes a hotter ambient never makes the junction more stable (loss non-decreasing in Tj).
 */
export function maxAmbientForStability(
  lossAt: (tjK: number) => number,
  rthJaKPerW: number,
  tjMaxK: number,
  fromK: number,
  toK: number,
  toleranceK = 0.01,
): MaxAmbientResult {
  requirePositive('toleranceK', toleranceK);
  if (!(toK > fromK)) throw new RangeError(`toK must exceed fromK, got ${fromK} → ${toK}`);
  const solve = (ambientK: number) => solveJunctionTemperature({ lossAt, ambientK, rthJaKPerW, tjMaxK });
  let low = solve(fromK);
  if (low.kind !== 'stable') return { kind: 'runaway-throughout' };
  const top = solve(toK);
  if (top.kind === 'stable') return { kind: 'stable-throughout', ambientK: toK, tjK: top.tjK };
  let lowK = fromK;
  let highK = toK;
  let limitedBy = top.reason;
  while (highK - lowK > toleranceK) {
    const midK = (lowK + highK) / 2;
    const mid = solve(midK);
    if (mid.kind === 'stable') {
      lowK = midK;
      low = mid;
    } else {
      highK = midK;
      limitedBy = mid.reason;
    }
  }
  return { kind: 'limit', ambientK: lowK, tjK: low.tjK, limitedBy };
}
