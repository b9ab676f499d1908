import type { Key } from 'ink';

/**
 * Every key binding of the interface, by command name. Footers and the help overlay are built
 * from this table; screens ask `commandFor` and never test raw keys themselves.
 * `isTextSafe` bindings also work while typing in a field (no printable character).
 */
interface Binding {
  readonly label: string;
  readonly help: string;
  readonly isTextSafe: boolean;
  readonly matches: (input: string, key: Key) => boolean;
}

const plainKey = (key: Key) => !key.ctrl && !key.meta;
const letter = (ch: string) => (input: string, key: Key) => input === ch && plainKey(key);

export const KEYS = {
  forceQuit: { label: 'Ctrl+C', help: 'quit at once, from anywhere', isTextSafe: true, matches: (i, k) => k.ctrl && i === 'c' },
  quit: { label: 'q', help: 'quit', isTextSafe: false, matches: letter('q') },
  help: { label: '?', help: 'keys: show or hide this list', isTextSafe: false, matches: letter('?') },
  back: { label: 'Esc', help: 'back', isTextSafe: true, matches: (_i, k) => k.escape },
  up: { label: '↑', help: 'previous', isTextSafe: true, matches: (_i, k) => k.upArrow },
  down: { label: '↓', help: 'next', isTextSafe: true, matches: (_i, k) => k.downArrow },
  pageUp: { label: 'PgUp', help: 'page up', isTextSafe: true, matches: (_i, k) => k.pageUp },
  pageDown: { label: 'PgDn', help: 'page down', isTextSafe: true, matches: (_i, k) => k.pageDown },
  home: { label: 'Home', help: 'first', isTextSafe: true, matches: (_i, k) => k.home },
  end: { label: 'End', help: 'last', isTextSafe: true, matches: (_i, k) => k.end },
  nextField: { label: 'Tab', help: 'next field', isTextSafe: true, matches: (_i, k) => k.tab && !k.shift },
  prevField: { label: 'Shift+Tab', help: 'previous field', isTextSafe: true, matches: (_i, k) => k.tab && k.shift },
  cycleNext: { label: '→', help: 'next choice', isTextSafe: true, matches: (_i, k) => k.rightArrow },
  cyclePrev: { label: '←', help: 'previous choice', isTextSafe: true, matches: (_i, k) => k.leftArrow },
  erase: { label: 'Backspace', help: 'erase', isTextSafe: true, matches: (_i, k) => k.backspace || k.delete },
  clearField: { label: 'Ctrl+U', help: 'clear: empty the field', isTextSafe: true, matches: (i, k) => k.ctrl && i === 'u' },
  select: { label: 'Enter', help: 'open', isTextSafe: true, matches: (_i, k) => k.return },
  search: { label: '/', help: 'search: narrow the list as you type', isTextSafe: false, matches: letter('/') },
  sort: { label: 's', help: 'sort: by score, price or tightest margin', isTextSafe: false, matches: letter('s') },
  filter: { label: 'f', help: 'filter: all, hide fails, hide fails and unknowns', isTextSafe: false, matches: letter('f') },
  assign: { label: 'a', help: 'assign: write the part into the design file', isTextSafe: false, matches: letter('a') },
  candidates: { label: 'c', help: 'candidates: rank parts for the position', isTextSafe: false, matches: letter('c') },
  write: { label: 'w', help: 'save: the position into a design file', isTextSafe: false, matches: letter('w') },
  edit: { label: 'e', help: 'edit: back to the conditions', isTextSafe: false, matches: letter('e') },
  approval: { label: 'p', help: 'approval: change the state, see the trail', isTextSafe: false, matches: letter('p') },
  addPart: { label: 'n', help: 'add part: type a new part into the catalog', isTextSafe: false, matches: letter('n') },
  substitute: { label: 'r', help: 'replace: is another part a safe drop-in for this one?', isTextSafe: false, matches: letter('r') },
  chooseOriginal: { label: 'o', help: 'original: choose the part to be replaced', isTextSafe: false, matches: letter('o') },
  exchange: { label: 'x', help: 'exchange: original and alternate change places', isTextSafe: false, matches: letter('x') },
  openDemo: { label: 'd', help: 'demo: open the demo catalog', isTextSafe: false, matches: letter('d') },
} as const satisfies Record<string, Binding>;

export type KeyCommand = keyof typeof KEYS;

/** A command a screen offers, optionally with its own words for what it does there. */
export type ScreenCommand = KeyCommand | readonly [KeyCommand, string];

const nameOf = (c: ScreenCommand): KeyCommand => (typeof c === 'string' ? c : c[0]);

/** Commands every screen answers, handled by useKeys. */
export const GLOBAL_COMMANDS: readonly KeyCommand[] = ['forceQuit', 'help', 'quit'];

/**
 * Maps one key press to a command among those offered, or undefined (then printable input is
 * text). While typing, letter commands are off so "q" and "?" can be typed.
 */
