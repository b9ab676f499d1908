import { describe, expect, it } from 'vitest';
import { completePath } from '../../../src/tui/state/path-completion.js';

describe('path completion', () => {
  it('completes a single match, or the shared prefix of several', () => {
    expect(completePath('des', ['designs/'])).toBe('designs/');
    expect(completePath('fc', ['fc-l40.yaml', 'fc-m24.yaml'])).toBe('fc-');
    expect(completePath('fc-', ['fc-l40.yaml', 'fc-m24.yaml'])).toBe('fc-');
    expect(completePath('x', [])).toBe('x');
  });
});
