import Fuse, { type Expression } from 'fuse.js';
import { APPROVAL_STATES } from '../../parts/index.js';
import { editDistances, type QueryWord } from '../../selection/query/index.js';

/** What ranking reads of a part: a few short fields, so a shortlist is cheap to fetch. */
export interface RankItem {
  readonly id: number;
  readonly key: string;
  readonly text: string;
  readonly partNumber: string;
  readonly manufacturer: string;
  readonly description: string;
  readonly approval: string;
}

export interface Ranked<T extends RankItem> {
  readonly item: T;
  readonly score: number;
}

const APPROVAL_ORDER = new Map<string, number>(APPROVAL_STATES.map((s, i) => [s, i]));
// Preferred parts first, banned last, whatever the text.
const approvalRank = (a: string) => APPROVAL_ORDER.get(a) ?? APPROVAL_STATES.length;

function tieBreak(a: RankItem, b: RankItem): number {
  return (
    approvalRank(a.approval) - approvalRank(b.approval) ||
    a.key.length - b.key.length ||
    (a.partNumber < b.partNumber ? -1 : a.partNumber > b.partNumber ? 1 : 0) ||
    (a.manufacturer < b.manufacturer ? -1 : a.manufacturer > b.manufacturer ? 1 : 0)
  );
}

// Exact part number, then its start, then anywhere in it, then only in the other fields.
const TIER_SCORES = [1, 0.9, 0.75, 0.6];

function tierOf(item: RankItem, words: readonly QueryWord[]): number {
  let tier = 3;
  const positive = words.filter((w) => !w.isNegated);
  // "KTR 1A1000 L" is one part number typed with spaces.
  const texts = positive.length > 1 ? [positive.map((w) => w.text).join(''), ...positive.map((w) => w.text)] : positive.map((w) => w.text);
  for (const t of texts) {
    const text = t.toUpperCase();
    if (item.key === text) return 0;
    if (item.key.startsWith(text)) tier = Math.min(tier, 1);
    else if (item.key.includes(text)) tier = Math.min(tier, 2);
  }
  return tier;
}

/**
 * Exact matches in fixed tiers: an exact substring always beats a similar one, and tiers are
 * cheaper than scoring every candidate. Without words, approval order alone.
 */
export function rankExact<T extends RankItem>(items: readonly T[], words: readonly QueryWord[]): Ranked<T>[] {
  const hasWords = words.some((w) => !w.isNegated);
  return items
    .map((item) => ({ item, tier: hasWords ? tierOf(item, words) : 0 }))
    .sort((a, b) => a.tier - b.tier || tieBreak(a.item, b.item))
    .map(({ item, tier }) => ({ item, score: TIER_SCORES[tier]! }));
}

/** Queries of more words than this are not retried for typos: each word costs hundreds of probes. */
export const MAX_FUZZY_WORDS = 4;

/** Whether a query that matched nothing exactly is worth the typo-tolerant search. */
export function isFuzzyWorthTrying(words: readonly QueryWord[]): boolean {
  const positive = words.filter((w) => !w.isNegated).length;
  return positive > 0 && positive <= MAX_FUZZY_WORDS;
}

// Above this fuse.js score (0 perfect, 1 nothing alike) a candidate is not shown at all.
const FUZZY_THRESHOLD = 0.4;

/** Fewest slips between a typed word and the part number, whole or its start. */
function keySlips(item: RankItem, words: readonly QueryWord[]): { whole: number; toPrefix: number } {
  let best = { whole: Infinity, toPrefix: Infinity };
  for (const w of words) {
    const d = editDistances(w.text.toUpperCase(), item.key);
    best = { whole: Math.min(best.whole, d.whole), toPrefix: Math.min(best.toPrefix, d.toPrefix) };
  }
  return best;
}

/**
 * Typo-tolerant ranking. A part number one slip from what was typed comes first (whole, then
 * its start): that is the slip the fallback looks for, and fuse.js scores many near part numbers
 * alike. Everything else (a slip in a maker or description) is ranked by fuse.js, each word
 * having to be close to some field. Scores stay below exact ones.
 */
export function rankFuzzy<T extends RankItem>(items: readonly T[], words: readonly QueryWord[]): Ranked<T>[] {
  const positive = words.filter((w) => !w.isNegated);
  if (positive.length === 0 || items.length === 0) return [];
  const fuse = new Fuse(items as T[], {
    keys: [
      { name: 'key', weight: 3 },
      { name: 'manufacturer', weight: 1 },
      { name: 'text', weight: 1 },
    ],
    includeScore: true,
    ignoreLocation: true,
    threshold: FUZZY_THRESHOLD,
  });
  const anyField = (text: string): Expression => ({ $or: [{ key: text }, { manufacturer: text }, { text }] as Expression[] });
  const query: Expression = { $and: positive.map((w) => anyField(w.text)) };
  const fuseScores = new Map<T, number>(fuse.search(query).map((r) => [r.item, r.score ?? 1]));
  return items
    .map((item) => {
      const slips = keySlips(item, positive);
      const fuseScore = fuseScores.get(item);
      const score = slips.whole <= 1 ? 0.5 : slips.toPrefix <= 1 ? 0.45 : fuseScore !== undefined ? 0.4 * (1 - fuseScore) : -1;
      return { item, score: Math.round(score * 1000) / 1000, fuseScore: fuseScore ?? 1 };
    })
    .filter((r) => r.score >= 0)
    .sort((a, b) => b.score - a.score || a.fuseScore - b.fuseScore || tieBreak(a.item, b.item))
    .map(({ item, score }) => ({ item, score }));
}
