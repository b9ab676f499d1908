import type { Limit } from '../circuits/limits.js';
import { formatQuantity, type QuantityKind } from '../units/index.js';
import type { Verdict } from './evaluation.js';

/** Text built only when explanations are wanted: a ranking evaluates hundreds of parts and shows ten. */
export type Text = string | (() => string);

export const textOf = (t: Text | undefined): string | undefined => (typeof t === 'function' ? t() : t);

/** What a checker found, in the words the explanation needs. */
export interface Measurement {
  readonly value: number;
  readonly bound: number;
  readonly stress: number;
  readonly quantity: QuantityKind;
  /** Temperatures: headroom is the unused part of the rise above this (the ambient). */
  readonly origin?: number;
  /** After the value: "at 32 V and Tj 71.2 °C". */
  readonly context?: Text;
  /** After the bound; defaults to the limit's derating: " after 80 % derating". */
  readonly boundNote?: string;
  /** Names the raw stress in a failure: "Tj max" reads "is above Tj max 150 °C". */
  readonly stressName?: string;
  /** Show the margin in units (kelvin for temperatures) instead of per cent. */
  readonly isMarginInUnits?: boolean;
  readonly method?: Text;
}

/** "38 %", "6.2 %": whole per cent, one decimal below ten. */
export function percent(fraction: number): string {
  const p = Math.abs(fraction * 100);
  return `${p >= 10 ? Math.round(p) : +p.toFixed(1)} %`;
}

/** " after 80 % derating" for a fractional derating factor; nothing for the Tj margin or none. */
export function deratingNote(limit: Limit): string {
  const d = limit.derating;
  if (!d || d.factor === 'tj' || !(d.value > 0 && d.value <= 1)) return '';
  return ` after ${+(d.value * 100).toFixed(1)} % derating`;
}

export interface Judged {
  readonly verdict: Verdict;
  readonly headroom: number;
  readonly marginUnits: number;
  readonly isExact: boolean;
}

/** The one-line explanation of a judged limit. */
export function explainMeasurement(limit: Limit, m: Measurement, j: Judged): string {
  const q = (x: number) => formatQuantity(x, m.quantity);
  const isAtLeast = limit.check.relation === 'at-least';
  const need = isAtLeast ? 'needed' : 'allowed';
  const context = textOf(m.context);
  const head = `${limit.label} ${q(m.value)}${context ? ` ${context}` : ''}`;
  const boundText = `${q(m.bound)} ${limit.isHard ? need : 'preferred'}${m.boundNote ?? deratingNote(limit)}`;
  const amount = m.isMarginInUnits ? formatQuantity(Math.abs(j.marginUnits), differenceKind(m.quantity)) : percent(j.headroom);
  const shortWord = isAtLeast ? 'short' : 'over';
  const hasDerating = Math.abs(m.bound - m.stress) > 1e-12 * Math.max(1, Math.abs(m.stress));
  const stressText = m.stressName ? `${m.stressName} ${q(m.stress)}` : hasDerating ? `the circuit's own ${q(m.stress)}` : `the ${q(m.stress)} ${need}`;
  switch (j.verdict) {
    case 'pass':
      return j.isExact ? `${head} as required (${q(m.bound)})` : `${head} against ${boundText}: ${amount} headroom`;
    case 'marginal':
      return limit.isHard
        ? `${head} against ${boundText}: ${amount} ${shortWord}; meets ${stressText}`
        : `${head} against ${boundText}: ${amount} ${shortWord} (a preference, not a requirement)`;
    default:
      return `${head} is ${isAtLeast ? 'below' : 'above'} ${stressText}${hasDerating ? ` (${boundText})` : ''}`;
  }
}

export function explainUnknown(limit: Limit, reason: string): string {
  return `${limit.label}: unknown, ${reason}`;
}

function differenceKind(kind: QuantityKind): QuantityKind {
  return kind === 'temperature' ? 'temperature-difference' : kind;
}
