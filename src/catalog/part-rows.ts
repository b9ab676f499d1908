import { PART_FIELDS, type Part } from '../parts/index.js';

/** Database column values of a part: the export columns, with point lists as JSON text. */
export type PartRow = Record<string, string | number | null>;

export const ROW_COLUMNS: readonly string[] = PART_FIELDS.map((f) => f.column);

export function partToRow(part: Part): PartRow {
  const record = part as unknown as Record<string, unknown>;
  const row: PartRow = {};
  for (const field of PART_FIELDS) {
    const value = record[field.key];
    if (field.type === 'vf-points' || field.type === 'ir-points') row[field.column] = JSON.stringify(value ?? []);
    else if (value === undefined || value === null) row[field.column] = field.key === 'description' ? '' : null;
    else row[field.column] = value as string | number;
  }
  return row;
}

/** Rows were validated on the way in, so they map back without a second validation. */
export function rowToPart(row: PartRow): Part {
  const part: Record<string, unknown> = {};
  for (const field of PART_FIELDS) {
    const value = row[field.column];
    if (field.type === 'vf-points' || field.type === 'ir-points') part[field.key] = JSON.parse(String(value ?? '[]'));
    else if (value !== null && value !== undefined) part[field.key] = value;
  }
  return part as unknown as Part;
}

/**
 * The same from a row read as an array of ROW_COLUMNS' values (a raw statement): the searches
 * read a hundred parts cold, and arrays are quicker to build and read than 45-key row objects.
 */
export function valuesToPart(values: readonly (string | number | null)[]): Part {
  const part: Record<string, unknown> = {};
  for (let i = 0; i < PART_FIELDS.length; i++) {
    const field = PART_FIELDS[i]!;
    const value = values[i];
    if (field.type === 'vf-points' || field.type === 'ir-points') part[field.key] = JSON.parse(String(value ?? '[]'));
    else if (value !== null && value !== undefined) part[field.key] = value;
  }
  return part as unknown as Part;
}

/** Canonical order of every listing and export: manufacturer, then part number, by code point. */
export function comparePartIdentity(a: Part, b: Part): number {
  return cmp(a.manufacturer, b.manufacturer) || cmp(a.partNumber, b.partNumber);
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
