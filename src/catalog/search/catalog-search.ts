import type { Catalog } from '../open-catalog.js';
import { matchesWords, parseQuery, squash, type QueryWord, type SearchQuery } from '../../selection/query/index.js';
import { slipCandidates, filterScan, prefixScan, substringScan } from './candidate-queries.js';
import { filtersToSql } from './filter-sql.js';
import { partLoader } from './load-parts.js';
import { fieldWords } from './field-words.js';
import { isFuzzyWorthTrying, rankExact, rankFuzzy, type RankItem, type Ranked } from './rank-results.js';
import { DEFAULT_LIMIT, type SearchHit, type SearchOptions, type SearchOutcome } from './search-result.js';
import { statementCache } from './statement-cache.js';

/** Searches one catalog; made once, it reuses its prepared statements for every keystroke. */
export type CatalogSearch = (queryText: string, options?: SearchOptions) => SearchOutcome;

// How many candidates each step hands to ranking, as a multiple of the results asked for.
const SHORTLIST_FACTOR = 4;
// A result list longer than this is not a search any more; export the catalog instead.
const MAX_LIMIT = 5000;

function dedupe(items: readonly RankItem[]): RankItem[] {
  const seen = new Set<number>();
  return items.filter((i) => !seen.has(i.id) && seen.add(i.id));
}

export function createCatalogSearch(catalog: Catalog): CatalogSearch {
  const prepare = statementCache(catalog.db);
  const fields = fieldWords(catalog.db);
  const makers = (text: string) => fields.values('manufacturer').filter((name) => squash(name).toLowerCase().includes(text));
  const load = partLoader(catalog.db);

  /** Exact matches, fewest steps first; `isComplete` when no step was cut short by its limit. */
  function exact(query: SearchQuery, limit: number): { ranked: Ranked<RankItem>[]; isComplete: boolean } {
    const where = filtersToSql(query.filters, makers);
    const shortlist = limit * SHORTLIST_FACTOR;
    const words: readonly QueryWord[] = query.words;
    const keep = (items: RankItem[]) => items.filter((i) => matchesWords(i, words));
    if (!words.some((w) => !w.isNegated)) {
      const found = filterScan(prepare, where, words, fields, shortlist);
      return { ranked: rankExact(keep(found.items), words), isComplete: !found.isCut };
    }
    const byPrefix = prefixScan(prepare, where, words, fields, shortlist);
    const prefixHits = keep(byPrefix.items);
    // Part-number starts outrank every other exact match, so enough of them settle the answer.
    if (prefixHits.length >= limit) return { ranked: rankExact(prefixHits, words), isComplete: false };
    const bySubstring = substringScan(prepare, where, words, fields, shortlist);
    const isComplete = !byPrefix.isCut && !bySubstring.isCut;
    return { ranked: rankExact(keep(dedupe([...byPrefix.items, ...bySubstring.items])), words), isComplete };
  }

  return (queryText, options = {}) => {
    const started = performance.now();
    const parsed = parseQuery(queryText);
    if (!parsed.ok) return parsed;
    const limit = Math.min(MAX_LIMIT, Math.max(1, Math.floor(options.limit ?? DEFAULT_LIMIT)) || DEFAULT_LIMIT);
    const { ranked, isComplete } = exact(parsed.query, limit);
    let matched: SearchHit['matched'] = 'exact';
    let top = ranked.slice(0, limit);
    if (ranked.length === 0 && isFuzzyWorthTrying(parsed.query.words)) {
      const where = filtersToSql(parsed.query.filters, makers);
      const negated = parsed.query.words.filter((w) => w.isNegated);
      const candidates = slipCandidates(prepare, where, parsed.query.words, fields).filter((i) => matchesWords(i, negated));
      top = rankFuzzy(candidates, parsed.query.words).slice(0, limit);
      matched = 'fuzzy';
    }
    const parts = load(top.map((r) => r.item.id));
    const results = top.flatMap((r) => {
      const part = parts.get(r.item.id);
      return part ? [{ part, score: r.score, matched }] : [];
    });
    const total = matched === 'exact' && isComplete ? ranked.length : undefined;
    return { ok: true, results, ...(total !== undefined ? { total } : {}), elapsedMs: performance.now() - started };
  };
}

const searches = new WeakMap<Catalog, CatalogSearch>();

/** One search of a catalog; statements are prepared on the first call and kept with the catalog. */
export function searchParts(catalog: Catalog, queryText: string, options: SearchOptions = {}): SearchOutcome {
  let search = searches.get(catalog);
  if (!search) {
    search = createCatalogSearch(catalog);
    searches.set(catalog, search);
  }
  return search(queryText, options);
}
