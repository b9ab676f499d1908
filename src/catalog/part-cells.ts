import { describeKind, parseQuantity, type QuantityKind } from '../units/index.js';
import { PART_FIELDS, fieldByColumn, type IrPoint, type Part, type PartField, type VfPoint } from '../parts/index.js';
import { partSchema } from '../parts/part-schema.js';
import { plainSchemaWording } from '../parts/schema-wording.js';

/** One problem with one cell of outside input; the caller adds the file and line. */
export interface CellIssue {
  readonly column: string;
  readonly value: string;
  readonly message: string;
  readonly expected: string;
}

export type DecodeResult = { ok: true; part: Part } | { ok: false; issues: CellIssue[] };

export interface DecodeOptions {
  /** Unit assumed for a bare temperature: 'K' in files (SI columns), '°C' where people type. */
  readonly bareTemperatureUnit?: 'K' | '°C';
}

const VF_POINT_FORM = '"VF @ IF @ Tj" points separated by ";", e.g. "0.92 V @ 1 A @ 25 °C; 0.80 V @ 1 A @ 125 °C"';
const IR_POINT_FORM = '"IR @ VR @ Tj" points separated by ";", e.g. "5 µA @ 600 V @ 25 °C; 50 µA @ 600 V @ 125 °C"';

function expectedFor(field: PartField): string {
  switch (field.type) {
    case 'enum':
      return `one of ${field.values!.join(', ')}`;
    case 'vf-points':
      return VF_POINT_FORM;
    case 'ir-points':
      return IR_POINT_FORM;
    case 'number':
      return field.quantity ? quantityForm(field.label, field.help, field.quantity) : 'a plain number, e.g. 0.042';
    default:
      return field.help;
  }
}

/** e.g. 'VRRM (repetitive peak reverse voltage): a voltage, bare numbers in V, or with a unit as in "600 V"' */
function quantityForm(label: string, help: string, kind: QuantityKind): string {
  const { noun, unit, examples } = describeKind(kind);
  const bare = kind === 'temperature' ? 'K (in files) or °C (typed)' : kind === 'ratio' ? 'a fraction' : unit;
  return `${label} (${help}): ${noun}, bare numbers in ${bare}, or with a unit as in "${examples[0]}"`;
}

type Decoded = { ok: true; value: unknown } | { ok: false; message: string };

function readNumber(raw: string | number, kind: QuantityKind | undefined, options: DecodeOptions): Decoded {
  if (typeof raw === 'number') {
    return Number.isFinite(raw) ? { ok: true, value: raw } : { ok: false, message: 'not a finite number' };
  }
  if (kind === undefined) {
    const n = Number(raw);
    return raw.trim() !== '' && Number.isFinite(n) ? { ok: true, value: n } : { ok: false, message: 'not a number' };
  }
  const bareUnit = kind === 'temperature' ? (options.bareTemperatureUnit ?? 'K') : undefined;
  const r = parseQuantity(raw, kind, bareUnit ? { bareUnit } : undefined);
  return r.ok ? { ok: true, value: r.value } : { ok: false, message: r.issue.message };
}

function readPoints(
  raw: string,
  kinds: readonly [QuantityKind, QuantityKind, QuantityKind],
  names: readonly [string, string, string],
  options: DecodeOptions,
): Decoded {
  const points: Record<string, number>[] = [];
  const terms = raw.split(';').map((t) => t.trim()).filter((t) => t !== '');
  for (const [i, term] of terms.entries()) {
    const parts = term.split('@').map((t) => t.trim());
    if (parts.length !== 3) {
      return { ok: false, message: `point ${i + 1} "${term}" needs three values joined by "@"` };
    }
    const point: Record<string, number> = {};
    for (let j = 0; j < 3; j++) {
      const r = readNumber(parts[j]!, kinds[j], options);
      if (!r.ok) return { ok: false, message: `point ${i + 1}: ${r.message}` };
      point[names[j]!] = r.value as number;
    }
    points.push(point);
  }
  return { ok: true, value: points };
}

