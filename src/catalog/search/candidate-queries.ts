import type BetterSqlite3 from 'better-sqlite3';
import { MIN_INDEXED_WORD, type QueryWord } from '../../selection/query/index.js';
import { ftsPhrases, type SqlCondition } from './filter-sql.js';
import type { RankItem } from './rank-results.js';
import { oneSlipVariants, slipProofPieces } from './typo-variants.js';

type Prepare = (sql: string) => BetterSqlite3.Statement;

/** Only the short fields ranking reads; whole parts are loaded for the results shown. */
const COLUMNS = `p.id, p.search_key AS key, p.search_text AS text, p.part_number AS partNumber,
  p.manufacturer, p.description, p.approval`;

/** Parts whose text contains none of the negated words that the index can look up. */
function withoutWords(words: readonly QueryWord[]): SqlCondition {
  const texts = words.filter((w) => w.isNegated && w.text.length >= MIN_INDEXED_WORD).map((w) => w.text);
  if (texts.length === 0) return { sql: '', params: [] };
  return { sql: ' AND p.id NOT IN (SELECT rowid FROM part_search WHERE part_search MATCH ?)', params: [ftsPhrases(texts, 'OR')] };
}

/** Filters only: the first matches in table order, which a scan finds without sorting. */
export function filterScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], limit: number): RankItem[] {
  const not = withoutWords(words);
  return prepare(`SELECT ${COLUMNS} FROM part p WHERE ${where.sql}${not.sql} LIMIT ${limit}`).all(...where.params, ...not.params) as RankItem[];
}

/** Part numbers starting with the first word, in key order, along the part_search_key index. */
export function prefixScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], limit: number): RankItem[] {
  const [first, ...rest] = words.filter((w) => !w.isNegated);
  if (!first) return [];
  const low = first.text.toUpperCase();
  const others = rest.filter((w) => w.text.length >= MIN_INDEXED_WORD).map((w) => w.text);
  const also = others.length > 0 ? ' AND p.id IN (SELECT rowid FROM part_search WHERE part_search MATCH ?)' : '';
  const not = withoutWords(words);
  // INDEXED BY: left to itself the planner may gather every text match first and sort them.
  const sql = `SELECT ${COLUMNS} FROM part p INDEXED BY part_search_key WHERE p.search_key >= ? AND p.search_key < ? AND ${where.sql}${also}${not.sql}
    ORDER BY p.search_key LIMIT ${limit}`;
  const params = [low, `${low}\u{10FFFF}`, ...where.params, ...(also ? [ftsPhrases(others)] : []), ...not.params];
  return prepare(sql).all(...params) as RankItem[];
}

/** The words anywhere in the indexed text, through the trigram index. */
export function substringScan(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[], limit: number): RankItem[] {
  const texts = words.filter((w) => !w.isNegated && w.text.length >= MIN_INDEXED_WORD).map((w) => w.text);
  if (texts.length === 0) return [];
  const not = withoutWords(words);
  const sql = `SELECT ${COLUMNS} FROM part_search s JOIN part p ON p.id = s.rowid
    WHERE part_search MATCH ? AND ${where.sql}${not.sql} LIMIT ${limit}`;
  return prepare(sql).all(ftsPhrases(texts), ...where.params, ...not.params) as RankItem[];
}

// A few parts per one-slip variant and per piece: enough for the intended part to be among them.
const PER_VARIANT = 3;
const PER_PIECES = 200;


/**
 * Candidates for words with one slip: every one-slip variant probed as a key prefix (exact and
 * complete for part numbers), and parts containing a slip-proof piece (makers, descriptions).
 */
export function slipCandidates(prepare: Prepare, where: SqlCondition, words: readonly QueryWord[]): RankItem[] {
  const ids = new Set<number>();
  const probe = prepare(`SELECT (SELECT group_concat(id) FROM (SELECT id FROM part
      WHERE search_key >= v.value AND search_key < v.value || char(1114111) ORDER BY search_key LIMIT ${PER_VARIANT})) AS ids
    FROM json_each(?) v`).pluck();
  const pieces = prepare(`SELECT rowid FROM part_search WHERE part_search MATCH ? LIMIT ${PER_PIECES}`).pluck();
  for (const w of words.filter((x) => !x.isNegated && x.text.length >= MIN_INDEXED_WORD)) {
    for (const found of probe.all(JSON.stringify(oneSlipVariants(w.text))) as (string | null)[]) {
      if (found) for (const id of found.split(',')) ids.add(Number(id));
    }
    for (const id of pieces.all(ftsPhrases(slipProofPieces(w.text), 'OR')) as number[]) ids.add(id);
  }
  if (ids.size === 0) return [];
  const not = withoutWords(words);
  const sql = `SELECT ${COLUMNS} FROM part p WHERE p.id IN (SELECT value FROM json_each(?)) AND ${where.sql}${not.sql}`;
  return prepare(sql).all(JSON.stringify([...ids]), ...where.params, ...not.params) as RankItem[];
}
