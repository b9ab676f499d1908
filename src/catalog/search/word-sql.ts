import { MIN_INDEXED_WORD, searchKey, type QueryWord } from '../../selection/query/index.js';
import { FIELD_VALUE_COLUMNS } from '../import/field-values.js';
import type { FieldMatches, FieldWords } from './field-words.js';
import type { SqlCondition } from './filter-sql.js';

/*
 * SQL for the words of a query. The full-text index keeps no positions (detail=none, migration
 * 006), so a word is looked up by its trigrams, all required, and confirmed with instr() on the
 * key; the other fields are matched by value (field-words.ts).
 */

const quote = (t: string) => `"${t.replace(/"/g, '""')}"`;

/**
 * An FTS5 query finding keys that contain the word (and some that only share its trigrams):
 * trigrams side by side cover it, plus the last one; more would only slow the lookup.
 */
export function keyTrigrams(word: string): string {
  const picked = new Set<string>();
  for (let i = 0; i + 3 <= word.length; i += 3) picked.add(word.slice(i, i + 3));
  if (word.length >= 3) picked.add(word.slice(word.length - 3));
  return [...picked].map(quote).join(' AND ');
}

/** Keys containing any of the words. */
export function anyKeyTrigrams(words: readonly string[]): string {
  return words.filter((w) => w.length >= 3).map((w) => `(${keyTrigrams(w)})`).join(' OR ');
}

/** Parts whose maker, package, kind or description is one of the matched values. */
export function fieldCondition(matches: FieldMatches): SqlCondition {
  const sql: string[] = [];
  const params: unknown[] = [];
  for (const field of FIELD_VALUE_COLUMNS) {
    if (matches[field].length === 0) continue;
    // One JSON parameter, whatever the number of values (SQLite allows 32766 parameters).
    sql.push(`p.${field} IN (SELECT value FROM json_each(?))`);
    params.push(JSON.stringify(matches[field]));
  }
  return sql.length === 0 ? { sql: '0', params: [] } : { sql: `(${sql.join(' OR ')})`, params };
}

/** The word in the part number or in one of the other fields. */
export function wordCondition(word: string, matches: FieldMatches): SqlCondition {
  const fields = fieldCondition(matches);
  return { sql: `(instr(p.search_key, ?) > 0 OR ${fields.sql})`, params: [searchKey(word), ...fields.params] };
}

/** Parts that contain none of the negated words long enough to look up (shorter ones are checked in memory). */
export function withoutWords(words: readonly QueryWord[], fields: FieldWords): SqlCondition {
  const sql: string[] = [];
  const params: unknown[] = [];
  for (const w of words) {
    if (!w.isNegated || w.text.length < MIN_INDEXED_WORD) continue;
    const c = wordCondition(w.text, fields.matching(w.text));
    sql.push(`NOT ${c.sql}`);
    params.push(...c.params);
  }
  return { sql: sql.map((s) => ` AND ${s}`).join(''), params };
}

/** Every positive word, each in the part number or another field. */
export function allWords(words: readonly QueryWord[], fields: FieldWords): SqlCondition {
  const sql: string[] = [];
  const params: unknown[] = [];
  for (const w of words) {
    if (w.isNegated || w.text.length < MIN_INDEXED_WORD) continue;
    const c = wordCondition(w.text, fields.matching(w.text));
    sql.push(c.sql);
    params.push(...c.params);
  }
  return { sql: sql.map((s) => ` AND ${s}`).join(''), params };
}
