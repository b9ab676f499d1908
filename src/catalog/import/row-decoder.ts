import { PART_FIELDS, fieldByColumn, isRectifying, normalisePackage, type PartField, type PartKind } from '../../parts/index.js';
import { checkPartConsistency } from '../../parts/part-consistency.js';
import { rectifyingPartSchema } from '../../parts/part-schema.js';
import { searchKey } from '../../selection/query/search-text.js';
import { parseQuantity, type QuantityKind } from '../../units/index.js';
import { decodePartCells, type CellIssue } from '../part-cells.js';
import {
  CONTROL_CHARACTER,
  CURRENCY_CODE,
  FREE_TEXT_MAX_LENGTH,
  IDENTITY_MAX_LENGTH,
  IR_POINT_RULES,
  NUMBER_RULES,
  VF_POINT_RULES,
  meetsRule,
  requiredNumbers,
  type NumberRule,
} from './part-rules.js';
import { TextTable } from './text-table.js';
import { WRITE_COLUMNS, writeValuesOf, type SqlValue } from './row-values.js';

/*
 * Decodes a CSV record into the values an import writes, without building a Part or running zod:
 * each column gets a reader compiled from its field once per file. When a reader meets anything it
 * does not accept outright (a bad value, a missing rating, a broken cross-check), the record goes
 * to decodePartCells, the reference, which words the issues or accepts what the fast path would
 * not. So a record gets the reference's verdict either way, at a few microseconds in the usual
 * case (tests/catalog/import/row-decoder.test.ts compares the two on generated records).
 */

export type DecodedRecord = { ok: true; values: SqlValue[] } | { ok: false; issues: CellIssue[] };

const DEFER = Symbol('defer to the reference decoder');
type Reader = (text: string) => unknown;

/**
 * A decimal number as exports write it, read as parseQuantity reads it (no unit: the column's
 * own). Number() accepts exactly these among texts of digits, signs, points and exponent marks,
 * which a loop checks faster than a regular expression.
 */
function plainNumber(text: string): number | undefined {
  if (text.length === 0) return undefined;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    // 0-9 + - . e E
    if (!((c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 || c === 101 || c === 69)) return undefined;
  }
  const n = Number(text);
  return Number.isNaN(n) ? undefined : n;
}
const FORMULA_GUARD = /^'[=+\-@\t\r]/;
const KINDS = new Set<string>(PART_FIELDS.find((f) => f.key === 'kind')!.values);
const URL_SCHEMA = rectifyingPartSchema.shape.datasheetUrl;

function quantity(text: string, kind: QuantityKind): number | typeof DEFER {
  const n = plainNumber(text);
  if (n !== undefined) return n === 0 ? 0 : n; // parseQuantity never returns -0
  const r = parseQuantity(text, kind, kind === 'temperature' ? { bareUnit: 'K' } : undefined);
  return r.ok ? r.value : DEFER;
}

function numberReader(field: PartField): Reader {
  const rule = NUMBER_RULES[field.key]!;
  const kind = field.quantity;
  if (!kind) {
    // A plain number column (unit_price): read as decodePartCells reads it, with Number().
    return (text) => {
      const n = Number(text);
      return Number.isFinite(n) && meetsRule(rule, n) ? n : DEFER;
    };
  }
  return (text) => {
    const n = quantity(text, kind);
    return n !== DEFER && Number.isFinite(n) && meetsRule(rule, n) ? n : DEFER;
  };
}

interface Points {
  readonly json: string;
  readonly count: number;
  /** The middle value of each point as the cross-checks read reverse points' VR. */
  readonly middle: { readonly vrV: number }[];
}

