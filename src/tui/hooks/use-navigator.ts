import { createContext, useContext } from 'react';
import type { Route, RouteName } from '../state/navigation.js';

/** Moves between screens; the state lives in App (state/navigation.ts). */
export interface Navigator {
  push(route: Route): void;
  back(): void;
  home(): void;
  /** Back down to the nearest screen of this name. */
  backTo(name: RouteName): void;
}

export const NavigatorContext = createContext<Navigator>({ push: () => undefined, back: () => undefined, home: () => undefined, backTo: () => undefined });

export function useNavigator(): Navigator {
  return useContext(NavigatorContext);
}
