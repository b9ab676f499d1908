import { useMemo } from 'react';
import type { Part } from '../../parts/index.js';

/** How the browser narrows the list; injected so tests and the later fuzzy search can replace it. */
export type PartSearch = (parts: readonly Part[], query: string) => readonly Part[];

const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9µ]/g, '');

/** Every word of the query must appear in the part's text, separators ignored ("sod123" finds SOD-123). */
export const substringSearch: PartSearch = (parts, query) => {
  const words = query.split(/\s+/).map(squash).filter(Boolean);
  if (words.length === 0) return parts;
  return parts.filter((p) => {
    const hay = squash(`${p.partNumber} ${p.manufacturer} ${p.description} ${p.package} ${p.kind}`);
    return words.every((w) => hay.includes(w));
  });
};

export function usePartSearch(parts: readonly Part[], query: string, search: PartSearch = substringSearch): readonly Part[] {
  return useMemo(() => search(parts, query), [parts, query, search]);
}
