import { formatCelsius, formatNumber, formatSi } from './format.js';
import { requireNonNegative, requirePositive } from './guards.js';

/** Junction family, for the leakage rule of thumb when the datasheet gives one temperature only. */
export type JunctionFamily = 'pn' | 'schottky' | 'sic';

/** A datasheet reverse-leakage point: IR at VR and junction temperature. */
export interface LeakagePoint {
  readonly irA: number;
  readonly vrV: number;
  readonly tjK: number;
}

export interface LeakageRule {
  /** Exponential coefficient c in IR ∝ exp(c·T), per kelvin. */
  readonly c: number;
  readonly description: string;
}

/** Rules of thumb, used only when the points give a single temperature. */
export const LEAKAGE_RULES: Readonly<Record<JunctionFamily, LeakageRule>> = {
  pn: { c: Math.LN2 / 10, description: 'silicon PN leakage doubles every 10 K [common practice]' },
  schottky: { c: 0.055, description: 'Schottky leakage c ≈ 0.055 /K, doubling every ≈ 12.6 K [common practice]' },
  sic: { c: Math.LN2 / 25, description: 'SiC Schottky leakage doubles every 25 K [from memory/common practice]' },
};

export type LeakageEstimate =
  | {
      readonly ok: true;
      /** IR in amperes. */
      readonly value: number;
      /** Exponential coefficient used, per kelvin. */
      readonly c: number;
      readonly method: string;
      /** True when VR is above every point's VR or Tj lies outside the points' temperatures. */
      readonly isExtrapolated: boolean;
    }
  | { readonly ok: false; readonly code: 'no-points'; readonly message: string };

/** IR(T) = IR1·exp(c·(T − T1)). */
export function leakageAtTemperature(ir1A: number, t1K: number, c: number, tK: number): number {
  return ir1A * Math.exp(c * (tK - t1K));
}

/** c = ln(IR2/IR1)/(T2 − T1) from two points at the same VR. */
export function fitLeakageCoefficient(a: LeakagePoint, b: LeakagePoint): number {
  requirePositive('a.irA', a.irA);
  requirePositive('b.irA', b.irA);
  if (a.tjK === b.tjK) throw new RangeError('fitLeakageCoefficient needs two different temperatures');
  return Math.log(b.irA / a.irA) / (b.tjK - a.tjK);
}

/** Points closer than this are taken as one temperature. */
const SAME_TEMPERATURE_K = 0.5;

interface AtVoltage {
  readonly irA: number;
  readonly tjK: number;
  /** Words for the method, built only when read: the solver asks for values thousands of times. */
  readonly note: () => string;
  readonly isExtrapolated: boolean;
}

/**
 * IR at (VR, Tj). Voltage first: a point at VR ≥ the requested VR is used unscaled as an upper bound
 * (generation leakage grows with VR); a point at lower VR is scaled up linearly with VR, which
 * overstates the √VR growth of generation current (conservative). Then temperature: a two-point
 * exponential fit when two temperatures exist, else the family's rule of thumb.
 */
export function estimateLeakage(
  points: readonly LeakagePoint[],
  vrV: number,
  tjK: number,
  family: JunctionFamily,
): LeakageEstimate {
  requireNonNegative('vrV', vrV);
  requirePositive('tjK', tjK);
  const perTemperature = pointsAtVoltage(points, vrV);
  if (perTemperature.length === 0) {
    return { ok: false, code: 'no-points', message: 'No reverse-leakage points: IR cannot be estimated.' };
  }
  const lowest = perTemperature[0]!;
  const highest = perTemperature[perTemperature.length - 1]!;
  const isTemperatureOutside = tjK < lowest.tjK - SAME_TEMPERATURE_K || tjK > highest.tjK + SAME_TEMPERATURE_K;

  const fit = fitAt(perTemperature, tjK, family);
  const { anchor, c } = fit;
  if (fit.pair) {
    const [a, b] = fit.pair;
    return {
      ok: true,
      value: leakageAtTemperature(anchor.irA, anchor.tjK, c, tjK),
      c,
      get method() {
        return `two-point exponential fit IR = IR1·exp(c·(T − T1)) through ${a.note()} and ${b.note()}: c = ${formatNumber(c)} /K`;
      },
      isExtrapolated: isTemperatureOutside || a.isExtrapolated || b.isExtrapolated,
    };
  }
  const rule = LEAKAGE_RULES[family];
  const fallback = fit.hadPair ? '; the points do not rise with temperature, so ' : '; ';
  return {
    ok: true,
    value: leakageAtTemperature(anchor.irA, anchor.tjK, c, tjK),
    c,
    get method() {
      return `from ${anchor.note()}${fallback}${rule.description}: c = ${formatNumber(rule.c)} /K`;
    },
    isExtrapolated: isTemperatureOutside || anchor.isExtrapolated || Math.abs(tjK - anchor.tjK) >= SAME_TEMPERATURE_K,
  };
}

