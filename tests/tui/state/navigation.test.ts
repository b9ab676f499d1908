import { describe, expect, it } from 'vitest';
import { currentRoute, initialNav, navReducer } from '../../../src/tui/state/navigation.js';

describe('navigation', () => {
  it('pushes screens with new ids and pops back to where it was', () => {
    let s = navReducer(initialNav(), { type: 'push', route: { name: 'roles' } });
    s = navReducer(s, { type: 'push', route: { name: 'browse' } });
    expect(s.stack.map((e) => e.id)).toEqual([0, 1, 2]);
    s = navReducer(s, { type: 'pop' });
    expect(currentRoute(s)).toEqual({ name: 'roles' });
  });

  it('never pops the first screen', () => {
    expect(navReducer(initialNav(), { type: 'pop' }).stack).toHaveLength(1);
  });

  it('goes home, or back down to a named screen below', () => {
    let s = initialNav();
    for (const name of ['open-design', 'browse', 'add-part'] as const) s = navReducer(s, { type: 'push', route: { name } });
    expect(currentRoute(navReducer(s, { type: 'popTo', name: 'open-design' }))).toEqual({ name: 'open-design' });
    expect(navReducer(s, { type: 'popTo', name: 'roles' })).toBe(s);
    expect(navReducer(s, { type: 'home' }).stack).toHaveLength(1);
  });
});
