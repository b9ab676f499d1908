import type { ThermalSweep } from '../../selection/index.js';
import { formatQuantity } from '../../units/index.js';
import { fitRight } from '../text/fit.js';
import type { StyledLine } from '../text/styled.js';
import { areaChart } from './area-chart.js';

const GUTTER = 10;

export interface ThermalChartOptions {
  /** Columns for the whole chart, labels included. */
  readonly width: number;
  /** Plot rows of each chart. */
  readonly height: number;
  /** The position's highest ambient, marked on the axis. */
  readonly ambientMaxK: number;
}

/** Ambient range of the chart: the position's range and a stretch beyond it, to show what is left. */
export function sweepRange(ambientMinK: number, ambientMaxK: number): { fromK: number; toK: number } {
  const beyond = Math.max(25, (ambientMaxK - ambientMinK) * 0.4);
  return { fromK: ambientMinK, toK: ambientMaxK + beyond };
}

/** Columns of plot for a chart `width` wide (each column one sweep point). */
export const plotColumns = (width: number) => Math.max(12, Math.min(72, width - GUTTER - 2));

function xLabels(sweep: Extract<ThermalSweep, { ok: true }>, cols: number, markColumn: number, alarmColumn: number | undefined, ambientMaxK: number): string {
  const first = sweep.points[0]!.ambientK;
  const last = sweep.points[sweep.points.length - 1]!.ambientK;
  const labels: [number, string][] = [[0, formatQuantity(first, 'temperature')]];
  labels.push([markColumn, `${formatQuantity(ambientMaxK, 'temperature')} max`]);
  if (alarmColumn !== undefined) labels.push([alarmColumn, `runaway ${formatQuantity(sweep.points[alarmColumn]!.ambientK, 'temperature')}`]);
  labels.push([cols - 1, formatQuantity(last, 'temperature')]);
  const room = cols + 2;
  let line = ' '.repeat(room);
  let freeFrom = 0;
  for (const [col, text] of labels.sort((a, b) => a[0] - b[0])) {
    const start = Math.max(freeFrom, Math.min(col, room - text.length));
    if (start + text.length > line.length) continue;
    line = line.slice(0, start) + text + line.slice(start + text.length);
    freeFrom = start + text.length + 1;
  }
  return ' '.repeat(GUTTER) + line.trimEnd();
}

function nearestColumn(sweep: Extract<ThermalSweep, { ok: true }>, k: number): number {
  let best = 0;
  sweep.points.forEach((p, i) => {
    if (Math.abs(p.ambientK - k) < Math.abs(sweep.points[best]!.ambientK - k)) best = i;
  });
  return best;
}

/** Junction temperature against ambient, Tj max at the top, the policy's ceiling dashed. */
export function tjChart(sweep: Extract<ThermalSweep, { ok: true }>, options: ThermalChartOptions): StyledLine[] {
  const cols = sweep.points.length;
  const markColumn = nearestColumn(sweep, options.ambientMaxK);
  const alarm = sweep.points.findIndex((p) => p.isRunaway);
  const alarmColumn = alarm === -1 ? undefined : alarm;
  const yMin = Math.min(sweep.points[0]!.ambientK, ...sweep.points.flatMap((p) => (p.tjK === null ? [] : [p.tjK])));
  const chart = areaChart({
    values: sweep.points.map((p) => p.tjK),
    yMin,
    yMax: sweep.tjMaxK,
    height: options.height,
    guide: sweep.ceilingK,
    markColumn,
    ...(alarmColumn === undefined ? {} : { alarmColumn }),
  });
  const T = (k: number) => formatQuantity(k, 'temperature');
  const lines: StyledLine[] = chart.rows.map((row, i) => {
    const label = i === 0 ? `${T(sweep.tjMaxK)} ┤` : i === chart.guideRow ? `${T(sweep.ceilingK)} ┤` : '│';
    return [{ text: fitRight(label, GUTTER), tone: 'muted' }, { text: row, tone: i <= (chart.guideRow ?? -1) ? 'warn' : 'accent' }];
  });
  lines.push([{ text: fitRight(`${T(yMin)} └`, GUTTER), tone: 'muted' }, { text: chart.axis, tone: 'muted' }]);
  lines.push([{ text: xLabels(sweep, cols, markColumn, alarmColumn, options.ambientMaxK), tone: 'muted' }]);
  return lines;
}

/** Leakage at the working reverse voltage against ambient, on a log scale. */
export function leakageChart(sweep: Extract<ThermalSweep, { ok: true }>, options: ThermalChartOptions): StyledLine[] | null {
  const values = sweep.points.map((p) => p.leakageA);
  const known = values.filter((v): v is number => v !== null && v > 0);
  if (known.length === 0) return null;
  const markColumn = nearestColumn(sweep, options.ambientMaxK);
  const alarm = sweep.points.findIndex((p) => p.isRunaway);
  const alarmColumn = alarm === -1 ? undefined : alarm;
  const lo = Math.min(...known);
  const hi = Math.max(...known);
  const yMin = lo / 2;
  const yMax = hi === lo ? hi * 4 : hi;
  const chart = areaChart({ values, yMin, yMax, height: options.height, isLog: true, markColumn, ...(alarmColumn === undefined ? {} : { alarmColumn }) });
  const A = (a: number) => formatQuantity(a, 'current');
  const lines: StyledLine[] = chart.rows.map((row, i) => [
    { text: fitRight(i === 0 ? `${A(yMax)} ┤` : '│', GUTTER), tone: 'muted' },
    { text: row, tone: 'accent' },
  ]);
  lines.push([{ text: fitRight(`${A(yMin)} └`, GUTTER), tone: 'muted' }, { text: chart.axis, tone: 'muted' }]);
  lines.push([{ text: xLabels(sweep, values.length, markColumn, alarmColumn, options.ambientMaxK), tone: 'muted' }]);
  return lines;
}
