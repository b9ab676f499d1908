/** Version of every --json document this program writes; bump it when a field changes meaning. */
export const JSON_OUTPUT_VERSION = 1;

export interface Output {
  readonly json: boolean;
  /** Data to stdout: a JSON document or the human text. */
  write(text: string): void;
  /** Diagnostics to stderr, never mixed into JSON. */
  note(text: string): void;
}

export function makeOutput(json: boolean): Output {
  return {
    json,
    write: (text) => process.stdout.write(text.endsWith('\n') ? text : text + '\n'),
    note: (text) => process.stderr.write(text.endsWith('\n') ? text : text + '\n'),
  };
}

export function jsonDocument(command: string, data: object): string {
  return JSON.stringify({ format: 'headroom-output', version: JSON_OUTPUT_VERSION, command, ...data }, null, 2);
}

export { safeText } from '../parts/safe-text.js';
