import { formatCelsius, formatNumber, formatSi } from './format.js';
import { requireNonNegative, requirePositive } from './guards.js';

export interface JunctionTemperatureInput {
  /** Total dissipation in watts at a junction temperature: forward + reverse + switching. Must be ≥ 0. */
  readonly lossAt: (tjK: number) => number;
  readonly ambientK: number;
  readonly rthJaKPerW: number;
  readonly tjMaxK: number;
  /**
   * Optional: a lower bound of lossAt over [t1, t2] for an interval with no breakpoint inside, to
   * the rounding of lossAt's own arithmetic. The bracketing scan then skips runs of grid points
   * where the bound proves the junction still heats above them: the same answer, far fewer losses.
   */
  readonly lossBound?: LossBound;
}

export interface LossBound {
  /** Sorted. */
  readonly breakpoints: readonly number[];
  readonly lowerBound: (t1: number, t2: number) => number;
}

export type RunawayReason =
  /** No heat balance below Tj max and RθJA·dP/dTj ≥ 1 there: heating outgrows cooling. */
  | 'loop-gain-above-one'
  /** No heat balance below Tj max, but the loop gain is still below one: simply too hot. */
  | 'exceeds-tj-max'
  | 'ambient-at-or-above-tj-max';

export type JunctionTemperatureResult =
  | {
      readonly kind: 'stable';
      readonly tjK: number;
      readonly powerW: number;
      readonly iterations: number;
      /** 1 − RθJA·dP/dTj at the solution; > 0 means stable (diode-formulas §7). */
      readonly stabilityMargin: number;
      readonly solver: 'fixed-point' | 'bracketing';
    }
  | {
      readonly kind: 'runaway';
      readonly reason: RunawayReason;
      readonly message: string;
      /** Last junction temperature the solver examined. */
      readonly lastTjK: number;
    };

const TOLERANCE_K = 1e-9;
const MAX_FIXED_POINT_ITERATIONS = 2000;
const SCAN_STEPS = 2000;
const DERIVATIVE_STEP_K = 1e-3;
/** Grid points the scan tries to skip at once with a loss bound. */
const SKIP_RUN = 32;
/** Room for the rounding between a loss bound and lossAt itself (relative, watts, kelvin). */
const BOUND_SLACK_REL = 1e-9;
const BOUND_SLACK_W = 1e-12;
const BOUND_SLACK_K = 1e-9;

/**
 * Self-consistent junction temperature Tj = Ta + RθJA·P(Tj): the lowest stable heat balance below Tj max.
 */
export function solveJunctionTemperature(input: JunctionTemperatureInput): JunctionTemperatureResult {
  const { ambientK, rthJaKPerW, tjMaxK } = input;
  requirePositive('ambientK', ambientK);
  requireNonNegative('rthJaKPerW', rthJaKPerW);
  requirePositive('tjMaxK', tjMaxK);
  if (ambientK >= tjMaxK) {
    return {
      kind: 'runaway',
      reason: 'ambient-at-or-above-tj-max',
      message: `Ambient ${formatCelsius(ambientK)} is at or above Tj max ${formatCelsius(tjMaxK)}.`,
      lastTjK: ambientK,
    };
  }
  const loss = (tK: number): number => {
    const p = input.lossAt(tK);
    if (!(Number.isFinite(p) && p >= 0)) throw new RangeError(`lossAt(${tK}) must be a finite number ≥ 0, got ${p}`);
    return p;
  };
  const heated = (tK: number): number => ambientK + rthJaKPerW * loss(tK);
  const loopGain = (tK: number): number =>
    (rthJaKPerW * (loss(tK + DERIVATIVE_STEP_K) - loss(tK - DERIVATIVE_STEP_K))) / (2 * DERIVATIVE_STEP_K);
  const stable = (tjK: number, iterations: number, solver: 'fixed-point' | 'bracketing'): JunctionTemperatureResult | null => {
    const stabilityMargin = 1 - loopGain(tjK);
    return stabilityMargin > 0 ? { kind: 'stable', tjK, powerW: loss(tjK), iterations, stabilityMargin, solver } : null;
  };

  // Damped fixed-point iteration from ambient (halving the step on oscillation); if it stalls or
  // passes Tj max, bracket the lowest crossing of Ta + RθJA·P(T) = T on a grid and bisect it.
  let tK = ambientK;
  let damping = 1;
  let previousStep = 0;
  for (let i = 1; i <= MAX_FIXED_POINT_ITERATIONS; i++) {
    const next = heated(tK);
    const step = next - tK;
    if (Math.abs(step) <= TOLERANCE_K) {
      const result = stable(tK, i, 'fixed-point');
      if (result) return result;
      break;
    }
    if (previousStep !== 0 && Math.sign(step) !== Math.sign(previousStep)) damping = Math.max(damping / 2, 1 / 64);
    tK = damping === 1 ? next : tK + damping * step;
    previousStep = step;
    if (tK > tjMaxK) break;
  }
  return bracketLowestBalance(ambientK, tjMaxK, heated, loopGain, stable, skipper(input));
}