function pointsReader(kinds: readonly [QuantityKind, QuantityKind, QuantityKind], names: readonly [string, string, string], rules: readonly NumberRule[]): Reader {
  const keys = names.map((n) => `"${n}":`);
  return (text): Points | typeof DEFER => {
    const parts: string[] = [];
    const middle: { vrV: number }[] = [];
    for (const rawTerm of text.split(';')) {
      const term = rawTerm.trim();
      if (term === '') continue;
      const values = term.split('@');
      if (values.length !== 3) return DEFER;
      let json = '{';
      for (let j = 0; j < 3; j++) {
        const n = quantity(values[j]!.trim(), kinds[j]!);
        if (n === DEFER || !Number.isFinite(n) || !meetsRule(rules[j]!, n)) return DEFER;
        json += (j > 0 ? ',' : '') + keys[j] + String(n);
        if (j === 1) middle.push({ vrV: n });
      }
      parts.push(json + '}');
    }
    return { json: `[${parts.join(',')}]`, count: parts.length, middle };
  };
}

/** No C0 or C1 control character (CONTROL_CHARACTER), checked by a loop: quicker than the pattern. */
function hasNoControl(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x20 || (c >= 0x7f && c <= 0x9f)) return false;
  }
  return true;
}

function textReader(field: PartField): Reader {
  switch (field.key) {
    case 'manufacturer':
    case 'partNumber':
    case 'secondSourceGroup':
      return (text) => {
        const t = text.trim();
        return t.length === 0 || t.length > IDENTITY_MAX_LENGTH || !hasNoControl(t) ? DEFER : t;
      };
    case 'package': {
      // A catalog names a few dozen packages: each spelling is normalised once.
      const known = new TextTable<string | typeof DEFER>();
      return (text) => {
        let found = known.get(text);
        if (found === undefined) {
          const t = text.trim();
          found = t.length === 0 || t.length > IDENTITY_MAX_LENGTH || CONTROL_CHARACTER.test(t) ? DEFER : normalisePackage(t);
          if (known.size < 4096) known.setIfAbsent(text, found);
        }
        return found;
      };
    }
    case 'currency':
      return (text) => (CURRENCY_CODE.test(text.trim()) ? text.trim() : DEFER);
    case 'datasheetUrl':
      return (text) => (URL_SCHEMA.safeParse(text.trim()).success ? text.trim() : DEFER);
    default:
      return (text) => {
        const t = text.trim();
        return t.length <= FREE_TEXT_MAX_LENGTH ? t : DEFER;
      };
  }
}

/** Catalogs repeat point lists (2 717 distinct forward lists in a million synthetic parts). */
function remembering(read: Reader): Reader {
  let seen = new TextTable<unknown>();
  return (text) => {
    let value = seen.get(text);
    if (value === undefined) {
      if (seen.size >= 20_000) seen = new TextTable();
      seen.setIfAbsent(text, (value = read(text)));
    }
    return value;
  };
}

function readerFor(field: PartField): Reader {
  return field.type === 'vf-points' || field.type === 'ir-points' ? remembering(readCell(field)) : readCell(field);
}

function readCell(field: PartField): Reader {
  switch (field.type) {
    case 'number':
      return numberReader(field);
    case 'vf-points':
      return pointsReader(['voltage', 'current', 'temperature'], ['vfV', 'ifA', 'tjK'], VF_POINT_RULES);
    case 'ir-points':
      return pointsReader(['current', 'voltage', 'temperature'], ['irA', 'vrV', 'tjK'], IR_POINT_RULES);
    case 'enum': {
      const allowed = field.values!;
      return (text) => {
        for (const v of allowed) if (v === text) return v;
        const t = text.trim();
        return allowed.includes(t) ? t : DEFER;
      };
    }
    default:
      return textReader(field);
  }
}

const at = (key: string) => PART_FIELDS.findIndex((f) => f.key === key);
const KEY_AT = new Map(PART_FIELDS.map((f, i) => [f.key, i]));
const I = {
  manufacturer: at('manufacturer'),
  partNumber: at('partNumber'),
  kind: at('kind'),
  package: at('package'),
  description: at('description'),
  lifecycle: at('lifecycle'),
  approval: at('approval'),
  approvalNote: at('approvalNote'),
  unitPrice: at('unitPrice'),
  currency: at('currency'),
  vfPoints: at('vfPoints'),
  irPoints: at('irPoints'),
};
const CHECKED_KEYS = ['vrrmV', 'ifAvA', 'ifsmA', 'vrwmV', 'vbrMinV', 'vbrMaxV', 'vcV', 'pppmRiseS', 'pppmDecayS'] as const;
const CHECKED_AT = CHECKED_KEYS.map(at);
/** Positions of the ratings each kind must give. */
const REQUIRED_AT = new Map([...KINDS].map((kind) => [kind, requiredNumbers(kind as PartKind).map(at)]));
const NO_POINTS: readonly { vrV: number }[] = [];

