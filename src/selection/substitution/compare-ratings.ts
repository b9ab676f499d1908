import { estimateForwardVoltage, estimateLeakage } from '../../physics/index.js';
import { fieldByKey, junctionFamily, type Part } from '../../parts/index.js';
import { formatQuantity, type QuantityKind } from '../../units/index.js';

/** Which way a rating is better for a replacement part. */
export type Direction = 'higher' | 'lower' | 'same';
export type Comparison = 'equal' | 'better' | 'worse' | 'different' | 'unknown';

export interface ParameterComparison {
  readonly key: string;
  readonly label: string;
  readonly direction: Direction;
  readonly original: string;
  readonly alternate: string;
  readonly comparison: Comparison;
  /** Where the comparison needed a common condition, that condition. */
  readonly condition?: string;
}

// Ratings compared directly. 'same' means a replacement must match (a Zener's voltage).
const DIRECT: readonly (readonly [string, Direction])[] = [
  ['vrrmV', 'higher'],
  ['ifAvA', 'higher'],
  ['ifsmA', 'higher'],
  ['tjMaxK', 'higher'],
  ['pdW', 'higher'],
  ['cjF', 'lower'],
  ['trrS', 'lower'],
  ['qrrC', 'lower'],
  ['rthJaKPerW', 'lower'],
  ['rthJlKPerW', 'lower'],
  ['rthJcKPerW', 'lower'],
  ['vzV', 'same'],
  ['vzTol', 'lower'],
  ['zztOhm', 'lower'],
  ['vrwmV', 'same'],
  ['vbrMinV', 'same'],
  ['vcV', 'lower'],
  ['ippA', 'higher'],
  ['pppmW', 'higher'],
  ['unitPrice', 'lower'],
];

/** Two values within half a percent are the same rating written differently. */
const SAME_WITHIN = 0.005;

function judge(a: number, b: number, direction: Direction): Comparison {
  if (Math.abs(a - b) <= SAME_WITHIN * Math.max(Math.abs(a), Math.abs(b))) return 'equal';
  if (direction === 'same') return 'different';
  return (b > a) === (direction === 'higher') ? 'better' : 'worse';
}

const show = (v: number | undefined, kind: QuantityKind | undefined) => (v === undefined ? '—' : kind ? formatQuantity(v, kind) : String(v));

function compareDirect(original: Part, alternate: Part): ParameterComparison[] {
  const out: ParameterComparison[] = [];
  const o = original as unknown as Record<string, number | undefined>;
  const a = alternate as unknown as Record<string, number | undefined>;
  for (const [key, direction] of DIRECT) {
    const field = fieldByKey(key)!;
    if (o[key] === undefined && a[key] === undefined) continue;
    const row = { key, label: field.label, direction, original: show(o[key], field.quantity), alternate: show(a[key], field.quantity) };
    const comparison = o[key] === undefined || a[key] === undefined ? 'unknown' : judge(o[key]!, a[key]!, direction);
    out.push({ ...row, comparison });
  }
  return out;
}

/** VF of both parts at the original's first datasheet condition (current and temperature). */
function compareVf(original: Part, alternate: Part): ParameterComparison | undefined {
  const ref = original.vfPoints[0];
  if (!ref) return undefined;
  const condition = `at ${formatQuantity(ref.ifA, 'current')}, Tj ${formatQuantity(ref.tjK, 'temperature')}`;
  const alt = estimateForwardVoltage(alternate.vfPoints, ref.ifA, ref.tjK);
  const row = { key: 'vf', label: 'VF', direction: 'lower' as const, original: formatQuantity(ref.vfV, 'voltage'), condition };
  if (!alt.ok) return { ...row, alternate: '—', comparison: 'unknown' };
  return { ...row, alternate: formatQuantity(alt.value, 'voltage'), comparison: judge(ref.vfV, alt.value, 'lower') };
}

/** IR of both at the original's hottest datasheet point: leakage matters most hot. */
function compareIr(original: Part, alternate: Part): ParameterComparison | undefined {
  const ref = [...original.irPoints].sort((x, y) => y.tjK - x.tjK)[0];
  if (!ref) return undefined;
  const condition = `at ${formatQuantity(ref.vrV, 'voltage')}, Tj ${formatQuantity(ref.tjK, 'temperature')}`;
  const alt = estimateLeakage(alternate.irPoints, ref.vrV, ref.tjK, junctionFamily(alternate.kind));
  const row = { key: 'ir', label: 'IR', direction: 'lower' as const, original: formatQuantity(ref.irA, 'current'), condition };
  if (!alt.ok) return { ...row, alternate: '—', comparison: 'unknown' };
  return { ...row, alternate: formatQuantity(alt.value, 'current'), comparison: judge(ref.irA, alt.value, 'lower') };
}

/** Every rating both parts could be compared on, knowing which way is better for each. */
export function compareRatings(original: Part, alternate: Part): ParameterComparison[] {
  const rows = compareDirect(original, alternate);
  const vf = compareVf(original, alternate);
  const ir = compareIr(original, alternate);
  // VF and IR sit after the current ratings, where a datasheet has them.
  const at = rows.findIndex((r) => r.key === 'tjMaxK');
  rows.splice(at < 0 ? rows.length : at, 0, ...[vf, ir].filter((r): r is ParameterComparison => r !== undefined));
  return rows;
}
