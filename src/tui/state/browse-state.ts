/** State of the catalog browser, changed only by this reducer so it can be tested without rendering. */
export interface BrowseState {
  readonly query: string;
  readonly cursor: number;
  readonly openIndex: number | null;
}

export type BrowseAction =
  | { type: 'type'; text: string }
  | { type: 'erase' }
  | { type: 'move'; by: number; count: number }
  | { type: 'open'; count: number }
  | { type: 'back' };

export const initialBrowseState: BrowseState = { query: '', cursor: 0, openIndex: null };

export function browseReducer(state: BrowseState, action: BrowseAction): BrowseState {
  switch (action.type) {
    case 'type':
      return state.openIndex !== null ? state : { ...state, query: state.query + action.text, cursor: 0 };
    case 'erase':
      return state.openIndex !== null ? state : { ...state, query: state.query.slice(0, -1), cursor: 0 };
    case 'move': {
      if (state.openIndex !== null || action.count === 0) return state;
      const cursor = Math.min(action.count - 1, Math.max(0, state.cursor + action.by));
      return { ...state, cursor };
    }
    case 'open':
      return action.count > 0 ? { ...state, openIndex: state.cursor } : state;
    case 'back':
      if (state.openIndex !== null) return { ...state, openIndex: null };
      return { ...state, query: '', cursor: 0 };
  }
}
