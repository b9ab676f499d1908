import type { Part } from '../../parts/index.js';
import type { RankedCandidate } from '../../selection/index.js';
import type { PositionDraft, PositionSession } from './position-draft.js';

/** Where the user is. Each screen of the interface is one route. */
export type Route =
  | { readonly name: 'home' }
  | { readonly name: 'roles' }
  | { readonly name: 'form'; readonly draft: PositionDraft }
  | { readonly name: 'open-design' }
  | { readonly name: 'position'; readonly session: PositionSession }
  | { readonly name: 'candidates'; readonly session: PositionSession }
  | { readonly name: 'candidate'; readonly session: PositionSession; readonly candidate: RankedCandidate }
  /** Write into a design file: the part into an existing position, or a new position (part optional). */
  | { readonly name: 'assign'; readonly session: PositionSession; readonly part: Part | null }
  | { readonly name: 'browse' }
  | { readonly name: 'part'; readonly part: Part }
  | { readonly name: 'approval'; readonly part: Part }
  | { readonly name: 'add-part' }
  | { readonly name: 'edit-part'; readonly part: Part }
  /**
   * Is the alternate a safe drop-in for the original? Either may still be unchosen (the screen
   * offers a list); with a solved position, both are also judged against its limits.
   */
  | { readonly name: 'substitute'; readonly original: Part | null; readonly alternate: Part | null; readonly session?: PositionSession };

export type RouteName = Route['name'];

export interface NavEntry {
  /** Stable key: screens below the top stay mounted (hidden) and keep their state. */
  readonly id: number;
  readonly route: Route;
}

export interface NavState {
  readonly stack: readonly NavEntry[];
  readonly nextId: number;
}

export type NavAction =
  | { type: 'push'; route: Route }
  | { type: 'pop' }
  /** Back to the first screen, dropping everything above it. */
  | { type: 'home' }
  /** Back down to the nearest screen of this name, if there is one below. */
  | { type: 'popTo'; name: RouteName };

export function initialNav(route: Route = { name: 'home' }): NavState {
  return { stack: [{ id: 0, route }], nextId: 1 };
}

export function navReducer(state: NavState, action: NavAction): NavState {
  switch (action.type) {
    case 'push':
      return { stack: [...state.stack, { id: state.nextId, route: action.route }], nextId: state.nextId + 1 };
    case 'pop':
      return state.stack.length > 1 ? { ...state, stack: state.stack.slice(0, -1) } : state;
    case 'home':
      return { ...state, stack: state.stack.slice(0, 1) };
    case 'popTo': {
      const below = state.stack.slice(0, -1);
      const i = below.map((e) => e.route.name).lastIndexOf(action.name);
      return i === -1 ? state : { ...state, stack: state.stack.slice(0, i + 1) };
    }
  }
}

export function currentRoute(state: NavState): Route {
  return state.stack[state.stack.length - 1]!.route;
}
