import { decodePartCells, type CellIssue } from '../../catalog/part-cells.js';
import {
  PART_FIELDS,
  PART_KINDS,
  isRectifying,
  isTvs,
  type Part,
  type PartField,
  type PartKind,
} from '../../parts/index.js';
import { rectifyingPartSchema, tvsPartSchema, zenerPartSchema } from '../../parts/part-schema.js';

/** Fields every part has, in the form's order. */
const IDENTITY = ['kind', 'manufacturer', 'partNumber', 'package', 'description', 'lifecycle', 'approval', 'approvalNote', 'secondSourceGroup', 'unitPrice', 'currency', 'datasheetUrl', 'notes'];
const THERMAL = ['tjMaxK', 'rthJaKPerW', 'rthJlKPerW', 'rthJcKPerW'];
const RECTIFYING = ['vrrmV', 'ifAvA', 'ifAvRefK', 'ifAvRef', 'ifsmA', 'ifsmPulseS', 'vfPoints', 'irPoints', 'cjF', 'cjVrV', 'trrS', 'qrrC', ...THERMAL, 'pdW'];
const ZENER = ['vzV', 'vzTol', 'iztA', 'zztOhm', 'vzTempcoPerK', 'pdW', ...THERMAL, 'irPoints', 'vfPoints'];
const TVS = ['vrwmV', 'vbrMinV', 'vbrMaxV', 'vbrItA', 'vcV', 'ippA', 'pppmW', 'pppmRiseS', 'pppmDecayS', ...THERMAL, 'irPoints', 'cjF', 'cjVrV'];

const byKey = new Map(PART_FIELDS.map((f) => [f.key, f]));

function schemaOf(kind: PartKind) {
  return isRectifying(kind) ? rectifyingPartSchema : kind === 'zener' ? zenerPartSchema : tvsPartSchema;
}

export interface PartRow {
  readonly field: PartField;
  readonly isRequired: boolean;
  /** Enum fields cycle with ←/→; '' is "not given" where the field may be left out. */
  readonly options?: readonly string[];
}

/** The fields that matter for a kind of part, identity first; other fields are not offered. */
export function partRows(kindText: string): PartRow[] {
  const kind = (PART_KINDS as readonly string[]).includes(kindText) ? (kindText as PartKind) : 'rectifier';
  const ratings = isRectifying(kind) ? RECTIFYING : kind === 'zener' ? ZENER : isTvs(kind) ? TVS : [];
  const shape = schemaOf(kind).shape as Record<string, { safeParse(v: unknown): { success: boolean } }>;
  return [...IDENTITY, ...ratings].map((key) => {
    const field = byKey.get(key)!;
    const isRequired = key === 'kind' || (shape[key] !== undefined && !shape[key]!.safeParse(undefined).success) || (key === 'vfPoints' && isRectifying(kind));
    const options = field.type === 'enum' ? (key === 'kind' ? field.values! : ['', ...field.values!]) : undefined;
    return { field, isRequired, ...(options ? { options } : {}) };
  });
}

export const INITIAL_PART_VALUES: Readonly<Record<string, string>> = { kind: 'rectifier' };

export interface PartCheck {
  /** Problems by column; each is shown beside its field. */
  readonly issues: ReadonlyMap<string, CellIssue>;
  readonly part: Part | null;
}

/** Decodes the visible fields as one catalog record; bare temperatures are °C, as people type. */
export function checkPart(values: Readonly<Record<string, string>>): PartCheck {
  const cells: Record<string, string> = {};
  for (const row of partRows(values.kind ?? '')) {
    const text = (values[row.field.column] ?? '').trim();
    if (text !== '') cells[row.field.column] = text;
  }
  const result = decodePartCells(cells, { bareTemperatureUnit: '°C' });
  if (result.ok) return { issues: new Map(), part: result.part };
  return { issues: new Map(result.issues.map((i) => [i.column, i])), part: null };
}

/** What an empty optional choice means: the part model's default. */
export const CHOICE_DEFAULTS: Readonly<Record<string, string>> = { lifecycle: 'default active', approval: 'default pending' };

/** An issue is shown once its field has text, or for every field after a save was tried. */
export function shownPartIssue(check: PartCheck, column: string, values: Readonly<Record<string, string>>, hasAttempted: boolean): CellIssue | undefined {
  const issue = check.issues.get(column);
  if (!issue) return undefined;
  const isEmpty = (values[column] ?? '').trim() === '';
  return !hasAttempted && isEmpty ? undefined : issue;
}
