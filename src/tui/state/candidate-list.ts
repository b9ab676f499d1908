import type { Part } from '../../parts/index.js';
import { searchListReducer, type SearchListAction, type SearchListState } from './search-list.js';
import type { RankedCandidate } from '../../selection/index.js';

export const CANDIDATE_SORTS = ['score', 'price', 'margin'] as const;
export type CandidateSort = (typeof CANDIDATE_SORTS)[number];
export const SORT_LABELS: Record<CandidateSort, string> = { score: 'score', price: 'price', margin: 'tightest margin' };

export const CANDIDATE_FILTERS = ['all', 'hide-fails', 'hide-fails-unknowns'] as const;
export type CandidateFilter = (typeof CANDIDATE_FILTERS)[number];
export const FILTER_LABELS: Record<CandidateFilter, string> = {
  all: 'all parts',
  'hide-fails': 'fails hidden',
  'hide-fails-unknowns': 'fails and unknowns hidden',
};

/** The candidate list's own state: search text, sort, filter and cursor. */
export interface CandidateListState extends SearchListState {
  readonly sort: CandidateSort;
  readonly filter: CandidateFilter;
}

export type CandidateListAction = SearchListAction | { type: 'cycleSort' } | { type: 'cycleFilter' };

export const initialCandidateList: CandidateListState = { query: '', isSearching: false, sort: 'score', filter: 'all', cursor: 0 };

const next = <T>(list: readonly T[], current: T): T => list[(list.indexOf(current) + 1) % list.length]!;

export function candidateListReducer(state: CandidateListState, action: CandidateListAction): CandidateListState {
  switch (action.type) {
    case 'cycleSort':
      return { ...state, sort: next(CANDIDATE_SORTS, state.sort), cursor: 0 };
    case 'cycleFilter':
      return { ...state, filter: next(CANDIDATE_FILTERS, state.filter), cursor: 0 };
    default:
      return searchListReducer(state, action);
  }
}

const isFail = (c: RankedCandidate) => c.evaluation.verdict === 'fail';
const isUnknown = (c: RankedCandidate) => c.evaluation.verdict === 'unknown';
const price = (c: RankedCandidate) => c.evaluation.part.unitPrice ?? Number.POSITIVE_INFINITY;
const tightest = (c: RankedCandidate) => c.evaluation.tightest?.headroom ?? Number.NEGATIVE_INFINITY;

/**
 * The rows to show: ranked candidates then the failed ones, kept when the search matched them
 * (null: no search), filtered, then sorted. Ties keep the ranking's order.
 */
export function arrangeCandidates(
  ranked: readonly RankedCandidate[],
  matched: ReadonlySet<Part> | null,
  sort: CandidateSort,
  filter: CandidateFilter,
): RankedCandidate[] {
  const kept = ranked.filter(
    (c) =>
      (matched === null || matched.has(c.evaluation.part)) &&
      !(filter !== 'all' && isFail(c)) &&
      !(filter === 'hide-fails-unknowns' && isUnknown(c)),
  );
  const order = new Map(ranked.map((c, i) => [c, i]));
  const byRank = (a: RankedCandidate, b: RankedCandidate) => order.get(a)! - order.get(b)!;
  if (sort === 'price') return kept.sort((a, b) => price(a) - price(b) || byRank(a, b));
  if (sort === 'margin') return kept.sort((a, b) => Number(isFail(a)) - Number(isFail(b)) || tightest(b) - tightest(a) || byRank(a, b));
  return kept.sort(byRank);
}
