import type { Tone } from './text/styled.js';

/** Semantic colour tokens; components never name a colour directly. NO_COLOR turns them all off. */
export interface Theme {
  readonly accent?: string;
  readonly muted?: string;
  readonly good?: string;
  readonly warn?: string;
  readonly bad?: string;
  /** The safety caution of hazardous positions. */
  readonly safety?: string;
  readonly selection?: string;
}

const COLOURS: Theme = {
  accent: 'cyan',
  muted: 'gray',
  good: 'green',
  warn: 'yellow',
  bad: 'red',
  safety: 'redBright',
  selection: 'blue',
};

export function themeFor(env: NodeJS.ProcessEnv = process.env): Theme {
  return env.NO_COLOR !== undefined && env.NO_COLOR !== '' ? {} : COLOURS;
}

/** The colour of a tone, or undefined (plain text) when the theme has none. */
export function colourOf(theme: Theme, tone: Tone | undefined): string | undefined {
  return tone ? theme[tone] : undefined;
}