export function commandFor(input: string, key: Key, offered: readonly ScreenCommand[], isTyping = false): KeyCommand | undefined {
  for (const name of [...GLOBAL_COMMANDS, ...offered.map(nameOf)]) {
    const binding: Binding = KEYS[name];
    if (isTyping && !binding.isTextSafe) continue;
    if (binding.matches(input, key)) return name;
  }
  return undefined;
}

export interface KeyHelp {
  readonly label: string;
  readonly help: string;
}

/** Label and words of each command, as the footer and the help overlay show them. */
export function describeCommands(commands: readonly ScreenCommand[]): KeyHelp[] {
  return commands.map((c) => {
    const name = nameOf(c);
    return { label: KEYS[name].label, help: typeof c === 'string' ? KEYS[name].help : c[1] };
  });
}

const PAIRS: readonly [KeyCommand, KeyCommand, string, string][] = [
  ['up', 'down', '↑/↓', 'move'],
  ['pageUp', 'pageDown', 'PgUp/PgDn', 'page'],
  ['cyclePrev', 'cycleNext', '←/→', 'choose'],
];

/** Footer order: the main action, then letter commands, then Esc, then the movement keys. */
function footerRank(name: KeyCommand): number {
  if (name === 'select') return 0;
  const binding: Binding = KEYS[name];
  if (!binding.isTextSafe) return 1;
  if (name === 'back') return 2;
  return 3;
}

/**
 * "Enter open · / search · Esc back · ↑/↓ move …": as many as fit in `width`, always ending with
 * the help key. Pairs such as ↑ and ↓ share one entry.
 */
export function helpLine(commands: readonly ScreenCommand[], width = Number.POSITIVE_INFINITY): string {
  const names = commands.map(nameOf);
  const entries: { label: string; short: string; rank: number; order: number }[] = [];
  describeCommands(commands).forEach(({ label, help }, i) => {
    const name = names[i]!;
    const pair = PAIRS.find(([a, b]) => a === name || b === name);
    if (pair) {
      if (entries.some((e) => e.label === pair[2])) return;
      if (names.includes(pair[0]) && names.includes(pair[1])) {
        entries.push({ label: pair[2], short: pair[3], rank: 3, order: i });
        return;
      }
    }
    if (name === 'help' || name === 'quit' || name === 'forceQuit') return;
    entries.push({ label, short: help.split(/[:(,]/)[0]!.trim(), rank: footerRank(name), order: i });
  });
  entries.sort((a, b) => a.rank - b.rank || a.order - b.order);
  const tail = `${KEYS.help.label} keys`;
  let line = '';
  for (const { label, short } of entries) {
    const next = `${line}${line ? ' · ' : ''}${label} ${short}`;
    if (next.length + tail.length + 3 > width) break;
    line = next;
  }
  return line ? `${line} · ${tail}` : tail;
}

/** Printable text typed into a field: control and escape sequences removed (pastes arrive whole). */
export function typedText(input: string, key: Key): string {
  if (key.ctrl || key.meta) return '';
  // eslint-disable-next-line no-control-regex
  return input.replace(/\u001b\[[0-?]*[ -/]*[@-~]/g, '').replace(/[\u0000-\u001f\u007f-\u009f]/g, '');
}

const NO_KEY: Key = {
  upArrow: false, downArrow: false, leftArrow: false, rightArrow: false, pageDown: false, pageUp: false, home: false, end: false,
  return: false, escape: false, ctrl: false, shift: false, tab: false, backspace: false, delete: false, meta: false,
  super: false, hyper: false, capsLock: false, numLock: false,
};

/**
 * Ink hands a burst of characters over as one piece of text (fast typing, a paste, tmux
 * send-keys). Each character is a key the user pressed: a letter may be a command on one screen
 * and text on the next, and a carriage return is Enter. So a burst is split into single keys.
 */
export function splitBurst(input: string, key: Key): { input: string; key: Key }[] {
  if (input.length < 2 || key.ctrl || key.meta || key.escape) return [{ input, key }];
  return [...input.replace(/\r\n/g, '\r')].map(burstKey);
}

/** One character of a burst as the key that sends it: Ctrl+U inside a burst still clears a field. */
function burstKey(ch: string): { input: string; key: Key } {
  const code = ch.codePointAt(0)!;
  if (ch === '\r' || ch === '\n') return { input: '\r', key: { ...NO_KEY, return: true } };
  if (ch === '\t') return { input: '\t', key: { ...NO_KEY, tab: true } };
  if (ch === '\u007f' || ch === '\b') return { input: '', key: { ...NO_KEY, backspace: true } };
  if (code >= 1 && code <= 26) return { input: String.fromCharCode(code + 96), key: { ...NO_KEY, ctrl: true } };
  return { input: ch, key: { ...NO_KEY } };
}
