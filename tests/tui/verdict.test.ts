import { describe, expect, it } from 'vitest';
import type { LimitEvaluation } from '../../src/selection/index.js';
import { headroomBar, headroomText, marginCell } from '../../src/tui/views/verdict.js';

const limit = (verdict: LimitEvaluation['verdict'], headroom: number | null, scoresMargin = true) =>
  ({ verdict, headroom, scoresMargin }) as LimitEvaluation;

describe('margin cells', () => {
  it('draws headroom as a bar in eighths with the empty part dotted', () => {
    expect(headroomBar(0.5, 4)).toBe('██··');
    expect(headroomBar(1 / 16, 4)).toBe('▎···');
    expect(headroomBar(1.4, 4)).toBe('████');
  });

  it('marks every verdict with a symbol, so no colour is needed', () => {
    expect(marginCell(limit('pass', 0.5), 5).text).toBe(' ██··');
    expect(marginCell(limit('marginal', 0.05), 5).text).toMatch(/^!/);
    expect(marginCell(limit('fail', -0.2), 5).text).toBe('✗····');
    expect(marginCell(limit('unknown', null), 5).text).toBe('?    ');
    expect(marginCell(limit('pass', 0, false), 5).text).toBe(' =   ');
  });

  it('writes headroom as a percentage, short of the bound with a minus', () => {
    expect(headroomText(limit('pass', 0.384))).toBe('38 %');
    expect(headroomText(limit('fail', -0.12))).toBe('−12 %');
    expect(headroomText(limit('unknown', null))).toBe('?');
  });
});
