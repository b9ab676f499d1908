import type { Part } from '../../parts/index.js';
import { searchListReducer, type SearchListAction, type SearchListState } from './search-list.js';

export type Slot = 'original' | 'alternate';
/** Where a part is chosen from: the original's ranked replacements, or the whole catalog. */
export type PickSource = 'replacements' | 'catalog';

/**
 * The substitution screen: the two parts, and either the comparison (scrolled by `offset`) or a
 * list to choose one of them from. Changed only here, so it is tested without rendering.
 */
export interface SubstitutionState {
  readonly original: Part | null;
  readonly alternate: Part | null;
  /** The slot a part is being chosen for; null while the comparison is shown. */
  readonly picking: Slot | null;
  readonly source: PickSource;
  readonly list: SearchListState;
  readonly offset: number;
  /** Why the last choice was not taken. */
  readonly notice: string | null;
}

export type SubstitutionAction =
  | { type: 'pick'; slot: Slot }
  | { type: 'choose'; part: Part }
  /** Leaves the list for the comparison (when there is one to show). */
  | { type: 'closePick' }
  | { type: 'toggleSource' }
  | { type: 'exchange' }
  | { type: 'scroll'; by: number; max: number }
  | { type: 'list'; action: SearchListAction };

const EMPTY_LIST: SearchListState = { query: '', isSearching: false, cursor: 0 };

export const samePart = (a: Pick<Part, 'manufacturer' | 'partNumber'>, b: Pick<Part, 'manufacturer' | 'partNumber'>) =>
  a.manufacturer.toLowerCase() === b.manufacturer.toLowerCase() && a.partNumber.toLowerCase() === b.partNumber.toLowerCase();

/** Replacements are ranked against an original; without one only the catalog can be listed. */
const sourceFor = (slot: Slot, original: Part | null): PickSource => (slot === 'alternate' && original ? 'replacements' : 'catalog');

function openPick(state: SubstitutionState, slot: Slot): SubstitutionState {
  return { ...state, picking: slot, source: sourceFor(slot, state.original), list: EMPTY_LIST, notice: null };
}

/** Starts on the comparison when both parts are known, otherwise on the list for the missing one. */
export function initialSubstitution(original: Part | null, alternate: Part | null): SubstitutionState {
  const base: SubstitutionState = { original, alternate, picking: null, source: 'catalog', list: EMPTY_LIST, offset: 0, notice: null };
  if (!original) return openPick(base, 'original');
  if (!alternate) return openPick(base, 'alternate');
  return base;
}

export function isComparable(state: Pick<SubstitutionState, 'original' | 'alternate'>): boolean {
  return state.original !== null && state.alternate !== null;
}

export function substitutionReducer(state: SubstitutionState, action: SubstitutionAction): SubstitutionState {
  switch (action.type) {
    case 'pick':
      return openPick(state, action.slot);
    case 'choose': {
      if (!state.picking) return state;
      const other = state.picking === 'original' ? state.alternate : state.original;
      if (other && samePart(other, action.part)) {
        return { ...state, notice: `That is the ${state.picking === 'original' ? 'alternate' : 'original'} itself; choose another part.` };
      }
      const next = { ...state, [state.picking]: action.part, offset: 0, notice: null };
      // An original chosen first: the alternate comes next, from its ranked replacements.
      if (!next.alternate) return openPick(next, 'alternate');
      return { ...next, picking: null };
    }
    case 'closePick':
      return isComparable(state) ? { ...state, picking: null, notice: null } : state;
    case 'toggleSource':
      if (state.picking !== 'alternate' || !state.original) return state;
      return { ...state, source: state.source === 'replacements' ? 'catalog' : 'replacements', list: EMPTY_LIST, notice: null };
    case 'exchange':
      return isComparable(state) ? { ...state, original: state.alternate, alternate: state.original, offset: 0 } : state;
    case 'scroll':
      return { ...state, offset: Math.min(Math.max(0, action.max), Math.max(0, state.offset + action.by)) };
    case 'list':
      return { ...state, list: searchListReducer(state.list, action.action), notice: null };
  }
}
