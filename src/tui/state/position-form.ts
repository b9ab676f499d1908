import type { z } from 'zod';
import type { RoleDefinition, RoleInput } from '../../circuits/role.js';
import { describeKind, parseQuantity } from '../../units/index.js';
import type { FormState } from './form-state.js';

/** Key of the policy row in the form's values; no role input starts with "@". */
export const POLICY_ROW = '@policy';

export interface PositionRow {
  readonly name: string;
  readonly label: string;
  /** Choices cycled with ←/→; '' stands for "not given" (the default applies). */
  readonly options?: readonly string[];
  readonly input?: RoleInput;
}

/** The policy row, then one row per role input. */
export function positionRows(role: RoleDefinition, policyIds: readonly string[]): PositionRow[] {
  return [
    { name: POLICY_ROW, label: 'Derating policy', options: policyIds },
    ...role.inputs.map((input) => ({
      name: input.name,
      label: input.label,
      ...(input.choices ? { options: ['', ...input.choices] } : {}),
      input,
    })),
  ];
}

export interface FieldCheck {
  /** Why the typed text is not acceptable, shown beside the field. */
  readonly error?: string;
  /** How bare text was read, e.g. "no unit given; read as 70 °C". */
  readonly note?: string;
  readonly isRequired: boolean;
}

export interface PositionCheck {
  readonly fields: Readonly<Record<string, FieldCheck>>;
  /** Required inputs left empty. */
  readonly missing: readonly string[];
  /** Problems between fields, from the role's schema ("give capacitance or ripple_max"). */
  readonly formIssues: readonly string[];
  /** The conditions validated by the role's schema, ready to solve; null while anything is wrong. */
  readonly conditions: unknown;
}

type AnySchema = z.ZodType;

function fieldSchemas(role: RoleDefinition): Record<string, AnySchema> {
  return (role.schema as unknown as { shape?: Record<string, AnySchema> }).shape ?? {};
}

/** The value handed to the schema: text, or a boolean or number where the field wants one. */
export function conditionValue(text: string, schema: AnySchema | undefined): unknown {
  if (!schema || schema.safeParse(text).success) return text;
  if (text === 'true' || text === 'false') {
    if (schema.safeParse(text === 'true').success) return text === 'true';
  }
  const n = Number(text);
  if (text.trim() !== '' && Number.isFinite(n) && schema.safeParse(n).success) return n;
  return text;
}

/** Every field checked on its own, then the whole set against the role's schema. */
export function checkPosition(role: RoleDefinition, values: Readonly<Record<string, string>>): PositionCheck {
  const schemas = fieldSchemas(role);
  const fields: Record<string, FieldCheck> = {};
  const missing: string[] = [];
  const conditions: Record<string, unknown> = {};
  let hasErrors = false;
  for (const input of role.inputs) {
    const schema = schemas[input.name];
    const isRequired = schema ? !schema.safeParse(undefined).success : false;
    const text = (values[input.name] ?? '').trim();
    if (text === '') {
      if (isRequired) missing.push(input.name);
      fields[input.name] = { isRequired };
      continue;
    }
    let note: string | undefined;
    if (input.quantity) {
      const q = parseQuantity(text, input.quantity);
      if (!q.ok) {
        fields[input.name] = { isRequired, error: q.issue.message };
        hasErrors = true;
        continue;
      }
      note = q.note;
    }
    const value = conditionValue(text, schema);
    const r = schema?.safeParse(value);
    if (r && !r.success) {
      fields[input.name] = { isRequired, error: r.error.issues[0]?.message ?? 'not accepted' };
      hasErrors = true;
      continue;
    }
    fields[input.name] = { isRequired, ...(note ? { note } : {}) };
    conditions[input.name] = value;
  }
  if (hasErrors) return { fields, missing, formIssues: [], conditions: null };
  const whole = role.schema.safeParse(conditions);
  if (whole.success) return { fields, missing, formIssues: [], conditions: missing.length === 0 ? whole.data : null };
  const labelOf = (name: string) => role.inputs.find((i) => i.name === name)?.label ?? name;
  const formIssues = whole.error.issues
    .filter((i) => !missing.includes(String(i.path[0] ?? '')))
    .map((i) => (i.path.length > 0 ? `${labelOf(String(i.path[0]))}: ${i.message}` : i.message));
  return { fields, missing, formIssues: [...new Set(formIssues)], conditions: null };
}

/** What the form shows beside a field: its own error, or "required" once a submit was tried. */
export function shownError(check: PositionCheck, name: string, form: Pick<FormState, 'hasAttempted'>): string | undefined {
  const field = check.fields[name];
  if (field?.error) return field.error;
  if (form.hasAttempted && check.missing.includes(name)) return 'required';
  return undefined;
}

const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/**
 * The conditions as they are written to a design file: only what was typed, as typed, except that
 * a bare number gets the unit it was read in ("70" → "70 °C": in a file a bare 70 would be kelvin).
 */
export function typedConditions(role: RoleDefinition, values: Readonly<Record<string, string>>): Record<string, string | boolean | number> {
  const schemas = fieldSchemas(role);
  const out: Record<string, string | boolean | number> = {};
  for (const input of role.inputs) {
    const text = (values[input.name] ?? '').trim();
    if (text === '') continue;
    if (input.quantity && PLAIN_NUMBER.test(text)) {
      out[input.name] = input.quantity === 'ratio' ? Number(text) : `${text} ${describeKind(input.quantity).unit}`;
      continue;
    }
    const value = conditionValue(text, schemas[input.name]);
    out[input.name] = typeof value === 'boolean' || typeof value === 'number' ? value : text;
  }
  return out;
}
