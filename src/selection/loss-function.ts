/*
 * The loss P(Tj) compiled for the heat-balance solver, which calls it thousands of times per part.
 * VF(I, Tj) is linear in Tj between the datasheet temperatures' midpoints (nearest reference point,
 * then one tempco per current) and ln IR(VR, Tj) is linear between the datasheet temperatures and
 * those midpoints (exponential fits). On every interval between the merged breakpoints both are
 * therefore exact straight lines, fitted from two samples the first time the interval is used.
 */

export interface ConductionShape {
  readonly avgA: number;
  readonly conductingA: number;
  readonly peakA: number;
  readonly rmsA: number;
  readonly vfAt: (ifA: number, tjK: number) => number;
  readonly breakpoints: readonly number[];
}

export interface ReverseShape {
  readonly vrV: number;
  readonly duty: number;
  readonly lnIrAt: (tjK: number) => number;
  readonly breakpoints: readonly number[];
}

export interface LossShape {
  readonly conduction?: ConductionShape;
  readonly reverse?: ReverseShape;
  readonly switchingW: number;
}

export interface LossFunction {
  readonly totalAt: (tjK: number) => number;
  readonly conductionAt: (tjK: number) => number;
  readonly reverseAt: (tjK: number) => number;
  /** Where the lines change; between two of them each term is monotone or convex. */
  readonly breakpoints: readonly number[];
  /** A lower bound of P over [t1, t2], for an interval with no breakpoint inside. */
  readonly lowerBound: (t1: number, t2: number) => number;
}

/** Per interval: intercept and slope of VF at the conducting and the peak current, and of ln IR. */
interface Segment {
  readonly v1: readonly [number, number];
  readonly v2: readonly [number, number];
  readonly ln: readonly [number, number];
}

/** Breakpoints closer than this are one. */
const SAME_K = 1e-6;

/**
 * Where a nearest-point or two-point-fit estimate can change line: every datasheet temperature and
 * the midpoint of every pair (the physics groups points within 0.5 K, so pairs cover its groups).
 */
export function temperatureBreakpoints(temperatures: readonly number[]): number[] {
  const distinct = [...new Set(temperatures)];
  return [...distinct, ...distinct.flatMap((a, i) => distinct.slice(i + 1).map((b) => (a + b) / 2))];
}

function line(f: (x: number) => number, a: number, b: number): [number, number] {
  const fa = f(a);
  const slope = (f(b) - fa) / (b - a);
  return [fa - slope * a, slope];
}

export function compileLoss(shape: LossShape): LossFunction {
  const c = shape.conduction;
  const r = shape.reverse;
  const xs = [...(c?.breakpoints ?? []), ...(r?.breakpoints ?? [])]
    .sort((a, b) => a - b)
    .filter((x, i, all) => i === 0 || x - all[i - 1]! > SAME_K);
  const segments: (Segment | undefined)[] = new Array(xs.length + 1);
  const fit = (i: number): Segment => {
    const low = xs[i - 1];
    const high = xs[i];
    // Two samples strictly inside the interval; the unbounded ends a kelvin or two beyond the last breakpoint.
    const [a, b] = low === undefined ? (high === undefined ? [300, 301] : [high - 2, high - 1]) : high === undefined ? [low + 1, low + 2] : [low + (high - low) / 3, low + (2 * (high - low)) / 3];
    return {
      v1: c ? line((t) => c.vfAt(c.conductingA, t), a, b) : [0, 0],
      v2: c && c.peakA > c.conductingA ? line((t) => c.vfAt(c.peakA, t), a, b) : [0, 0],
      ln: r ? line(r.lnIrAt, a, b) : [0, 0],
    };
  };
  const segmentAt = (t: number): Segment => {
    let i = 0;
    while (i < xs.length && t > xs[i]!) i++;
    return (segments[i] ??= fit(i));
  };
  const hasSlope = c !== undefined && c.peakA > c.conductingA * (1 + 1e-6);
  // P = VF0·IF(AV) + rd·IF(RMS)² with VF ≈ VF0 + rd·I through the conducting and the peak current.
  const conductionAt = (t: number, s: Segment): number => {
    if (!c) return 0;
    const v1 = s.v1[0] + s.v1[1] * t;
    if (!hasSlope) return Math.max(0, v1 * c.avgA);
    const rd = Math.max(0, (s.v2[0] + s.v2[1] * t - v1) / (c.peakA - c.conductingA));
    return Math.max(0, (v1 - rd * c.conductingA) * c.avgA + rd * c.rmsA * c.rmsA);
  };
  const reverseAt = (t: number, s: Segment): number => (r ? r.vrV * r.duty * Math.exp(s.ln[0] + s.ln[1] * t) : 0);
  const lowest = (intercept: number, slope: number, t1: number, t2: number) => Math.min(intercept + slope * t1, intercept + slope * t2);
  const k = c ? c.rmsA * c.rmsA - c.conductingA * c.avgA : 0;
  /*
   * Within one interval VF and rd are straight lines, so conduction = VF·IF(AV) + max(0, rd)·K with
   * K = IF(RMS)² − I·IF(AV) ≥ 0 is the larger of two straight lines: at least the larger of their
   * minima. Reverse loss is monotone in Tj (exponential), switching constant. No allocation: the
   * runaway proof calls this for every cell of every part ranked.
   */
  const lowerBound = (t1: number, t2: number): number => {
    const s = segmentAt((t1 + t2) / 2);
    let conductionW = 0;
    if (c) {
      const flat = lowest(s.v1[0], s.v1[1], t1, t2) * c.avgA;
      if (!hasSlope) conductionW = Math.max(0, flat);
      else {
        const d = c.peakA - c.conductingA;
        const withRd = lowest(s.v1[0] * c.avgA + ((s.v2[0] - s.v1[0]) / d) * k, s.v1[1] * c.avgA + ((s.v2[1] - s.v1[1]) / d) * k, t1, t2);
        conductionW = Math.max(0, k >= 0 ? Math.max(flat, withRd) : Math.min(flat, withRd));
      }
    }
    const reverseW = r ? r.vrV * r.duty * Math.exp(lowest(s.ln[0], s.ln[1], t1, t2)) : 0;
    return conductionW + reverseW + shape.switchingW;
  };
  return {
    breakpoints: xs,
    lowerBound,
    totalAt: (t) => {
      const s = segmentAt(t);
      return conductionAt(t, s) + reverseAt(t, s) + shape.switchingW;
    },
    conductionAt: (t) => conductionAt(t, segmentAt(t)),
    reverseAt: (t) => reverseAt(t, segmentAt(t)),
  };
}
