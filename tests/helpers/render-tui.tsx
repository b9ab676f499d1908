import { render } from 'ink-testing-library';
import type { ReactElement } from 'react';
import { ThemeContext } from '../../src/tui/hooks/use-theme.js';

/** Renders without colour; screens take their width as a prop, fixed by each test. */
export function renderTui(element: ReactElement) {
  return render(<ThemeContext.Provider value={{}}>{element}</ThemeContext.Provider>);
}

export const KEY = { up: '\u001b[A', down: '\u001b[B', enter: '\r', escape: '\u001b', backspace: '\u007f' } as const;

/** Lets Ink process input and re-render. */
export const tick = () => new Promise((resolve) => setTimeout(resolve, 30));
