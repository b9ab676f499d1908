import { thermalVoltage } from './constants.js';
import { formatCelsius, formatNumber, formatSi } from './format.js';
import { requireFinite, requirePositive } from './guards.js';

/** A datasheet forward point: VF at IF and junction temperature. */
export interface ForwardVoltagePoint {
  readonly vfV: number;
  readonly ifA: number;
  readonly tjK: number;
}

export interface ForwardVoltageOptions {
  /** Ideality used when the reference temperature has a single point (rectifiers near rated current run near high injection). @default 2 */
  readonly defaultIdeality?: number;
  /** VF tempco used when no two points share a current (Sedra & Smith, diode temperature dependence [published]). @default -0.002 */
  readonly defaultTempcoVPerK?: number;
}

export type ForwardVoltageEstimate =
  | {
      readonly ok: true;
      /** VF in volts. */
      readonly value: number;
      readonly method: string;
      /** Temperature of the points the current step used. */
      readonly referenceTjK: number;
      /** Tempco applied from referenceTjK to the requested Tj; null when no temperature step was needed. */
      readonly tempcoVPerK: number | null;
      /** True when the current or the temperature lies outside the points. */
      readonly isExtrapolated: boolean;
    }
  | {
      readonly ok: false;
      readonly code: 'no-points' | 'inconsistent-points';
      readonly message: string;
    };

const DEFAULT_IDEALITY = 2;
const DEFAULT_TEMPCO_V_PER_K = -0.002;
/** Points closer than this are taken as one temperature. */
const SAME_TEMPERATURE_K = 0.5;
/** Relative current difference under which two points count as "the same current". */
const SAME_CURRENT_REL = 0.01;

interface TemperatureGroup {
  readonly tjK: number;
  /** Sorted by ascending current. */
  readonly points: readonly ForwardVoltagePoint[];
  /** estimateAtCurrent results by current, at the default ideality. */
  readonly atCurrent: Map<number, AtCurrent>;
}

/**
 * VF at a current and junction temperature from datasheet points.
 * Current: log law VF = V1 + s·ln(I/I1) between the nearest points at the reference temperature
 * (s from the points when two exist, else n·VT with the default n). Temperature: the points' own
 * tempco when two points share a current at different temperatures, else −2 mV/K.
 */
export function estimateForwardVoltage(
  points: readonly ForwardVoltagePoint[],
  ifA: number,
  tjK: number,
  options: ForwardVoltageOptions = {},
): ForwardVoltageEstimate {
  requirePositive('ifA', ifA);
  requirePositive('tjK', tjK);
  const prepared = prepare(points);
  if (points.length === 0) {
    return { ok: false, code: 'no-points', message: 'No forward-voltage points: VF cannot be estimated.' };
  }
  const reference = nearestGroup(prepared.groups, tjK);
  const ideality = options.defaultIdeality ?? DEFAULT_IDEALITY;
  // VF at a current within one temperature group does not depend on Tj: work it out once.
  const isCached = ideality === DEFAULT_IDEALITY;
  let atCurrent = isCached ? reference.atCurrent.get(ifA) : undefined;
  if (atCurrent === undefined) {
    atCurrent = estimateAtCurrent(reference, ifA, ideality);
    if (isCached) reference.atCurrent.set(ifA, atCurrent);
  }
  if (!atCurrent.ok) return atCurrent;

  const isTemperatureOutside = tjK < prepared.minTjK - SAME_TEMPERATURE_K || tjK > prepared.maxTjK + SAME_TEMPERATURE_K;
  const deltaK = tjK - reference.tjK;
  if (Math.abs(deltaK) < 1e-9) {
    return {
      ok: true,
      value: atCurrent.vfV,
      get method() {
        return atCurrent.describe();
      },
      referenceTjK: reference.tjK,
      tempcoVPerK: null,
      isExtrapolated: atCurrent.isExtrapolated,
    };
  }
  let tempco = prepared.tempcoByCurrent.get(ifA);
  if (tempco === undefined) prepared.tempcoByCurrent.set(ifA, (tempco = pointsTempco(points, ifA)));
  const tempcoVPerK = tempco?.vPerK ?? options.defaultTempcoVPerK ?? DEFAULT_TEMPCO_V_PER_K;
  const tempcoMethod = () => (tempco === null
    ? `default tempco ${formatSi(tempcoVPerK, 'V/K')} (Sedra & Smith, diode temperature dependence)`
    : `the points' own tempco ${formatSi(tempcoVPerK, 'V/K')} (${tempco.describe()})`);
  return {
    ok: true,
    value: atCurrent.vfV + tempcoVPerK * deltaK,
    get method() {
      return `${atCurrent.describe()}; then ${formatCelsius(reference.tjK)} → ${formatCelsius(tjK)} with ${tempcoMethod()}`;
    },
    referenceTjK: reference.tjK,
    tempcoVPerK,
    isExtrapolated: atCurrent.isExtrapolated || isTemperatureOutside,
  };
}

