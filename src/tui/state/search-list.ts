/** What every searchable list keeps: the search text, whether keys go into it, and the cursor. */
export interface SearchListState {
  readonly query: string;
  /** True while keys go into the search text. */
  readonly isSearching: boolean;
  readonly cursor: number;
}

export type SearchListAction =
  | { type: 'startSearch' }
  | { type: 'endSearch' }
  | { type: 'type'; text: string }
  | { type: 'erase' }
  | { type: 'clearSearch' }
  | { type: 'move'; by: number; count: number };

/** The search and cursor moves shared by the catalog browser and the candidate list. */
export function searchListReducer<S extends SearchListState>(state: S, action: SearchListAction): S {
  switch (action.type) {
    case 'startSearch':
      return { ...state, isSearching: true };
    case 'endSearch':
      return { ...state, isSearching: false };
    case 'type':
      return action.text ? { ...state, query: state.query + action.text, cursor: 0 } : state;
    case 'erase':
      return { ...state, query: [...state.query].slice(0, -1).join(''), cursor: 0 };
    case 'clearSearch':
      return { ...state, query: '', isSearching: false, cursor: 0 };
    case 'move':
      if (action.count <= 0) return state.cursor === 0 ? state : { ...state, cursor: 0 };
      return { ...state, cursor: Math.min(action.count - 1, Math.max(0, state.cursor + action.by)) };
  }
}
