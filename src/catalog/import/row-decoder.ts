import { PART_FIELDS, fieldByColumn, isRectifying, type PartKind } from '../../parts/index.js';
import { checkPartConsistency } from '../../parts/part-consistency.js';
import { searchKey } from '../../selection/query/search-text.js';
import { decodePartCells, type CellIssue } from '../part-cells.js';
import { DEFER, readerFor, type Points } from './cell-readers.js';
import { requiredNumbers } from './part-rules.js';
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

const FORMULA_GUARD = /^'[=+\-@\t\r]/;
const KINDS = new Set<string>(PART_FIELDS.find((f) => f.key === 'kind')!.values);

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
 * With `isReusing`, an accepted record's values array is the same array each time, valid until the
 * next call (the collector copies what it keeps): a fresh 50-slot array a row was a tenth of the
 * reader's garbage at a million rows.
 */
export function compileRowDecoder(columns: readonly string[], isReusing = false): (cells: readonly string[]) => DecodedRecord {
  const fields = columns.map((c) => fieldByColumn(c)!);
  const readers = fields.map(readerFor);
  const targets = fields.map((f) => KEY_AT.get(f.key)!);
  const width = WRITE_COLUMNS.length;
  const rowWidth = PART_FIELDS.length;

  const scratch: SqlValue[] = new Array<SqlValue>(width).fill(null);
  const checked: Record<string, unknown> = {};
  return (cells) => {
    const values: SqlValue[] = isReusing ? scratch.fill(null) : new Array<SqlValue>(width).fill(null);
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
    // One object for every record: each key is written every time.
    checked.kind = kind;
    checked.approval = values[I.approval];
    checked.approvalNote = values[I.approvalNote] ?? undefined;
    checked.unitPrice = values[I.unitPrice] ?? undefined;
    checked.currency = values[I.currency] ?? undefined;
    checked.irPoints = ir?.middle ?? NO_POINTS;
    for (let k = 0; k < CHECKED_KEYS.length; k++) checked[CHECKED_KEYS[k]!] = values[CHECKED_AT[k]!] ?? undefined;
    if (checkPartConsistency(checked as never).length > 0) return defer();
    values[rowWidth] = searchKey(values[I.partNumber] as string);
    values[rowWidth + 1] = 0; // the digest: the collector fills it in
    return { ok: true, values };
  };
}
