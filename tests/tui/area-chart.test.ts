import { describe, expect, it } from 'vitest';
import { areaChart } from '../../src/tui/chart/area-chart.js';

describe('area chart', () => {
  it('fills each column up to its value in eighths of a row', () => {
    const chart = areaChart({ values: [0, 0.5, 1], yMin: 0, yMax: 1, height: 2 });
    expect(chart.rows).toEqual(['  █', ' ██']);
  });

  it('draws a dashed guide where a column does not reach it', () => {
    const chart = areaChart({ values: [0.1, 0.9], yMin: 0, yMax: 1, height: 4, guide: 0.75 });
    expect(chart.guideRow).toBe(1);
    expect(chart.rows[1]).toBe('┄█');
  });

  it('shades columns without a value and marks the axis', () => {
    const chart = areaChart({ values: [0.2, 0.4, null, null], yMin: 0, yMax: 1, height: 2, markColumn: 1, alarmColumn: 2 });
    expect(chart.rows.every((r) => r.endsWith('░░'))).toBe(true);
    expect(chart.axis).toBe('─┬×─');
  });

  it('spreads decades evenly on a log scale', () => {
    const chart = areaChart({ values: [1e-9, 1e-6], yMin: 1e-9, yMax: 1e-6, height: 3, isLog: true });
    expect(chart.rows.map((r) => r[1])).toEqual(['█', '█', '█']);
    expect(chart.rows.map((r) => r[0])).toEqual([' ', ' ', ' ']);
  });
});
