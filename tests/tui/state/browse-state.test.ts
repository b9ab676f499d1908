import { describe, expect, it } from 'vitest';
import { browseReducer, initialBrowseState } from '../../../src/tui/state/browse-state.js';

describe('browse reducer', () => {
  it('types into the query only as asked and resets the cursor', () => {
    let s = browseReducer({ ...initialBrowseState, cursor: 4 }, { type: 'startSearch' });
    s = browseReducer(s, { type: 'type', text: 's' });
    expect(s).toEqual({ query: 's', isSearching: true, cursor: 0 });
    expect(browseReducer(s, { type: 'endSearch' })).toEqual({ query: 's', isSearching: false, cursor: 0 });
  });

  it('keeps the cursor inside the list', () => {
    let s = browseReducer(initialBrowseState, { type: 'move', by: -1, count: 3 });
    expect(s.cursor).toBe(0);
    s = browseReducer(s, { type: 'move', by: 10, count: 3 });
    expect(s.cursor).toBe(2);
    expect(browseReducer(s, { type: 'move', by: 1, count: 0 }).cursor).toBe(0);
  });

  it('clears the search entirely', () => {
    const s = browseReducer({ query: 'sma', isSearching: true, cursor: 3 }, { type: 'clearSearch' });
    expect(s).toEqual(initialBrowseState);
  });
});
