/**
 * State of any form of the interface (position conditions, a new part, an approval change):
 * text per field, the focused row, and whether the user has tried to submit. Pure, so the
 * editing rules are tested without rendering.
 */
export interface FormState {
  readonly values: Readonly<Record<string, string>>;
  readonly cursor: number;
  /** After a first attempt to submit, missing required fields are shown as errors too. */
  readonly hasAttempted: boolean;
}

export type FormAction =
  | { type: 'type'; name: string; text: string }
  | { type: 'erase'; name: string }
  | { type: 'clear'; name: string }
  | { type: 'set'; name: string; value: string }
  | { type: 'move'; by: number; count: number }
  | { type: 'focus'; index: number }
  | { type: 'attempt' };

export function initialForm(values: Readonly<Record<string, string>> = {}, cursor = 0): FormState {
  return { values, cursor, hasAttempted: false };
}

export function formReducer(state: FormState, action: FormAction): FormState {
  const put = (name: string, value: string) => ({ ...state, values: { ...state.values, [name]: value } });
  switch (action.type) {
    case 'type':
      return action.text ? put(action.name, (state.values[action.name] ?? '') + action.text) : state;
    case 'erase':
      return put(action.name, [...(state.values[action.name] ?? '')].slice(0, -1).join(''));
    case 'clear':
      return put(action.name, '');
    case 'set':
      return put(action.name, action.value);
    case 'move': {
      if (action.count <= 0) return state;
      return { ...state, cursor: Math.min(action.count - 1, Math.max(0, state.cursor + action.by)) };
    }
    case 'focus':
      return { ...state, cursor: Math.max(0, action.index) };
    case 'attempt':
      return { ...state, hasAttempted: true };
  }
}

/** The option after (or before) `current` in a cycle of choices, wrapping round. */
export function cycleOption(options: readonly string[], current: string, by: 1 | -1): string {
  if (options.length === 0) return current;
  const i = options.indexOf(current);
  const next = i === -1 ? (by === 1 ? 0 : options.length - 1) : (i + by + options.length) % options.length;
  return options[next]!;
}
