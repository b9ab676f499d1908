import { searchListReducer, type SearchListAction, type SearchListState } from './search-list.js';

/** State of the catalog browser, changed only by this reducer so it can be tested without rendering. */
export type BrowseState = SearchListState;
export type BrowseAction = SearchListAction;

export const initialBrowseState: BrowseState = { query: '', isSearching: false, cursor: 0 };

export function browseReducer(state: BrowseState, action: BrowseAction): BrowseState {
  return searchListReducer(state, action);
}
