import type { Catalog } from '../../catalog/open-catalog.js';
import { createCatalogSearch, queryPartSearch } from '../../catalog/search/index.js';
import { parseQuery } from '../../selection/query/index.js';
import type { PartSearch } from '../hooks/use-part-search.js';
import type { PartPage, PartPager } from '../services.js';

/*
 * The catalog's search and its query language (docs/search.md) plugged into the interface's two
 * injection points: the in-memory PartSearch (candidate lists, small catalogs) and the pager of
 * large catalogs. Loaded after the first frame (start-tui), so start-up does not wait for it.
 */

export const querySearch: PartSearch = queryPartSearch;

/** Problems of a typed query, e.g. an unknown field, for the line under the search text. */
export function queryProblems(text: string): string[] {
  const parsed = parseQuery(text);
  return parsed.ok ? [] : parsed.issues.map((i) => i.message);
}

/** Results asked for beyond the page, so the list can be scrolled on before asking again. */
const LOOK_AHEAD = 100;

/**
 * Searches of a large catalog through SQLite, best matches first; without a query, `browse`
 * (part-number order). The last answer is kept: the screen asks twice per keystroke.
 */
export function searchPager(catalog: Catalog, browse: PartPager): PartPager {
  const search = createCatalogSearch(catalog);
  let last: { query: string; limit: number; page: { parts: PartPage['parts']; total: number; isTotalCapped: boolean } } | undefined;
  return (query, offset, limit) => {
    if (!query.trim()) return browse(query, offset, limit);
    const wanted = offset + limit + LOOK_AHEAD;
    if (!last || last.query !== query || (last.limit < wanted && last.page.isTotalCapped)) {
      const outcome = search(query, { limit: wanted });
      const parts = outcome.ok ? outcome.results.map((h) => h.part) : [];
      const total = outcome.ok ? (outcome.total ?? parts.length) : 0;
      last = { query, limit: wanted, page: { parts, total, isTotalCapped: outcome.ok && outcome.total === undefined && parts.length >= wanted } };
    }
    return { parts: last.page.parts.slice(offset, offset + limit), total: last.page.total, isTotalCapped: last.page.isTotalCapped };
  };
}