/**
 * With a loss bound: a run of grid points from k on (within one stretch between breakpoints, at
 * most SKIP_RUN) and whether every one of them provably heats above itself, so the scan would
 * pass it.
 */
type Skipper = (k: number, gridAt: (k: number) => number) => { readonly points: number; readonly isProven: boolean };

function skipper(input: JunctionTemperatureInput): Skipper | undefined {
  const bound = input.lossBound;
  if (!bound) return undefined;
  const { ambientK, rthJaKPerW } = input;
  let next = 0;
  return (k, gridAt) => {
    const first = gridAt(k);
    const breakpoints = bound.breakpoints;
    while (next < breakpoints.length && breakpoints[next]! < first) next++;
    const end = next < breakpoints.length ? breakpoints[next]! : Number.POSITIVE_INFINITY;
    let last = k;
    while (last < SCAN_STEPS && last - k + 1 < SKIP_RUN && gridAt(last + 1) <= end) last++;
    const lb = bound.lowerBound(first, gridAt(last));
    const floor = lb - Math.abs(lb) * BOUND_SLACK_REL - BOUND_SLACK_W;
    return { points: last - k + 1, isProven: Number.isFinite(lb) && ambientK + rthJaKPerW * floor > gridAt(last) + BOUND_SLACK_K };
  };
}

function bracketLowestBalance(
  ambientK: number,
  tjMaxK: number,
  heated: (tK: number) => number,
  loopGain: (tK: number) => number,
  stable: (tjK: number, iterations: number, solver: 'bracketing') => JunctionTemperatureResult | null,
  skip?: Skipper,
): JunctionTemperatureResult {
  const excess = (tK: number): number => heated(tK) - tK;
  const stepK = (tjMaxK - ambientK) / SCAN_STEPS;
  const gridAt = (k: number) => (k === SCAN_STEPS ? tjMaxK : ambientK + k * stepK);
  let evaluations = 0;
  let low = ambientK;
  // Grid points up to `proven` heat above themselves (the loss bound says so): passed without a
  // loss but counted, so the answer and its count are the plain scan's. A run the bound cannot
  // prove is scanned point by point before the next try.
  let proven = 0;
  let nextTry = 1;
  for (let k = 1; k <= SCAN_STEPS; k++) {
    const high = gridAt(k);
    evaluations++;
    if (skip && k >= nextTry) {
      const run = skip(k, gridAt);
      nextTry = k + run.points;
      if (run.isProven) proven = k + run.points - 1;
    }
    if (k <= proven) {
      low = high;
      continue;
    }
    if (excess(high) <= 0) {
      let a = low;
      let b = high;
      for (let halvings = 0; b - a > TOLERANCE_K && halvings < 200; halvings++) {
        const mid = (a + b) / 2;
        evaluations++;
        if (excess(mid) > 0) a = mid;
        else b = mid;
      }
      const result = stable(b, evaluations, 'bracketing');
      if (result) return result;
    }
    low = high;
  }
  const gainAtMax = loopGain(tjMaxK);
  const riseAtMaxK = heated(tjMaxK) - ambientK;
  if (gainAtMax >= 1) {
    return {
      kind: 'runaway',
      reason: 'loop-gain-above-one',
      message: `Thermal runaway: no heat balance below Tj max ${formatCelsius(tjMaxK)}, and RθJA·dP/dTj = ${formatNumber(gainAtMax)} ≥ 1 there (heating grows faster than cooling).`,
      lastTjK: tjMaxK,
    };
  }
  return {
    kind: 'runaway',
    reason: 'exceeds-tj-max',
    message: `No heat balance below Tj max ${formatCelsius(tjMaxK)}: at Tj max the rise RθJA·P is ${formatSi(riseAtMaxK, 'K')}, more than the ${formatSi(tjMaxK - ambientK, 'K')} headroom.`,
    lastTjK: tjMaxK,
  };
}

/**
 * Largest reverse leakage that keeps the junction thermally stable: IR < 1/(VR·(1 − δ)·c·RθJA),
 * with δ the forward duty and IR ∝ exp(c·Tj) (diode-formulas §7 [published physics]).
 */
export function runawayLeakageThreshold(vrV: number, duty: number, c: number, rthJaKPerW: number): number {
  requireNonNegative('vrV', vrV);
  requirePositive('c', c);
  requireNonNegative('rthJaKPerW', rthJaKPerW);
  if (!(duty >= 0 && duty <= 1)) throw new RangeError(`duty must be within [0, 1], got ${duty}`);
  return 1 / (vrV * (1 - duty) * c * rthJaKPerW);
}
