import { createContext, useContext } from 'react';
import { themeFor, type Theme } from '../theme.js';

export const ThemeContext = createContext<Theme>(themeFor());

export function useTheme(): Theme {
  return useContext(ThemeContext);
}
