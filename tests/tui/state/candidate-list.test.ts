import { describe, expect, it } from 'vitest';
import type { Part } from '../../../src/parts/index.js';
import type { LimitEvaluation, RankedCandidate, Verdict } from '../../../src/selection/index.js';
import { arrangeCandidates, candidateListReducer, initialCandidateList } from '../../../src/tui/state/candidate-list.js';
import { aPart } from '../../helpers/a-part.js';

function candidate(partNumber: string, verdict: Verdict, rank: number, options: { price?: number; tightest?: number } = {}): RankedCandidate {
  const part = aPart('schottky', { partNumber, ...(options.price !== undefined ? { unitPrice: options.price, currency: 'EUR' } : {}) });
  const tightest = options.tightest === undefined ? null : ({ headroom: options.tightest } as LimitEvaluation);
  return { rank, score: 100 - rank, scoreParts: {} as RankedCandidate['scoreParts'], evaluation: { part, verdict, summary: '', limits: [], tightest, notes: [] } };
}

const ranked = [
  candidate('A', 'pass', 1, { price: 0.3, tightest: 0.2 }),
  candidate('B', 'pass', 2, { price: 0.1, tightest: 0.6 }),
  candidate('C', 'unknown', 3),
  candidate('D', 'fail', 1, { price: 0.05, tightest: -0.1 }),
];
const numbers = (list: readonly RankedCandidate[]) => list.map((c) => c.evaluation.part.partNumber);

describe('candidate list', () => {
  it('keeps the ranking order by score, fails last', () => {
    expect(numbers(arrangeCandidates(ranked, null, 'score', 'all'))).toEqual(['A', 'B', 'C', 'D']);
  });

  it('sorts by price with unpriced parts last, and by tightest margin with fails last', () => {
    expect(numbers(arrangeCandidates(ranked, null, 'price', 'all'))).toEqual(['D', 'B', 'A', 'C']);
    expect(numbers(arrangeCandidates(ranked, null, 'margin', 'all'))).toEqual(['B', 'A', 'C', 'D']);
  });

  it('hides fails, then fails and unknowns', () => {
    expect(numbers(arrangeCandidates(ranked, null, 'score', 'hide-fails'))).toEqual(['A', 'B', 'C']);
    expect(numbers(arrangeCandidates(ranked, null, 'score', 'hide-fails-unknowns'))).toEqual(['A', 'B']);
  });

  it('keeps only what the search matched', () => {
    const matched = new Set<Part>([ranked[1]!.evaluation.part, ranked[3]!.evaluation.part]);
    expect(numbers(arrangeCandidates(ranked, matched, 'score', 'all'))).toEqual(['B', 'D']);
  });

  it('cycles sort and filter and resets the cursor on every change of what is shown', () => {
    let s = candidateListReducer({ ...initialCandidateList, cursor: 3 }, { type: 'cycleSort' });
    expect(s).toMatchObject({ sort: 'price', cursor: 0 });
    s = candidateListReducer(candidateListReducer(s, { type: 'cycleSort' }), { type: 'cycleSort' });
    expect(s.sort).toBe('score');
    s = candidateListReducer(s, { type: 'cycleFilter' });
    expect(s.filter).toBe('hide-fails');
    s = candidateListReducer(candidateListReducer(s, { type: 'startSearch' }), { type: 'type', text: 'sma' });
    expect(s).toMatchObject({ query: 'sma', isSearching: true });
    expect(candidateListReducer(s, { type: 'clearSearch' })).toMatchObject({ query: '', isSearching: false });
  });
});
