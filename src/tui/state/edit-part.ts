import type { CellIssue } from '../../catalog/part-cells.js';
import { PART_FIELDS, safeText, type Part, type PartField } from '../../parts/index.js';
import { partSchema } from '../../parts/part-schema.js';
import { formatQuantity, parseQuantity, type QuantityKind } from '../../units/index.js';
import { checkPart, partRows, type PartCheck } from './part-form.js';

/** Read back within this fraction, a value is the one stored (prefix scaling leaves float noise). */
const SAME_VALUE = 1e-12;

/** The shortest engineering text that reads back as the value: "3 A", "8.3 ms", "150 °C", "5 %". */
export function editableQuantity(value: number, kind: QuantityKind): string {
  for (let digits = 1; digits <= 17; digits++) {
    const text = formatQuantity(value, kind, { digits });
    const back = parseQuantity(text, kind, kind === 'temperature' ? { bareUnit: '°C' } : undefined);
    if (back.ok && Math.abs(back.value - value) <= SAME_VALUE * Math.max(Math.abs(value), 1e-30)) return text;
  }
  return formatQuantity(value, kind, { digits: 17 });
}

function fieldValueText(part: Part, field: PartField): string {
  const value = (part as unknown as Record<string, unknown>)[field.key];
  if (value === undefined || value === null) return '';
  if (field.type === 'vf-points') {
    return (value as Part['vfPoints']).map((p) => `${editableQuantity(p.vfV, 'voltage')} @ ${editableQuantity(p.ifA, 'current')} @ ${editableQuantity(p.tjK, 'temperature')}`).join('; ');
  }
  if (field.type === 'ir-points') {
    return (value as Part['irPoints']).map((p) => `${editableQuantity(p.irA, 'current')} @ ${editableQuantity(p.vrV, 'voltage')} @ ${editableQuantity(p.tjK, 'temperature')}`).join('; ');
  }
  if (typeof value === 'number') return field.quantity ? editableQuantity(value, field.quantity) : String(value);
  // Catalog text is untrusted: the form shows (and, once edited, stores) it without control characters.
  return safeText(String(value));
}

/** The form's starting text for every field of a stored part, in engineering notation with units. */
export function editValues(part: Part): Record<string, string> {
  const values: Record<string, string> = {};
  for (const field of PART_FIELDS) {
    const text = fieldValueText(part, field);
    if (text !== '') values[field.column] = text;
  }
  return values;
}

const textOf = (values: Readonly<Record<string, string>>, column: string) => (values[column] ?? '').trim();

/** Columns offered for the current kind whose text differs from what the form started with. */
export function changedColumns(initial: Readonly<Record<string, string>>, values: Readonly<Record<string, string>>): string[] {
  return partRows(values.kind ?? '')
    .map((r) => r.field.column)
    .filter((c) => textOf(initial, c) !== textOf(values, c));
}

/**
 * Decodes the edited form. Fields left as they were keep the stored value exactly, so saving one
 * changed rating never rounds the others through their text.
 */
export function checkEdit(values: Readonly<Record<string, string>>, initial: Readonly<Record<string, string>>, original: Part): PartCheck {
  const check = checkPart(values);
  if (!check.part) return check;
  const changed = new Set(changedColumns(initial, values));
  const merged: Record<string, unknown> = { ...check.part };
  const stored = original as unknown as Record<string, unknown>;
  for (const row of partRows(values.kind ?? '')) {
    if (changed.has(row.field.column)) continue;
    if (stored[row.field.key] === undefined) delete merged[row.field.key];
    else merged[row.field.key] = stored[row.field.key];
  }
  const parsed = partSchema.safeParse(merged);
  return parsed.success ? { issues: check.issues, part: parsed.data } : check;
}

/** True when the maker or part number no longer names the original (letter case aside). */
export function isRenamed(values: Readonly<Record<string, string>>, original: Pick<Part, 'manufacturer' | 'partNumber'>): boolean {
  return textOf(values, 'manufacturer').toLowerCase() !== original.manufacturer.toLowerCase() || textOf(values, 'part_number').toLowerCase() !== original.partNumber.toLowerCase();
}

/**
 * A maker and part number that already name a part (other than the one being edited) is an error
 * beside the part number, shown as it is typed; the save refuses it again in its transaction.
 */
export function withIdentityCheck(check: PartCheck, values: Readonly<Record<string, string>>, isTaken: (reference: string) => boolean, editing?: Pick<Part, 'manufacturer' | 'partNumber'>): PartCheck {
  const maker = textOf(values, 'manufacturer');
  const number = textOf(values, 'part_number');
  if (!maker || !number || check.issues.has('part_number')) return check;
  if (editing && !isRenamed(values, editing)) return check;
  if (!isTaken(`${maker}:${number}`)) return check;
  const issue: CellIssue = {
    column: 'part_number',
    value: number,
    message: `already in the catalog: ${safeText(maker)}:${safeText(number)} is another part`,
    expected: editing
      ? `a maker and part number no other part has, or the part's own (${safeText(editing.manufacturer)}:${safeText(editing.partNumber)})`
      : 'a maker and part number not yet in the catalog; to change a stored part, open it and press e',
  };
  return { issues: new Map([...check.issues, ['part_number', issue]]), part: null };
}