/**
 * The exponential through the two points bracketing Tj when they rise with temperature, anchored
 * at the nearer one; else the family's rule of thumb from the nearest point.
 */
function fitAt(perTemperature: readonly AtVoltage[], tjK: number, family: JunctionFamily): { anchor: AtVoltage; c: number; pair?: [AtVoltage, AtVoltage]; hadPair: boolean } {
  const pair = pickPair(perTemperature, tjK);
  if (pair) {
    const [a, b] = pair;
    const c = Math.log(b.irA / a.irA) / (b.tjK - a.tjK);
    if (c > 0) return { anchor: Math.abs(tjK - a.tjK) <= Math.abs(tjK - b.tjK) ? a : b, c, pair, hadPair: true };
  }
  return { anchor: nearest(perTemperature, tjK), c: LEAKAGE_RULES[family].c, hadPair: pair !== null };
}

// The loss model asks for IR of the same part at one VR and many temperatures: validate the points
// and take them to that VR once per points array and VR (parts are never mutated).
const AT_VOLTAGE = new WeakMap<readonly LeakagePoint[], Map<number, readonly AtVoltage[]>>();

/** One point per datasheet temperature, taken to vrV, coolest first. */
function pointsAtVoltage(points: readonly LeakagePoint[], vrV: number): readonly AtVoltage[] {
  let byVoltage = AT_VOLTAGE.get(points);
  const known = byVoltage?.get(vrV);
  if (known) return known;
  for (const p of points) {
    requirePositive('point.irA', p.irA);
    requirePositive('point.vrV', p.vrV);
    requirePositive('point.tjK', p.tjK);
  }
  const list = groupByTemperature(points)
    .map((group) => atVoltage(group, vrV))
    .sort((a, b) => a.tjK - b.tjK);
  if (!byVoltage) AT_VOLTAGE.set(points, (byVoltage = new Map()));
  byVoltage.set(vrV, list);
  return list;
}

/**
 * The value of estimateLeakage alone (NaN without points), without building the words of its
 * method: the loss model asks for thousands of values while ranking.
 */
export function leakageValue(points: readonly LeakagePoint[], vrV: number, tjK: number, family: JunctionFamily): number {
  requireNonNegative('vrV', vrV);
  requirePositive('tjK', tjK);
  const perTemperature = pointsAtVoltage(points, vrV);
  if (perTemperature.length === 0) return Number.NaN;
  const { anchor, c } = fitAt(perTemperature, tjK, family);
  return leakageAtTemperature(anchor.irA, anchor.tjK, c, tjK);
}

function groupByTemperature(points: readonly LeakagePoint[]): LeakagePoint[][] {
  const groups: LeakagePoint[][] = [];
  for (const p of points) {
    const group = groups.find((g) => Math.abs(g[0]!.tjK - p.tjK) < SAME_TEMPERATURE_K);
    if (group) group.push(p);
    else groups.push([p]);
  }
  return groups;
}

/** The point at the lowest VR not below vrV (upper bound), else the highest-VR point scaled up linearly. */
function atVoltage(group: readonly LeakagePoint[], vrV: number): AtVoltage {
  const byVoltage = [...group].sort((a, b) => a.vrV - b.vrV);
  const covering = byVoltage.find((p) => p.vrV >= vrV);
  const where = (p: LeakagePoint): string => `${formatSi(p.irA, 'A')} at ${formatSi(p.vrV, 'V')}, ${formatCelsius(p.tjK)}`;
  if (covering) {
    const note = () => (covering.vrV > vrV ? `${where(covering)} (upper bound for ${formatSi(vrV, 'V')})` : where(covering));
    return { irA: covering.irA, tjK: covering.tjK, note, isExtrapolated: false };
  }
  const top = byVoltage[byVoltage.length - 1]!;
  const scale = vrV / top.vrV;
  return {
    irA: top.irA * scale,
    tjK: top.tjK,
    note: () => `${where(top)} scaled ×${formatNumber(scale)} linearly to ${formatSi(vrV, 'V')}`,
    isExtrapolated: true,
  };
}

/** The adjacent pair bracketing tjK, else the two nearest at the end it lies beyond; null with one temperature. */
function pickPair(sorted: readonly AtVoltage[], tjK: number): [AtVoltage, AtVoltage] | null {
  if (sorted.length < 2) return null;
  const upper = sorted.findIndex((p) => p.tjK >= tjK);
  const i = upper === -1 ? sorted.length - 1 : Math.max(upper, 1);
  return [sorted[i - 1]!, sorted[i]!];
}

function nearest(points: readonly AtVoltage[], tjK: number): AtVoltage {
  return [...points].sort((a, b) => Math.abs(a.tjK - tjK) - Math.abs(b.tjK - tjK))[0]!;
}
