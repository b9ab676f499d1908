import type { Part } from '../../parts/index.js';
import {
  matchesFilters,
  matchesWords,
  parseQuery,
  searchableText,
  type SearchQuery,
} from '../../selection/query/index.js';
import { isFuzzyWorthTrying, rankExact, rankFuzzy, type RankItem } from './rank-results.js';
import { DEFAULT_LIMIT, type SearchOptions, type SearchOutcome } from './search-result.js';

/** The browser's search hook type (src/tui/hooks/use-part-search.ts), restated so catalog does not import tui. */
export type PartListSearch = (parts: readonly Part[], query: string) => readonly Part[];

type Item = RankItem & { readonly part: Part };

// Parts are immutable values; their squashed text is worked out once per part object.
const itemCache = new WeakMap<Part, Item>();

function itemOf(part: Part, id: number): Item {
  let item = itemCache.get(part);
  if (!item) {
    const { key, text } = searchableText(part);
    item = { id, key, text, part, partNumber: part.partNumber, manufacturer: part.manufacturer, description: part.description, approval: part.approval };
    itemCache.set(part, item);
  }
  return item;
}

function run(parts: readonly Part[], query: SearchQuery, limit: number): { items: { item: Item; score: number }[]; matched: 'exact' | 'fuzzy'; total?: number } {
  const filtered = parts.filter((p) => matchesFilters(p, query.filters)).map(itemOf);
  const exact = filtered.filter((i) => matchesWords(i, query.words));
  if (exact.length > 0 || !isFuzzyWorthTrying(query.words)) {
    return { items: rankExact(exact, query.words).slice(0, limit), matched: 'exact', total: exact.length };
  }
  const negated = query.words.filter((w) => w.isNegated);
  const candidates = filtered.filter((i) => matchesWords(i, negated));
  return { items: rankFuzzy(candidates, query.words).slice(0, limit), matched: 'fuzzy' };
}

/**
 * The same query language and ranking over parts already in memory, for small catalogs the
 * browser holds whole: exact matches first, fuse.js over the list when none match.
 */
export function searchPartList(parts: readonly Part[], queryText: string, options: SearchOptions = {}): SearchOutcome {
  const started = performance.now();
  const parsed = parseQuery(queryText);
  if (!parsed.ok) return parsed;
  const limit = Math.max(1, Math.floor(options.limit ?? DEFAULT_LIMIT)) || DEFAULT_LIMIT;
  const { items, matched, total } = run(parts, parsed.query, limit);
  return {
    ok: true,
    results: items.map(({ item, score }) => ({ part: item.part, score, matched })),
    ...(total !== undefined ? { total } : {}),
    elapsedMs: performance.now() - started,
  };
}

/** Typed text with the bad terms blanked out, so the list still follows what can be read. */
function readablePart(queryText: string): string {
  const parsed = parseQuery(queryText);
  if (parsed.ok) return queryText;
  let text = queryText;
  for (const issue of parsed.issues) text = text.slice(0, issue.start) + ' '.repeat(issue.end - issue.start) + text.slice(issue.end);
  return text;
}

/**
 * A drop-in for the browser's PartSearch: every matching part, best first. Bad terms are
 * ignored here; the browser shows them by calling parseQuery itself.
 */
export const queryPartSearch: PartListSearch = (parts, query) => {
  const outcome = searchPartList(parts, readablePart(query), { limit: parts.length });
  return outcome.ok ? outcome.results.map((h) => h.part) : parts;
};
