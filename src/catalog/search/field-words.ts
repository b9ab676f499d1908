import type BetterSqlite3 from 'better-sqlite3';
import { squash } from '../../selection/query/index.js';
import { FIELD_VALUE_COLUMNS } from '../import/field-values.js';

/*
 * Words in makers, packages, kinds and descriptions (docs/search.md, "How it works"). Those fields
 * hold few distinct values (36 makers and 31 thousand descriptions in a million synthetic parts), so
 * a typed word is matched against the distinct values of part_field_value (migration 006) here, and
 * parts are then found by value. The full-text index covers only part numbers, which are nearly
 * all distinct: that is what made it four times cheaper to build.
 */

export type FieldColumn = (typeof FIELD_VALUE_COLUMNS)[number];

/** For each field, the stored values that contain a word. */
export type FieldMatches = Readonly<Record<FieldColumn, readonly string[]>>;

export interface FieldWords {
  /** Values containing the word (squashed, any letter case), as search-text.ts compares. */
  matching(word: string): FieldMatches;
  /** Every value of one field, for filters that compare with it. */
  values(field: FieldColumn): readonly string[];
}

interface Entry {
  readonly value: string;
  readonly folded: string;
}

const NONE: FieldMatches = { manufacturer: [], package: [], kind: [], description: [] };

export function matchCount(m: FieldMatches): number {
  return FIELD_VALUE_COLUMNS.reduce((n, f) => n + m[f].length, 0);
}

/**
 * The values, read again only after a write: this connection's own (total_changes) or another's
 * (data_version). Matches are remembered per word until then; a longer word is matched only among
 * the values of a word it contains, so each keystroke narrows the last one's list.
 */
export function fieldWords(db: BetterSqlite3.Database): FieldWords {
  const read = db.prepare('SELECT field, value FROM part_field_value').raw();
  const changes = db.prepare('SELECT total_changes()').pluck();
  let stamp = '';
  let entries = new Map<FieldColumn, Entry[]>();
  let remembered = new Map<string, Map<FieldColumn, Entry[]>>();

  const current = () => {
    const now = `${db.pragma('data_version', { simple: true })}:${changes.get()}`;
    if (now !== stamp) {
      entries = new Map(FIELD_VALUE_COLUMNS.map((f) => [f, []]));
      for (const [field, value] of read.all() as [FieldColumn, string][]) entries.get(field)?.push({ value, folded: squash(value).toLowerCase() });
      remembered = new Map();
      stamp = now;
    }
    return entries;
  };

  return {
    matching(word) {
      const all = current();
      const text = word.toLowerCase();
      if (text === '') return NONE;
      let found = remembered.get(text);
      if (!found) {
        let pool = all;
        for (const [earlier, matches] of remembered) if (earlier.length < text.length && text.includes(earlier) && matchCountOf(matches) < matchCountOf(pool)) pool = matches;
        found = new Map(FIELD_VALUE_COLUMNS.map((f) => [f, pool.get(f)!.filter((e) => e.folded.includes(text))]));
        if (remembered.size > 500) remembered.clear();
        remembered.set(text, found);
      }
      const matches = found;
      return Object.fromEntries(FIELD_VALUE_COLUMNS.map((f) => [f, matches.get(f)!.map((e) => e.value)])) as unknown as FieldMatches;
    },
    values(field) {
      return current().get(field)!.map((e) => e.value);
    },
  };
}

function matchCountOf(m: Map<FieldColumn, Entry[]>): number {
  let n = 0;
  for (const list of m.values()) n += list.length;
  return n;
}
