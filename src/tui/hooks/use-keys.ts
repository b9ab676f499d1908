import { useApp, useInput, type Key } from 'ink';
import { createContext, useCallback, useContext, useLayoutEffect, useRef } from 'react';
import { commandFor, type KeyCommand, type ScreenCommand } from '../keys.js';

/** Whether the key overlay is open; one for the whole interface. */
export interface HelpState {
  readonly isOpen: boolean;
  /** The latest value, for key handlers that run before the next render. */
  isOpenNow(): boolean;
  setOpen(isOpen: boolean): void;
}

export const HelpContext = createContext<HelpState>({ isOpen: false, isOpenNow: () => false, setOpen: () => undefined });

export function useHelp(): HelpState {
  return useContext(HelpContext);
}

export interface KeyOptions {
  /** Only the screen on top listens. */
  readonly isActive: boolean;
  /** While typing, printable keys are text and only non-printing commands apply; a function is asked at each key. */
  readonly isTyping?: boolean | (() => boolean);
  readonly commands: readonly ScreenCommand[];
}

export type KeyHandler = (command: KeyCommand | undefined, input: string, key: Key) => void;

/**
 * A screen's keys: Ctrl+C quits anywhere, q quits when not typing, ? opens the key overlay (any
 * key closes it); everything else goes to the screen as a named command, or undefined for text.
 */
/** A screen's key handler as the router calls it. */
export type RoutedHandler = (input: string, key: Key) => void;

/**
 * One listener for the whole interface (App): each key goes to the screen on top. Keys that come
 * before that screen is drawn (a paste, keys sent in a burst across a change of screen) wait for it.
 */
export interface KeyRouter {
  register(screenId: number, handler: RoutedHandler): void;
  unregister(screenId: number, handler: RoutedHandler): void;
}

export const KeyRouterContext = createContext<KeyRouter | null>(null);
/** Which entry of the screen stack a screen is, for the router. */
export const ScreenIdContext = createContext(0);

/**
 * A screen's keys: Ctrl+C quits anywhere, q quits when not typing, ? opens the key overlay (any
 * key closes it); everything else goes to the screen as a named command, or undefined for text.
 * Under App the router delivers keys; a screen rendered alone (tests) listens itself.
 */
export function useKeys(options: KeyOptions, handler: KeyHandler): void {
  const { exit } = useApp();
  const help = useHelp();
  const router = useContext(KeyRouterContext);
  const screenId = useContext(ScreenIdContext);
  // The newest handler and options, set while rendering: a key that arrives right after a frame
  // is drawn still meets the state that frame shows.
  const latest = useRef({ options, handler, help });
  latest.current = { options, handler, help };
  const onInput = useCallback(
    (input: string, key: Key) => {
      const { options: o, handler: h, help: hp } = latest.current;
      const isTyping = typeof o.isTyping === 'function' ? o.isTyping() : (o.isTyping ?? false);
      const command = commandFor(input, key, o.commands, isTyping);
      if (command === 'forceQuit') return exit();
      if (hp.isOpenNow()) return hp.setOpen(false);
      if (command === 'help') return hp.setOpen(true);
      if (command === 'quit') return exit();
      h(command, input, key);
    },
    [exit],
  );
  // A layout effect runs in the same turn as the frame is written: no key can slip in between.
  useLayoutEffect(() => {
    if (!router) return;
    router.register(screenId, onInput);
    return () => router.unregister(screenId, onInput);
  }, [router, screenId, onInput]);
  useInput(onInput, { isActive: options.isActive && router === null });
}
