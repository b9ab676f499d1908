import { useApp, useInput, type Key } from 'ink';
import { useMemo, useRef } from 'react';
import { splitBurst } from '../keys.js';
import type { KeyRouter, RoutedHandler } from './use-keys.js';

/** Keys kept for a screen that is not drawn yet; more than this is not typing. */
const MAX_WAITING = 200;

/**
 * One input listener: each key to the handler of the screen on top. While that screen is not
 * drawn yet (keys sent in a burst across a change of screen), keys wait, and are handed on in
 * order as screens register, each to whichever screen is on top by then.
 */
export function useKeyRouter(topId: () => number): KeyRouter {
  const { exit } = useApp();
  const handlers = useRef(new Map<number, RoutedHandler>());
  const waiting = useRef<{ input: string; key: Key }[]>([]);
  const drain = () => {
    for (;;) {
      const handler = handlers.current.get(topId());
      const next = waiting.current[0];
      if (!handler || !next) return;
      waiting.current.shift();
      handler(next.input, next.key);
    }
  };
  useInput((input, key) => {
    if (key.ctrl && input === 'c' && !handlers.current.get(topId())) return exit();
    for (const piece of splitBurst(input, key)) if (waiting.current.length < MAX_WAITING) waiting.current.push(piece);
    drain();
  });
  return useMemo<KeyRouter>(
    () => ({
      register: (id, handler) => {
        handlers.current.set(id, handler);
        drain();
      },
      unregister: (id, handler) => {
        if (handlers.current.get(id) === handler) handlers.current.delete(id);
      },
    }),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [],
  );
}
