import { describe, expect, it } from 'vitest';
import { browseReducer, initialBrowseState } from '../../src/tui/state/browse-state.js';

describe('browse reducer', () => {
  it('types into the query and resets the cursor', () => {
    const s = browseReducer({ ...initialBrowseState, cursor: 4 }, { type: 'type', text: 's' });
    expect(s).toEqual({ query: 's', cursor: 0, openIndex: null });
  });

  it('keeps the cursor inside the list', () => {
    let s = browseReducer(initialBrowseState, { type: 'move', by: -1, count: 3 });
    expect(s.cursor).toBe(0);
    s = browseReducer(s, { type: 'move', by: 10, count: 3 });
    expect(s.cursor).toBe(2);
  });

  it('opens the selected part only when there is one, and Esc goes back then clears', () => {
    expect(browseReducer(initialBrowseState, { type: 'open', count: 0 }).openIndex).toBeNull();
    const open = browseReducer({ query: 'x', cursor: 1, openIndex: null }, { type: 'open', count: 2 });
    expect(open.openIndex).toBe(1);
    const back = browseReducer(open, { type: 'back' });
    expect(back).toEqual({ query: 'x', cursor: 1, openIndex: null });
    expect(browseReducer(back, { type: 'back' })).toEqual(initialBrowseState);
  });
});
