import { normalisePackage, type Part } from '../../parts/index.js';
import type { NumberFilter, QueryFilter, QueryWord } from './query-types.js';
import { containsFolded, MIN_INDEXED_WORD, searchKey, searchText, squash } from './search-text.js';

/**
 * Forward voltage as datasheets headline it: at the lowest listed temperature, the point with
 * the highest current (normally the rated one). The SQL search computes the same.
 */
export function headlineVfV(part: Pick<Part, 'vfPoints'>): number | undefined {
  let best: { vfV: number; ifA: number; tjK: number } | undefined;
  for (const p of part.vfPoints) {
    if (!best || p.tjK < best.tjK || (p.tjK === best.tjK && p.ifA > best.ifA)) best = p;
  }
  return best?.vfV;
}

function numberOf(part: Part, key: string): number | undefined {
  if (key === 'vfPoints') return headlineVfV(part);
  const value = (part as unknown as Record<string, unknown>)[key];
  return typeof value === 'number' ? value : undefined;
}

export function inInterval(value: number | undefined, f: Pick<NumberFilter, 'min' | 'max' | 'isMinExclusive' | 'isMaxExclusive'>): boolean {
  if (value === undefined) return false;
  if (f.min !== undefined && (f.isMinExclusive ? value <= f.min : value < f.min)) return false;
  if (f.max !== undefined && (f.isMaxExclusive ? value >= f.max : value > f.max)) return false;
  return true;
}

function holds(part: Part, filter: QueryFilter): boolean {
  switch (filter.type) {
    case 'number': return inInterval(numberOf(part, filter.key), filter);
    case 'kind': return filter.values.includes(part.kind);
    case 'approval': return filter.values.includes(part.approval);
    case 'lifecycle': return filter.values.includes(part.lifecycle);
    case 'package': {
      const name = normalisePackage(part.package).toLowerCase();
      return filter.values.some((v) => v.toLowerCase() === name);
    }
    case 'maker': {
      const maker = squash(part.manufacturer).toLowerCase();
      return filter.values.some((v) => maker.includes(v));
    }
    case 'group': {
      const group = part.secondSourceGroup?.toLowerCase();
      return group !== undefined && filter.values.some((v) => v.toLowerCase() === group);
    }
  }
}

/** Every filter holds; a negated filter holds when its plain form does not (a missing rating included). */
export function matchesFilters(part: Part, filters: readonly QueryFilter[]): boolean {
  return filters.every((f) => holds(part, f) !== f.isNegated);
}

/** What the text words are compared with: the part-number key and the other fields, squashed. */
export interface SearchableText {
  readonly key: string;
  readonly text: string;
}

export function searchableText(part: Part): SearchableText {
  return { key: searchKey(part.partNumber), text: searchText(part) };
}

/**
 * Every positive word appears in the key or the text and no negated word does. A query made
 * only of words too short for the trigram index matches part-number starts instead, since one
 * or two characters appear in nearly every part.
 */
export function matchesWords(target: SearchableText, words: readonly QueryWord[]): boolean {
  const positive = words.filter((w) => !w.isNegated);
  const isPrefixOnly = positive.length > 0 && positive.every((w) => w.text.length < MIN_INDEXED_WORD);
  const found = (w: QueryWord) => containsFolded(target.key, w.text) || containsFolded(target.text, w.text);
  if (isPrefixOnly && !target.key.startsWith(searchKey(positive[0]!.text))) return false;
  return words.every((w) => found(w) !== w.isNegated);
}
