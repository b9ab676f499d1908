import type BetterSqlite3 from 'better-sqlite3';
import { MIN_INDEXED_WORD, searchKey, searchText, type QueryWord } from '../../selection/query/index.js';
import { matchCount, type FieldWords } from './field-words.js';
import type { SqlCondition } from './filter-sql.js';
import type { RankItem } from './rank-results.js';
import { oneSlipVariants, slipProofPieces } from './typo-variants.js';
import { allWords, anyKeyTrigrams, fieldCondition, keyTrigrams, withoutWords } from './word-sql.js';

type Prepare = (sql: string) => BetterSqlite3.Statement;

/** Only the short fields ranking reads; whole parts are loaded for the results shown. */
const COLUMNS = `p.id, p.search_key AS key, p.part_number AS partNumber, p.manufacturer, p.package, p.kind, p.description, p.approval`;

type Row = Omit<RankItem, 'text'> & { readonly package: string; readonly kind: string };

/** Rows as ranking reads them: the other fields squashed into one text. */
function items(rows: readonly Row[]): RankItem[] {
  return rows.map((r) => ({ ...r, text: searchText(r) }));
}

/** A step's candidates, and whether its limit cut it short. */
export interface Scan {
  readonly items: RankItem[];
  readonly isCut: boolean;
}

const scanOf = (rows: readonly Row[], limit: number): Scan => ({ items: items(rows), isCut: rows.length >= limit });

/** Filters only: the first matches in table order, which a scan finds without sorting. */
export function filterScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], fields: FieldWords, limit: number): Scan {
  const not = withoutWords(words, fields);
  return scanOf(prepare(`SELECT ${COLUMNS} FROM part p WHERE ${where.sql}${not.sql} LIMIT ${limit}`).all(...where.params, ...not.params) as Row[], limit);
}

/** Part numbers starting with the first word, in key order, along the part_key index. */
export function prefixScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], fields: FieldWords, limit: number): Scan {
  const [first, ...rest] = words.filter((w) => !w.isNegated);
  if (!first) return { items: [], isCut: false };
  const low = searchKey(first.text);
  const others = allWords(rest, fields);
  const not = withoutWords(words, fields);
  // INDEXED BY: left to itself the planner may start from a filter and sort the matches.
  const sql = `SELECT ${COLUMNS} FROM part p INDEXED BY part_key WHERE p.search_key >= ? AND p.search_key < ? AND ${where.sql}${others.sql}${not.sql}
    ORDER BY p.search_key LIMIT ${limit}`;
  return scanOf(prepare(sql).all(low, `${low}\u{10FFFF}`, ...where.params, ...others.params, ...not.params) as Row[], limit);
}

/**
 * The words anywhere. One word leads: the one in the fewest field values (often none, so the
 * full-text index alone finds it). Parts with it in the part number come from the index; parts with
 * it in another field are read by value; every other word is checked on each row.
 */
export function substringScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], fields: FieldWords, limit: number): Scan {
  const positive = words.filter((w) => !w.isNegated && w.text.length >= MIN_INDEXED_WORD);
  if (positive.length === 0) return { items: [], isCut: false };
  const [lead] = positive
    .map((w) => ({ w, matches: fields.matching(w.text) }))
    .sort((a, b) => matchCount(a.matches) - matchCount(b.matches) || b.w.text.length - a.w.text.length);
  const others = allWords(positive.filter((w) => w !== lead!.w), fields);
  const not = withoutWords(words, fields);
  const rest = `${where.sql}${others.sql}${not.sql}`;
  const restParams = [...where.params, ...others.params, ...not.params];
  const inKey = prepare(`SELECT ${COLUMNS} FROM part_search s JOIN part p ON p.id = s.rowid
    WHERE part_search MATCH ? AND instr(p.search_key, ?) > 0 AND ${rest} LIMIT ${limit}`).all(keyTrigrams(lead!.w.text), searchKey(lead!.w.text), ...restParams) as Row[];
  const byValue = fieldCondition(lead!.matches);
  const inFields = matchCount(lead!.matches) === 0 ? [] : (prepare(`SELECT ${COLUMNS} FROM part p WHERE ${byValue.sql} AND ${rest} LIMIT ${limit}`).all(...byValue.params, ...restParams) as Row[]);
  const seen = new Set<number>();
  const rows = [...inKey, ...inFields].filter((r) => !seen.has(r.id) && seen.add(r.id));
  return { items: items(rows), isCut: inKey.length >= limit || inFields.length >= limit };
}

// A few parts per one-slip variant and per piece: enough for the intended part to be among them.
const PER_VARIANT = 3;
const PER_PIECES = 200;

/**
 * Candidates for words with one slip: every one-slip variant probed as a key prefix (exact and
 * complete for part numbers), and parts containing a slip-proof piece of a word, in the part
 * number (full-text index) or another field (by value).
 */
export function slipCandidates(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], fields: FieldWords): RankItem[] {
  const ids = new Set<number>();
  const probe = prepare(`SELECT (SELECT group_concat(id) FROM (SELECT id FROM part
      WHERE search_key >= v.value AND search_key < v.value || char(1114111) ORDER BY search_key LIMIT ${PER_VARIANT})) AS ids
    FROM json_each(?) v`).pluck();
  const inKey = prepare(`SELECT s.rowid FROM part_search s JOIN part p ON p.id = s.rowid
    WHERE part_search MATCH ? AND EXISTS (SELECT 1 FROM json_each(?) w WHERE instr(p.search_key, w.value) > 0) LIMIT ${PER_PIECES}`).pluck();
  for (const w of words.filter((x) => !x.isNegated && x.text.length >= MIN_INDEXED_WORD)) {
    for (const found of probe.all(JSON.stringify(oneSlipVariants(w.text))) as (string | null)[]) {
      if (found) for (const id of found.split(',')) ids.add(Number(id));
    }
    const pieces = slipProofPieces(w.text);
    for (const id of inKey.all(anyKeyTrigrams(pieces), JSON.stringify(pieces.map(searchKey))) as number[]) ids.add(id);
    const matches = pieces.map((piece) => fields.matching(piece));
    const byValue = fieldCondition({
      manufacturer: matches.flatMap((m) => m.manufacturer),
      package: matches.flatMap((m) => m.package),
      kind: matches.flatMap((m) => m.kind),
      description: matches.flatMap((m) => m.description),
    });
    if (byValue.sql !== '0') for (const id of prepare(`SELECT id FROM part p WHERE ${byValue.sql} LIMIT ${PER_PIECES}`).pluck().all(...byValue.params) as number[]) ids.add(id);
  }
  if (ids.size === 0) return [];
  const not = withoutWords(words, fields);
  const sql = `SELECT ${COLUMNS} FROM part p WHERE p.id IN (SELECT value FROM json_each(?)) AND ${where.sql}${not.sql}`;
  return items(prepare(sql).all(JSON.stringify([...ids]), ...where.params, ...not.params) as Row[]);
}
