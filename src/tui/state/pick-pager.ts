import type { Part } from '../../parts/index.js';
import type { RankedReplacement } from '../../selection/substitution/index.js';
import { substringSearch, type PartSearch } from '../hooks/use-part-search.js';
import type { PartPager } from '../services.js';

/** One screenful of a list to choose a part from; ranked replacements carry their ranking. */
export interface PickPage {
  readonly parts: readonly Part[];
  readonly replacements: readonly RankedReplacement[] | null;
  readonly total: number;
}

export type PickPager = (query: string, offset: number, limit: number) => PickPage;

/** The ranked replacements narrowed by the search text, keeping their rank order. */
export function replacementPager(ranked: readonly RankedReplacement[], search: PartSearch = substringSearch): PickPager {
  let last: { query: string; found: readonly RankedReplacement[] } = { query: '', found: ranked };
  return (query, offset, limit) => {
    if (query !== last.query) {
      const hits = new Set(search(ranked.map((r) => r.check.alternate), query));
      last = { query, found: query.trim() ? ranked.filter((r) => hits.has(r.check.alternate)) : ranked };
    }
    const page = last.found.slice(offset, offset + limit);
    return { parts: page.map((r) => r.check.alternate), replacements: page, total: last.found.length };
  };
}

/** The whole catalog, paged as the browser pages it (SQLite for large catalogs). */
export function catalogPickPager(pager: PartPager): PickPager {
  return (query, offset, limit) => {
    const page = pager(query, offset, limit);
    return { parts: page.parts, replacements: null, total: page.total };
  };
}
