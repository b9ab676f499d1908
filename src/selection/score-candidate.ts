import { packageKey, type ApprovalState, type Lifecycle, type Part } from '../parts/index.js';
import type { LimitEvaluation, PartEvaluation } from './evaluation.js';

/** One term of a score with the reason it has that value. */
export interface ScoreTerm {
  readonly points: number;
  readonly reason: string;
}

export interface ScoreParts {
  readonly margin: ScoreTerm;
  readonly approval: ScoreTerm;
  readonly lifecycle: ScoreTerm;
  readonly price: ScoreTerm;
  readonly package: ScoreTerm;
}

/** Weights, so the ranking can be read off the numbers: margin dominates, then approval. */
export const SCORE_WEIGHTS = {
  /** Points for the tightest margin at full saturation. */
  tightest: 60,
  /** Points for the mean of the other margins. */
  others: 10,
  price: 10,
  package: 5,
} as const;

export const APPROVAL_POINTS: Readonly<Record<ApprovalState, number>> = { preferred: 20, approved: 12, conditional: 5, pending: 0, banned: -40 };
export const LIFECYCLE_POINTS: Readonly<Record<Lifecycle, number>> = { active: 0, nrnd: -8, obsolete: -30 };

/** Headroom at which the margin earns half its points: diminishing returns beyond it. */
export const HALF_SCORE_HEADROOM = 0.25;

/** g(h) = h/(h + 0.25) for h ≥ 0 (0.25 → ½, 1 → 0.8); below zero the same slope, down to −1. */
export function marginValue(headroom: number): number {
  if (headroom >= 0) return headroom / (headroom + HALF_SCORE_HEADROOM);
  return Math.max(-1, headroom / HALF_SCORE_HEADROOM);
}

const round = (x: number) => Math.round(x * 100) / 100;
const pct = (h: number) => `${Math.round(h * 100)} %`;

export function marginTerm(evaluation: PartEvaluation): ScoreTerm {
  const scored = evaluation.limits.filter((l): l is LimitEvaluation & { headroom: number } => l.scoresMargin && l.headroom !== null && l.isHard);
  const tight = evaluation.tightest;
  const unknown = evaluation.limits.filter((l) => l.verdict === 'unknown').length;
  const unknownText = unknown > 0 ? `; ${unknown} limit${unknown === 1 ? '' : 's'} unknown, not scored` : '';
  if (!tight || tight.headroom === null) return { points: 0, reason: `no margin could be judged${unknownText}` };
  const others = scored.filter((l) => l !== tight);
  const otherMean = others.length > 0 ? others.reduce((s, l) => s + marginValue(l.headroom), 0) / others.length : 0;
  const points = SCORE_WEIGHTS.tightest * marginValue(tight.headroom) + SCORE_WEIGHTS.others * otherMean;
  const rest = others.length > 0 ? `, the other ${others.length} average ${pct(others.reduce((s, l) => s + l.headroom, 0) / others.length)}` : '';
  return { points: round(points), reason: `tightest ${tight.label} ${pct(tight.headroom)} headroom${rest}${unknownText}` };
}

export function approvalTerm(part: Part): ScoreTerm {
  return { points: APPROVAL_POINTS[part.approval], reason: part.approval + (part.approvalNote ? `: ${part.approvalNote}` : '') };
}

const LIFECYCLE_WORDS: Readonly<Record<Lifecycle, string>> = { active: 'active', nrnd: 'not recommended for new designs', obsolete: 'obsolete' };

export function lifecycleTerm(part: Part): ScoreTerm {
  return { points: LIFECYCLE_POINTS[part.lifecycle], reason: LIFECYCLE_WORDS[part.lifecycle] };
}

/** Log price range per currency ('' for prices without one): prices compare only within a currency. */
export type PriceScale = Readonly<Record<string, { readonly lnMin: number; readonly lnMax: number }>>;

/** Smallest price used on the log scale: a price of 0 would be −∞. */
export const PRICE_FLOOR = 1e-6;

export const lnPrice = (price: number) => Math.log(Math.max(PRICE_FLOOR, price));

/** The log price range of the parts, per currency. */
export function priceScale(parts: readonly Part[]): PriceScale {
  const scale: Record<string, { lnMin: number; lnMax: number }> = {};
  for (const p of parts) {
    if (p.unitPrice === undefined) continue;
    const key = p.currency ?? '';
    const ln = lnPrice(p.unitPrice);
    const range = scale[key];
    scale[key] = range ? { lnMin: Math.min(range.lnMin, ln), lnMax: Math.max(range.lnMax, ln) } : { lnMin: ln, lnMax: ln };
  }
  return scale;
}

/** Points for a price: the cheapest candidate in its currency 10, the dearest 0, on a log scale; one price only: half. */
export function pricePoints(lnP: number, range: { lnMin: number; lnMax: number }): number {
  const span = range.lnMax - range.lnMin;
  if (span < 1e-12) return SCORE_WEIGHTS.price / 2;
  return SCORE_WEIGHTS.price * Math.min(1, Math.max(0, (range.lnMax - lnP) / span));
}

export function priceTerm(part: Part, scale: PriceScale): ScoreTerm {
  if (part.unitPrice === undefined) return { points: 0, reason: 'no price in the catalog' };
  const money = `${part.unitPrice}${part.currency ? ` ${part.currency}` : ''}`;
  const range = scale[part.currency ?? ''];
  if (!range) return { points: 0, reason: `${money}, no price range to compare it with` };
  if (range.lnMax - range.lnMin < 1e-12) return { points: SCORE_WEIGHTS.price / 2, reason: `${money}, the only price among the candidates` };
  const points = pricePoints(lnPrice(part.unitPrice), range);
  const share = points / SCORE_WEIGHTS.price;
  const where = share >= 1 - 1e-9 ? 'the cheapest' : share <= 1e-9 ? 'the dearest' : `${Math.round(share * 100)} % of the way from the dearest to the cheapest`;
  return { points: round(points), reason: `${money}, ${where} of the candidates in ${part.currency ?? 'its currency'} (log scale)` };
}

/** First preferred package 5 points, later ones fewer; none given: 0 for everyone. */
export function packageTerm(part: Part, preference: readonly string[]): ScoreTerm {
  if (preference.length === 0) return { points: 0, reason: 'no package preference given' };
  const i = preference.findIndex((p) => packageKey(p) === packageKey(part.package));
  if (i === -1) return { points: 0, reason: `${part.package} is not among ${preference.join(', ')}` };
  return { points: round(SCORE_WEIGHTS.package * (1 - i / preference.length)), reason: `${part.package}, preference ${i + 1} of ${preference.length}` };
}
