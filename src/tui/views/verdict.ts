import type { LimitEvaluation, Verdict } from '../../selection/index.js';
import type { Segment, Tone } from '../text/styled.js';

/** Every verdict has a symbol and a word, so nothing depends on colour alone. */
export const VERDICT_MARK: Readonly<Record<Verdict, string>> = { pass: '✓', marginal: '!', fail: '✗', unknown: '?' };
export const VERDICT_WORD: Readonly<Record<Verdict, string>> = { pass: 'pass', marginal: 'marginal', fail: 'fail', unknown: 'unknown' };
export const VERDICT_TONE: Readonly<Record<Verdict, Tone>> = { pass: 'good', marginal: 'warn', fail: 'bad', unknown: 'muted' };

const EIGHTHS = ['', '▏', '▎', '▍', '▌', '▋', '▊', '▉'] as const;
const EMPTY = '·';

/** Headroom 0…1 as a bar of `width` cells in eighths; the rest dotted so the scale stays visible. */
export function headroomBar(headroom: number, width: number): string {
  const total = Math.round(Math.min(1, Math.max(0, headroom)) * width * 8);
  const full = Math.floor(total / 8);
  const part = EIGHTHS[total % 8]!;
  const bar = '█'.repeat(full) + part;
  return bar + EMPTY.repeat(Math.max(0, width - [...bar].length));
}

export const percent = (fraction: number) => `${Math.round(fraction * 100)} %`;

/**
 * One limit in a candidate row, `width` columns: a mark (blank pass, ! marginal, ✗ fail, ? unknown)
 * then the headroom bar. An exact requirement met (nominal VZ) shows "=".
 */
export function marginCell(limit: LimitEvaluation, width: number): Segment {
  const barWidth = Math.max(1, width - 1);
  const tone = VERDICT_TONE[limit.verdict];
  if (limit.verdict === 'unknown') return { text: '?' + ' '.repeat(barWidth), tone };
  if (limit.verdict === 'fail') return { text: '✗' + EMPTY.repeat(barWidth), tone };
  const mark = limit.verdict === 'marginal' ? '!' : ' ';
  if (!limit.scoresMargin || limit.headroom === null) return { text: mark + '='.padEnd(barWidth), tone };
  return { text: mark + headroomBar(limit.headroom, barWidth), tone };
}

/** "38 %", "−12 %" (short of the bound) or "?" for one limit. */
export function headroomText(limit: LimitEvaluation): string {
  if (limit.verdict === 'unknown' || limit.headroom === null) return '?';
  return limit.headroom < 0 ? `−${percent(-limit.headroom)}` : percent(limit.headroom);
}
