import type BetterSqlite3 from 'better-sqlite3';
import { ROW_COLUMNS, rowToPart, type PartRow } from '../../catalog/part-rows.js';
import type { Part } from '../../parts/index.js';
import { queryWords, searchText, substringSearch, type PartSearch } from '../hooks/use-part-search.js';
import type { PartPage, PartPager } from '../services.js';
import { KEY_ORDER } from '../../catalog/identity-sql.js';

/** Small catalogs: every part in memory, searched with the injected strategy. */
export function memoryPager(parts: readonly Part[], search: PartSearch = substringSearch): PartPager {
  let last: { query: string; found: readonly Part[] } = { query: '', found: parts };
  return (query, offset, limit) => {
    if (query !== last.query) last = { query, found: search(parts, query) };
    return { parts: last.found.slice(offset, offset + limit), total: last.found.length, isTotalCapped: false };
  };
}

/**
 * Large catalogs: nothing is loaded at start. Without a query, pages come straight from SQLite in
 * part-number order, separators and letter case ignored (an index scan along part_key). The first search reads one compact search string per part
 * (id and squashed text, not the parts) so each further keystroke filters in memory in a few
 * milliseconds; only the rows of the visible page are read as parts.
 */
export function sqlPager(db: BetterSqlite3.Database): PartPager {
  const ORDER = `ORDER BY ${KEY_ORDER}`;
  const page = db.prepare(`SELECT ${ROW_COLUMNS.join(', ')} FROM part ${ORDER} LIMIT ? OFFSET ?`);
  const byIds = db.prepare(`SELECT id, ${ROW_COLUMNS.join(', ')} FROM part WHERE id IN (SELECT value FROM json_each(?))`);
  let total: number | undefined;
  let index: { ids: Int32Array; texts: string[] } | undefined;
  let last: { words: string[]; matches: number[] } | undefined;

  const buildIndex = () => {
    const rows = db
      .prepare(`SELECT id, part_number AS partNumber, manufacturer, description, package, kind FROM part ${ORDER}`)
      .raw(false)
      .all() as ({ id: number } & Parameters<typeof searchText>[0])[];
    return { ids: Int32Array.from(rows, (r) => r.id), texts: rows.map(searchText) };
  };

  const matching = (words: string[]): number[] => {
    index ??= buildIndex();
    if (last && last.words.join(' ') === words.join(' ')) return last.matches;
    // A query that only adds to the last one narrows its matches instead of the whole catalog.
    const narrows = last && last.words.length <= words.length && last.words.every((w, i) => (i === last!.words.length - 1 ? words[i]!.includes(w) : words[i] === w));
    const pool = narrows ? last!.matches : null;
    const out: number[] = [];
    const test = (i: number) => {
      const text = index!.texts[i]!;
      if (words.every((w) => text.includes(w))) out.push(i);
    };
    if (pool) for (const i of pool) test(i);
    else for (let i = 0; i < index.texts.length; i++) test(i);
    last = { words, matches: out };
    return out;
  };

  return (query, offset, limit): PartPage => {
    const words = queryWords(query);
    if (words.length === 0) {
      total ??= (db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n;
      const rows = page.all(limit, offset) as PartRow[];
      return { parts: rows.map(rowToPart), total, isTotalCapped: false };
    }
    const matches = matching(words);
    const ids = matches.slice(offset, offset + limit).map((i) => index!.ids[i]!);
    const rows = byIds.all(JSON.stringify(ids)) as (PartRow & { id: number })[];
    const byId = new Map(rows.map((r) => [r.id, r]));
    const parts = ids.flatMap((id) => (byId.has(id) ? [rowToPart(byId.get(id)!)] : []));
    return { parts, total: matches.length, isTotalCapped: false };
  };
}
