import { useCallback, useRef, useState } from 'react';

/*
 * Keys can arrive in bursts (a paste, a fast typist, tmux send-keys): several handlers run before
 * React renders again, so state read from the last render is stale. These hooks keep the latest
 * state in a ref that every update writes at once, and hand out a getter for key handlers.
 */

export function useSyncReducer<S, A>(reducer: (state: S, action: A) => S, init: () => S): [S, (action: A) => void, () => S] {
  const ref = useRef<{ current: S } | null>(null);
  ref.current ??= { current: init() };
  const [state, setState] = useState(ref.current.current);
  const dispatch = useCallback(
    (action: A) => {
      const box = ref.current!;
      box.current = reducer(box.current, action);
      setState(box.current);
    },
    [reducer],
  );
  const get = useCallback(() => ref.current!.current, []);
  return [state, dispatch, get];
}

type Update<S> = S | ((state: S) => S);

export function useSyncState<S>(initial: S): [S, (update: Update<S>) => void, () => S] {
  return useSyncReducer<S, Update<S>>(applyUpdate as (s: S, u: Update<S>) => S, () => initial);
}

function applyUpdate<S>(state: S, update: Update<S>): S {
  return typeof update === 'function' ? (update as (s: S) => S)(state) : update;
}
