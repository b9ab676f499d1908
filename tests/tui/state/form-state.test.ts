import { describe, expect, it } from 'vitest';
import { cycleOption, formReducer, initialForm } from '../../../src/tui/state/form-state.js';

describe('form state', () => {
  it('types into, erases from and clears the named field', () => {
    let s = formReducer(initialForm(), { type: 'type', name: 'vin', text: '12 V' });
    s = formReducer(s, { type: 'erase', name: 'vin' });
    expect(s.values).toEqual({ vin: '12 ' });
    expect(formReducer(s, { type: 'clear', name: 'vin' }).values).toEqual({ vin: '' });
  });

  it('erases whole characters, not halves of them', () => {
    const s = formReducer(initialForm({ t: '25 °C' }), { type: 'erase', name: 't' });
    expect(s.values.t).toBe('25 °');
  });

  it('keeps the cursor on a row and remembers a submit attempt', () => {
    let s = formReducer(initialForm(), { type: 'move', by: 5, count: 3 });
    expect(s.cursor).toBe(2);
    s = formReducer(s, { type: 'move', by: -9, count: 3 });
    expect(s.cursor).toBe(0);
    expect(formReducer(s, { type: 'attempt' }).hasAttempted).toBe(true);
  });

  it('cycles choices both ways, wrapping round', () => {
    expect(cycleOption(['', 'uni', 'bi'], '', 1)).toBe('uni');
    expect(cycleOption(['', 'uni', 'bi'], 'bi', 1)).toBe('');
    expect(cycleOption(['', 'uni', 'bi'], '', -1)).toBe('bi');
    expect(cycleOption(['a', 'b'], 'unknown', 1)).toBe('a');
  });
});
