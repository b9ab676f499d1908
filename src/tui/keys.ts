import type { Key } from 'ink';

/** Every key binding of the interface, by command name; the help line is built from this table. */
export const KEYS = {
  quit: { label: 'Ctrl+C', help: 'quit' },
  up: { label: '↑', help: 'previous' },
  down: { label: '↓', help: 'next' },
  move: { label: '↑/↓', help: 'move' },
  pageUp: { label: 'PgUp', help: 'page up' },
  pageDown: { label: 'PgDn', help: 'page down' },
  open: { label: 'Enter', help: 'open' },
  back: { label: 'Esc', help: 'back' },
  openDemo: { label: 'd', help: 'open the demo catalog' },
} as const;

export type KeyCommand = keyof typeof KEYS;

/** Maps one key press to a command name, or undefined for text input. */
export function commandFor(input: string, key: Key): KeyCommand | undefined {
  if (key.ctrl && input === 'c') return 'quit';
  if (key.upArrow) return 'up';
  if (key.downArrow) return 'down';
  if (key.pageUp) return 'pageUp';
  if (key.pageDown) return 'pageDown';
  if (key.return) return 'open';
  if (key.escape) return 'back';
  return undefined;
}

export function helpLine(commands: readonly KeyCommand[]): string {
  return commands.map((c) => `${KEYS[c].label} ${KEYS[c].help}`).join('  ·  ');
}
