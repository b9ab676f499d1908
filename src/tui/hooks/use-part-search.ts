import { useMemo } from 'react';
import type { Part } from '../../parts/index.js';

/** How a list of parts is narrowed by typed text; injected so tests and the fuzzy search can replace it. */
export type PartSearch = (parts: readonly Part[], query: string) => readonly Part[];

/** Lower case without separators: "SOD-123" and "sod123" look the same. */
export const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9µ]/g, '');

/** The text a part is found by, one squashed field after another. */
export const searchText = (p: Pick<Part, 'partNumber' | 'manufacturer' | 'description' | 'package' | 'kind'>) =>
  [p.partNumber, p.manufacturer, p.description, p.package, p.kind].map(squash).join('\u0001');

export const queryWords = (query: string) => query.split(/\s+/).map(squash).filter(Boolean);

/** Every word of the query must appear in one of the part's fields, separators ignored ("sod123" finds SOD-123). */
export const substringSearch: PartSearch = (parts, query) => {
  const words = queryWords(query);
  if (words.length === 0) return parts;
  return parts.filter((p) => {
    const hay = searchText(p);
    return words.every((w) => hay.includes(w));
  });
};

export function usePartSearch(parts: readonly Part[], query: string, search: PartSearch = substringSearch): readonly Part[] {
  return useMemo(() => search(parts, query), [parts, query, search]);
}
