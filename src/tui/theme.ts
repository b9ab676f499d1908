/** Semantic colour tokens; components never name a colour directly. NO_COLOR turns them all off. */
export interface Theme {
  readonly accent?: string;
  readonly muted?: string;
  readonly good?: string;
  readonly warn?: string;
  readonly bad?: string;
  readonly selection?: string;
}

const COLOURS: Theme = {
  accent: 'cyan',
  muted: 'gray',
  good: 'green',
  warn: 'yellow',
  bad: 'red',
  selection: 'blue',
};

export function themeFor(env: NodeJS.ProcessEnv = process.env): Theme {
  return env.NO_COLOR !== undefined && env.NO_COLOR !== '' ? {} : COLOURS;
}