/**
 * The value of estimateForwardVoltage alone (NaN where it gives no estimate), without building the
 * words of its method: the loss model asks for thousands of values while ranking.
 */
export function forwardVoltageValue(points: readonly ForwardVoltagePoint[], ifA: number, tjK: number): number {
  requirePositive('ifA', ifA);
  requirePositive('tjK', tjK);
  const prepared = prepare(points);
  if (points.length === 0) return Number.NaN;
  const reference = nearestGroup(prepared.groups, tjK);
  let atCurrent = reference.atCurrent.get(ifA);
  if (atCurrent === undefined) reference.atCurrent.set(ifA, (atCurrent = estimateAtCurrent(reference, ifA, DEFAULT_IDEALITY)));
  if (!atCurrent.ok) return Number.NaN;
  const deltaK = tjK - reference.tjK;
  if (Math.abs(deltaK) < 1e-9) return atCurrent.vfV;
  let tempco = prepared.tempcoByCurrent.get(ifA);
  if (tempco === undefined) prepared.tempcoByCurrent.set(ifA, (tempco = pointsTempco(points, ifA)));
  return atCurrent.vfV + (tempco?.vPerK ?? DEFAULT_TEMPCO_V_PER_K) * deltaK;
}

/** What depends on the points alone, worked out once per points array (parts are never mutated). */
interface PreparedPoints {
  readonly groups: readonly TemperatureGroup[];
  readonly minTjK: number;
  readonly maxTjK: number;
  readonly tempcoByCurrent: Map<number, ReturnType<typeof pointsTempco>>;
}

// The loss model asks for VF of the same part at many temperatures; validating, grouping and
// pairing its points once keeps a ranking of a hundred parts fast even before the JIT warms up.
const PREPARED = new WeakMap<readonly ForwardVoltagePoint[], PreparedPoints>();

function prepare(points: readonly ForwardVoltagePoint[]): PreparedPoints {
  const known = PREPARED.get(points);
  if (known) return known;
  for (const p of points) {
    requireFinite('point.vfV', p.vfV);
    requirePositive('point.ifA', p.ifA);
    requirePositive('point.tjK', p.tjK);
  }
  const temperatures = points.map((p) => p.tjK);
  const prepared = { groups: groupByTemperature(points), minTjK: Math.min(...temperatures), maxTjK: Math.max(...temperatures), tempcoByCurrent: new Map() };
  PREPARED.set(points, prepared);
  return prepared;
}

function groupByTemperature(points: readonly ForwardVoltagePoint[]): TemperatureGroup[] {
  const groups: { tjK: number; points: ForwardVoltagePoint[] }[] = [];
  for (const p of points) {
    const group = groups.find((g) => Math.abs(g.tjK - p.tjK) < SAME_TEMPERATURE_K);
    if (group) group.points.push(p);
    else groups.push({ tjK: p.tjK, points: [p] });
  }
  return groups.map((g) => ({ tjK: g.tjK, points: [...g.points].sort((x, y) => x.ifA - y.ifA), atCurrent: new Map() }));
}

/** Nearest temperature; ties go to the group with more points, then to the cooler one. */
function nearestGroup(groups: readonly TemperatureGroup[], tjK: number): TemperatureGroup {
  let best = groups[0]!;
  for (let i = 1; i < groups.length; i++) {
    const g = groups[i]!;
    const order = Math.abs(g.tjK - tjK) - Math.abs(best.tjK - tjK) || best.points.length - g.points.length || g.tjK - best.tjK;
    if (order < 0) best = g;
  }
  return best;
}

type AtCurrent =
  // describe() words the method only when asked: the loss model asks for values thousands of times.
  | { ok: true; vfV: number; describe: () => string; isExtrapolated: boolean }
  | { ok: false; code: 'inconsistent-points'; message: string };

