import { describe, expect, it } from 'vitest';
import { initialSubstitution, isComparable, substitutionReducer, type SubstitutionAction, type SubstitutionState } from '../../../src/tui/state/substitution.js';
import { aPart } from '../../helpers/a-part.js';

const original = aPart('schottky');
const alternate = aPart('schottky', { partNumber: 'TW-SK360A', vrrmV: 60 });
const third = aPart('schottky', { partNumber: 'TW-SK340B' });
const run = (state: SubstitutionState, ...actions: SubstitutionAction[]) => actions.reduce(substitutionReducer, state);

describe('substitution state', () => {
  it('starts on the list for whichever part is missing, the alternate from the ranked replacements', () => {
    expect(initialSubstitution(null, null)).toMatchObject({ picking: 'original', source: 'catalog' });
    expect(initialSubstitution(original, null)).toMatchObject({ picking: 'alternate', source: 'replacements' });
    expect(initialSubstitution(null, alternate)).toMatchObject({ picking: 'original', source: 'catalog' });
    expect(initialSubstitution(original, alternate)).toMatchObject({ picking: null });
  });

  it('asks for the alternate once the original is chosen, then shows the comparison', () => {
    let s = run(initialSubstitution(null, null), { type: 'choose', part: original });
    expect(s).toMatchObject({ original, alternate: null, picking: 'alternate', source: 'replacements' });
    s = run(s, { type: 'choose', part: alternate });
    expect(s).toMatchObject({ original, alternate, picking: null });
    expect(isComparable(s)).toBe(true);
  });

  it('refuses the original as its own alternate, letter case aside', () => {
    const s = run(initialSubstitution(original, null), { type: 'choose', part: { ...original, partNumber: 'tw-sk340a' } });
    expect(s.alternate).toBeNull();
    expect(s.picking).toBe('alternate');
    expect(s.notice).toBe('That is the original itself; choose another part.');
  });

  it('switches between ranked replacements and the whole catalog, with a fresh search', () => {
    let s = run(initialSubstitution(original, null), { type: 'list', action: { type: 'type', text: 'sk3' } });
    expect(s.list.query).toBe('sk3');
    s = run(s, { type: 'toggleSource' });
    expect(s).toMatchObject({ source: 'catalog', list: { query: '', cursor: 0 } });
    expect(run(s, { type: 'toggleSource' }).source).toBe('replacements');
    // Without an original there is nothing to rank against.
    expect(run(initialSubstitution(null, null), { type: 'toggleSource' }).source).toBe('catalog');
  });

  it('exchanges the two parts, chooses another, and leaves a list only for a comparison', () => {
    const s = initialSubstitution(original, alternate);
    expect(run(s, { type: 'exchange' })).toMatchObject({ original: alternate, alternate: original, offset: 0 });
    const picking = run(s, { type: 'pick', slot: 'alternate' });
    expect(picking.picking).toBe('alternate');
    expect(run(picking, { type: 'choose', part: third })).toMatchObject({ alternate: third, picking: null });
    expect(run(picking, { type: 'closePick' })).toMatchObject({ alternate, picking: null });
    const lonely = initialSubstitution(original, null);
    expect(run(lonely, { type: 'closePick' })).toBe(lonely);
  });

  it('keeps the scroll within the document', () => {
    const s = initialSubstitution(original, alternate);
    expect(run(s, { type: 'scroll', by: 5, max: 3 }).offset).toBe(3);
    expect(run(s, { type: 'scroll', by: -5, max: 3 }).offset).toBe(0);
    expect(run(s, { type: 'scroll', by: Infinity, max: 12 }).offset).toBe(12);
  });
});
