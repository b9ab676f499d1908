/** Eighth blocks from empty to full: one column of the chart is a stack of these. */
const BLOCKS = [' ', '▁', '▂', '▃', '▄', '▅', '▆', '▇', '█'] as const;
const GUIDE = '┄';
const NO_VALUE = '░';

export interface AreaChartInput {
  /** One value per column; null where there is none (a thermal runaway, an unknown). */
  readonly values: readonly (number | null)[];
  readonly yMin: number;
  readonly yMax: number;
  /** Plot rows. */
  readonly height: number;
  /** Logarithmic y (leakage over decades). */
  readonly isLog?: boolean;
  /** A horizontal dashed line, e.g. the policy's Tj ceiling. */
  readonly guide?: number;
  /** Column marked ┬ on the axis (the position's highest ambient). */
  readonly markColumn?: number;
  /** Column marked × on the axis (the first runaway point). */
  readonly alarmColumn?: number;
}

export interface AreaChart {
  /** Plot rows, top first, each exactly one character per value. */
  readonly rows: readonly string[];
  /** The axis under the plot. */
  readonly axis: string;
  /** Row index of the guide line, if it falls inside the plot. */
  readonly guideRow?: number;
}

const scale = (v: number, isLog: boolean) => (isLog ? Math.log10(Math.max(v, Number.MIN_VALUE)) : v);

/**
 * A filled area chart in block characters: each column rises to its value in eighths of a row,
 * so a glance shows the trend; columns without a value are shaded ░ from top to bottom.
 */
export function areaChart(input: AreaChartInput): AreaChart {
  const height = Math.max(1, input.height);
  const isLog = input.isLog ?? false;
  const lo = scale(input.yMin, isLog);
  const hi = scale(input.yMax, isLog);
  const span = hi - lo || 1;
  const eighths = (v: number) => Math.round(((scale(v, isLog) - lo) / span) * height * 8);
  const levels = input.values.map((v) => (v === null || !Number.isFinite(v) ? null : Math.min(height * 8, Math.max(0, eighths(v)))));
  const guideLevel = input.guide === undefined ? undefined : eighths(input.guide);
  const guideRow = guideLevel === undefined || guideLevel < 0 || guideLevel > height * 8 ? undefined : Math.max(0, height - 1 - Math.floor(Math.max(0, guideLevel - 1) / 8));
  const rows: string[] = [];
  for (let r = height - 1; r >= 0; r--) {
    const rowIndex = height - 1 - r;
    let line = '';
    for (const level of levels) {
      if (level === null) {
        line += NO_VALUE;
        continue;
      }
      const cell = BLOCKS[Math.min(8, Math.max(0, level - r * 8))]!;
      line += cell === ' ' && rowIndex === guideRow ? GUIDE : cell;
    }
    rows.push(line);
  }
  const axis = input.values.map((_v, i) => (i === input.alarmColumn ? '×' : i === input.markColumn ? '┬' : '─')).join('');
  return { rows, axis, ...(guideRow === undefined ? {} : { guideRow }) };
}
