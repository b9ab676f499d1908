import { formatQuantity } from '../units/index.js';
import { PART_FIELDS, type PartField } from './part-fields.js';
import type { Part } from './part-schema.js';

export interface FieldDifference {
  readonly column: string;
  readonly label: string;
  /** Each part's value as text, in the order the parts were given; '—' where not given. */
  readonly values: readonly string[];
}

// Fields that name or describe a part rather than rate it: different by nature.
const NOT_COMPARED = new Set(['manufacturer', 'partNumber', 'description', 'notes', 'datasheetUrl', 'secondSourceGroup']);

/** Shows one field of a part the way people read it: engineering units, points joined. */
export function fieldText(part: Part, field: PartField): string {
  const value = (part as unknown as Record<string, unknown>)[field.key];
  if (value === undefined || value === null) return '—';
  if (field.type === 'vf-points') {
    const points = value as Part['vfPoints'];
    if (points.length === 0) return '—';
    return points.map((p) => `${formatQuantity(p.vfV, 'voltage')} @ ${formatQuantity(p.ifA, 'current')}, ${formatQuantity(p.tjK, 'temperature')}`).join('; ');
  }
  if (field.type === 'ir-points') {
    const points = value as Part['irPoints'];
    if (points.length === 0) return '—';
    return points.map((p) => `${formatQuantity(p.irA, 'current')} @ ${formatQuantity(p.vrV, 'voltage')}, ${formatQuantity(p.tjK, 'temperature')}`).join('; ');
  }
  if (typeof value === 'number' && field.quantity) return formatQuantity(value, field.quantity);
  return String(value);
}

/** The fields on which the given parts do not all agree, in catalog column order. */
export function partDifferences(parts: readonly Part[]): FieldDifference[] {
  const out: FieldDifference[] = [];
  for (const field of PART_FIELDS) {
    if (NOT_COMPARED.has(field.key)) continue;
    const raw = parts.map((p) => JSON.stringify((p as unknown as Record<string, unknown>)[field.key] ?? null));
    if (raw.every((r) => r === raw[0])) continue;
    out.push({ column: field.column, label: field.label, values: parts.map((p) => fieldText(p, field)) });
  }
  return out;
}