function estimateAtCurrent(group: TemperatureGroup, ifA: number, defaultIdeality: number): AtCurrent {
  requirePositive('defaultIdeality', defaultIdeality);
  const at = () => formatCelsius(group.tjK);
  const exact = group.points.find((p) => Math.abs(p.ifA - ifA) <= 1e-9 * ifA);
  if (exact) {
    return { ok: true, vfV: exact.vfV, describe: () => `datasheet point ${formatSi(exact.vfV, 'V')} at ${formatSi(exact.ifA, 'A')}, ${at()}`, isExtrapolated: false };
  }
  const pts = group.points;
  const isExtrapolated = ifA < pts[0]!.ifA || ifA > pts[pts.length - 1]!.ifA;
  if (pts.length === 1) {
    const p = pts[0]!;
    const slope = defaultIdeality * thermalVoltage(group.tjK);
    return {
      ok: true,
      vfV: p.vfV + slope * Math.log(ifA / p.ifA),
      describe: () => `log law from ${formatSi(p.vfV, 'V')} at ${formatSi(p.ifA, 'A')}, ${at()}, with assumed n = ${formatNumber(defaultIdeality)} (${formatSi(slope * Math.LN10, 'V/decade')})`,
      isExtrapolated,
    };
  }
  const [a, b] = neighbours(pts, ifA);
  const lnRatio = Math.log(b.ifA / a.ifA);
  const slope = (b.vfV - a.vfV) / lnRatio;
  if (!(lnRatio > 1e-9) || !(slope > 0)) {
    return {
      ok: false,
      code: 'inconsistent-points',
      message: `Forward points at ${at()} do not rise with current (${formatSi(a.vfV, 'V')} at ${formatSi(a.ifA, 'A')}, ${formatSi(b.vfV, 'V')} at ${formatSi(b.ifA, 'A')}).`,
    };
  }
  const ideality = slope / thermalVoltage(group.tjK);
  return {
    ok: true,
    vfV: a.vfV + slope * Math.log(ifA / a.ifA),
    describe: () => `log law through ${formatSi(a.vfV, 'V')} at ${formatSi(a.ifA, 'A')} and ${formatSi(b.vfV, 'V')} at ${formatSi(b.ifA, 'A')}, ${at()}: ${formatSi(slope * Math.LN10, 'V/decade')} (n ≈ ${formatNumber(ideality)})${isExtrapolated ? ', extrapolated (ignores series resistance)' : ''}`,
    isExtrapolated,
  };
}

/** The two points bracketing ifA, or the two nearest at the end it lies beyond. Needs ≥ 2 sorted points. */
function neighbours(pts: readonly ForwardVoltagePoint[], ifA: number): [ForwardVoltagePoint, ForwardVoltagePoint] {
  const upper = pts.findIndex((p) => p.ifA >= ifA);
  const i = upper === -1 ? pts.length - 1 : Math.max(upper, 1);
  return [pts[i - 1]!, pts[i]!];
}

/** Tempco from two points at one current and different temperatures: current nearest ifA (in log), then widest span. */
function pointsTempco(points: readonly ForwardVoltagePoint[], ifA: number): { vPerK: number; describe: () => string } | null {
  let best: { cost: number; span: number; vPerK: number; describe: () => string } | null = null;
  for (const [i, p] of points.entries()) {
    for (const q of points.slice(i + 1)) {
      const span = Math.abs(q.tjK - p.tjK);
      if (span < SAME_TEMPERATURE_K || Math.abs(q.ifA - p.ifA) > SAME_CURRENT_REL * Math.max(p.ifA, q.ifA)) continue;
      const cost = Math.abs(Math.log(p.ifA / ifA));
      if (best && (cost > best.cost + 1e-12 || (Math.abs(cost - best.cost) <= 1e-12 && span <= best.span))) continue;
      const [cool, hot] = p.tjK < q.tjK ? [p, q] : [q, p];
      best = {
        cost,
        span,
        vPerK: (hot.vfV - cool.vfV) / (hot.tjK - cool.tjK),
        describe: () => `${formatSi(cool.vfV, 'V')} at ${formatCelsius(cool.tjK)} and ${formatSi(hot.vfV, 'V')} at ${formatCelsius(hot.tjK)}, both at ${formatSi(cool.ifA, 'A')}`,
      };
    }
  }
  return best && { vPerK: best.vPerK, describe: best.describe };
}
