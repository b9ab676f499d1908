import { normalisePackage, type PartField } from '../../parts/index.js';
import { rectifyingPartSchema } from '../../parts/part-schema.js';
import { parseQuantity, type QuantityKind } from '../../units/index.js';
import {
  CONTROL_CHARACTER,
  CURRENCY_CODE,
  FREE_TEXT_MAX_LENGTH,
  IDENTITY_MAX_LENGTH,
  IR_POINT_RULES,
  NUMBER_RULES,
  VF_POINT_RULES,
  meetsRule,
  type NumberRule,
} from './part-rules.js';
import { TextTable } from './text-table.js';

/*
 * One reader per column of the fast decoder (row-decoder.ts): a cell's text in, its stored value
 * out, or DEFER when the reference decoder (decodePartCells) must judge the record.
 */

/** Returned by a reader that does not accept the cell outright. */
export const DEFER = Symbol('defer to the reference decoder');
export type Reader = (text: string) => unknown;

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

export interface Points {
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

export function readerFor(field: PartField): Reader {
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