/** Cells keyed by column, as decodePartCells takes them. */
function cellsByColumn(columns: readonly string[], cells: readonly string[], count: number): Record<string, string> {
  const out: Record<string, string> = {};
  for (let i = 0; i < count; i++) out[columns[i]!] = cells[i]!;
  return out;
}

/** The reference path: zod and every message, for records the fast path leaves to it. */
export function decodeByReference(cells: Readonly<Record<string, string | number | undefined>>): DecodedRecord {
  const decoded = decodePartCells(cells, { bareTemperatureUnit: 'K' });
  return decoded.ok ? { ok: true, values: writeValuesOf(decoded.part) } : { ok: false, issues: decoded.issues };
}

/**
 * A decoder for records with these columns (a checked CSV header: every column known, none twice).
 * `cells` holds the record's cells in header order; a record of another length is the caller's.
 */
export function compileRowDecoder(columns: readonly string[]): (cells: readonly string[]) => DecodedRecord {
  const fields = columns.map((c) => fieldByColumn(c)!);
  const readers = fields.map(readerFor);
  const targets = fields.map((f) => KEY_AT.get(f.key)!);
  const width = WRITE_COLUMNS.length;
  const rowWidth = PART_FIELDS.length;

  return (cells) => {
    const values: SqlValue[] = new Array<SqlValue>(width).fill(null);
    values[I.description] = '';
    let vf: Points | undefined;
    let ir: Points | undefined;
    for (let i = 0; i < readers.length; i++) {
      const raw = cells[i]!;
      if (raw.length === 0 || raw.trim() === '') continue;
      // An apostrophe our export put before a formula-like cell (csv-format.ts) is not part of it.
      const value = readers[i]!(raw.charCodeAt(0) === 39 && FORMULA_GUARD.test(raw) ? raw.slice(1) : raw);
      if (value === DEFER) return decodeByReference(cellsByColumn(columns, cells, readers.length));
      const target = targets[i]!;
      if (target === I.vfPoints) {
        vf = value as Points;
        values[target] = vf.json;
      } else if (target === I.irPoints) {
        ir = value as Points;
        values[target] = ir.json;
      } else values[target] = value as SqlValue;
    }
    const kind = values[I.kind] as PartKind | null;
    const defer = () => decodeByReference(cellsByColumn(columns, cells, readers.length));
    if (kind === null || !KINDS.has(kind) || values[I.manufacturer] === null || values[I.partNumber] === null || values[I.package] === null) return defer();
    for (const i of REQUIRED_AT.get(kind)!) if (values[i] === null) return defer();
    if (isRectifying(kind) && (vf === undefined || vf.count === 0)) return defer();
    values[I.lifecycle] ??= 'active';
    values[I.approval] ??= 'pending';
    values[I.vfPoints] ??= '[]';
    values[I.irPoints] ??= '[]';
    const checked: Record<string, unknown> = {
      kind,
      approval: values[I.approval],
      approvalNote: values[I.approvalNote] ?? undefined,
      unitPrice: values[I.unitPrice] ?? undefined,
      currency: values[I.currency] ?? undefined,
      irPoints: ir?.middle ?? NO_POINTS,
    };
    for (let k = 0; k < CHECKED_KEYS.length; k++) checked[CHECKED_KEYS[k]!] = values[CHECKED_AT[k]!] ?? undefined;
    if (checkPartConsistency(checked as never).length > 0) return defer();
    values[rowWidth] = searchKey(values[I.partNumber] as string);
    values[rowWidth + 1] = 0; // the digest: the writer fills it in
    return { ok: true, values };
  };
}
