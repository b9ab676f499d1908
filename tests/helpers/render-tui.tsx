import { EventEmitter } from 'node:events';
import { render } from 'ink';
import type { ReactElement } from 'react';
import { ThemeContext } from '../../src/tui/hooks/use-theme.js';
import type { Theme } from '../../src/tui/theme.js';

/** A terminal of a fixed size that keeps every frame Ink writes. */
class FakeStdout extends EventEmitter {
  readonly frames: string[] = [];
  isTTY = true;
  constructor(
    readonly columns: number,
    readonly rows: number,
  ) {
    super();
  }
  write = (frame: string) => {
    this.frames.push(frame);
    return true;
  };
  lastFrame = () => this.frames[this.frames.length - 1];
}

class FakeStdin extends EventEmitter {
  isTTY = true;
  private data: string | null = null;
  write = (data: string) => {
    this.data = data;
    this.emit('readable');
    this.emit('data', data);
  };
  read = () => {
    const { data } = this;
    this.data = null;
    return data;
  };
  setEncoding() {}
  setRawMode() {}
  resume() {}
  pause() {}
  ref() {}
  unref() {}
}

export interface RenderOptions {
  /** Terminal columns; every test states the width it checks. @default 80 */
  readonly columns?: number;
  /** @default 24 */
  readonly rows?: number;
  /** @default no colour (NO_COLOR) */
  readonly theme?: Theme;
}

/**
 * Renders into a terminal of a fixed size (80×24 unless stated), so layouts never depend on
 * the test library's default width. Without a theme the output has no colour.
 */
export function renderTui(element: ReactElement, { columns = 80, rows = 24, theme = {} }: RenderOptions = {}) {
  const stdout = new FakeStdout(columns, rows);
  const stdin = new FakeStdin();
  const instance = render(<ThemeContext.Provider value={theme}>{element}</ThemeContext.Provider>, {
    stdout: stdout as unknown as NodeJS.WriteStream,
    stderr: new FakeStdout(columns, rows) as unknown as NodeJS.WriteStream,
    stdin: stdin as unknown as NodeJS.ReadStream,
    debug: true,
    exitOnCtrlC: false,
    patchConsole: false,
  });
  return {
    stdin,
    stdout,
    lastFrame: () => stdout.lastFrame() ?? '',
    unmount: () => instance.unmount(),
    waitUntilExit: () => instance.waitUntilExit(),
  };
}

export const KEY = {
  up: '\u001b[A',
  down: '\u001b[B',
  right: '\u001b[C',
  left: '\u001b[D',
  pageDown: '\u001b[6~',
  pageUp: '\u001b[5~',
  enter: '\r',
  escape: '\u001b',
  backspace: '\u007f',
  tab: '\t',
  shiftTab: '\u001b[Z',
  ctrlU: '\u0015',
  ctrlC: '\u0003',
} as const;

/** Lets Ink process input and re-render. */
export const tick = (ms = 30) => new Promise((resolve) => setTimeout(resolve, ms));

/** Types keys one at a time, each followed by a re-render, as a person would. */
export async function press(stdin: { write(data: string): void }, ...keys: string[]): Promise<void> {
  for (const key of keys) {
    stdin.write(key);
    await tick();
  }
}

/** Types text one character at a time. */
export async function type(stdin: { write(data: string): void }, text: string): Promise<void> {
  await press(stdin, ...[...text]);
}

/** Waits until the frame contains the text (a slow step such as ranking), or fails after `ms`. */
export async function waitFor(lastFrame: () => string, text: string, ms = 5000): Promise<void> {
  const until = Date.now() + ms;
  while (!lastFrame().includes(text)) {
    if (Date.now() > until) throw new Error(`the frame never showed "${text}"; last frame:\n${lastFrame()}`);
    await tick(20);
  }
}

/** Widest line of a frame in columns (ASCII and the box-drawing symbols used are one column each). */
export const widestLine = (frame: string) => Math.max(...frame.split('\n').map((l) => [...l].length));

/** Presses a key until the frame shows the text (scrolling to it), at most `times` times. */
export async function pressUntil(stdin: { write(data: string): void }, lastFrame: () => string, key: string, text: string, times = 10): Promise<void> {
  for (let i = 0; i < times && !lastFrame().includes(text); i++) await press(stdin, key);
  if (!lastFrame().includes(text)) throw new Error(`"${text}" never came into view; last frame:\n${lastFrame()}`);
}