function decodeCell(field: PartField, raw: string | number, options: DecodeOptions): Decoded {
  switch (field.type) {
    case 'number':
      return readNumber(raw, field.quantity, options);
    case 'vf-points':
      return readPoints(String(raw), ['voltage', 'current', 'temperature'], ['vfV', 'ifA', 'tjK'], options);
    case 'ir-points':
      return readPoints(String(raw), ['current', 'voltage', 'temperature'], ['irA', 'vrV', 'tjK'], options);
    default:
      return { ok: true, value: String(raw).trim() };
  }
}

/**
 * Reads one record of cells keyed by column name (CSV row, `add` arguments) into a valid part.
 * Empty cells mean "not given". Every bad cell is reported, not just the first.
 */
export function decodePartCells(
  cells: Readonly<Record<string, string | number | undefined>>,
  options: DecodeOptions = {},
): DecodeResult {
  const issues: CellIssue[] = [];
  const input: Record<string, unknown> = {};
  for (const [column, raw] of Object.entries(cells)) {
    const field = fieldByColumn(column);
    if (!field) {
      issues.push({ column, value: String(raw ?? ''), message: 'unknown column', expected: `one of ${PART_FIELDS.map((f) => f.column).join(', ')}` });
      continue;
    }
    if (raw === undefined || (typeof raw === 'string' && raw.trim() === '')) continue;
    const decoded = decodeCell(field, typeof raw === 'string' ? unNeutralise(raw) : raw, options);
    if (decoded.ok) input[field.key] = decoded.value;
    else issues.push({ column, value: String(raw), message: decoded.message, expected: expectedFor(field) });
  }
  const parsed = partSchema.safeParse(input, { error: plainSchemaWording });
  if (!parsed.success) {
    const seen = new Set(issues.map((i) => i.column));
    for (const zi of parsed.error.issues) {
      const key = String(zi.path[0] ?? 'kind');
      const field = PART_FIELDS.find((f) => f.key === key);
      const column = field?.column ?? key;
      if (seen.has(column)) continue; // the cell's own error already says it
      seen.add(column);
      const raw = cells[column];
      issues.push({
        column,
        value: raw === undefined ? '' : String(raw),
        message: zodMessage(zi, key),
        expected: field ? expectedFor(field) : '',
      });
    }
  }
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, part: parsed.data! };
}

function zodMessage(issue: { code: string; message: string }, key: string): string {
  return key === 'kind' && issue.code === 'invalid_union' ? 'missing or unknown kind' : issue.message;
}

/** Undo the apostrophe our CSV export puts before cells a spreadsheet would run as formulas. */
function unNeutralise(raw: string): string {
  return /^'[=+\-@\t\r]/.test(raw) ? raw.slice(1) : raw;
}

/** Canonical cell text: SI numbers in their shortest exact form, points as "a@b@c;…". */
export function encodePartCells(part: Part): Record<string, string> {
  const out: Record<string, string> = {};
  const record = part as unknown as Record<string, unknown>;
  for (const field of PART_FIELDS) {
    const value = record[field.key];
    out[field.column] = encodeValue(field, value);
  }
  return out;
}

function encodeValue(field: PartField, value: unknown): string {
  if (value === undefined || value === null) return '';
  if (field.type === 'vf-points') {
    return (value as VfPoint[]).map((p) => `${num(p.vfV)}@${num(p.ifA)}@${num(p.tjK)}`).join(';');
  }
  if (field.type === 'ir-points') {
    return (value as IrPoint[]).map((p) => `${num(p.irA)}@${num(p.vrV)}@${num(p.tjK)}`).join(';');
  }
  if (typeof value === 'number') return num(value);
  return String(value);
}

/** JavaScript's shortest round-trip text for a double: the same number always prints the same. */
function num(n: number): string {
  return Object.is(n, -0) ? '0' : String(n);
}
