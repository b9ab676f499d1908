import type { DeratingPolicy } from '../circuits/derating.js';
import type { SolvedPosition } from '../circuits/role.js';
import type { Part } from '../parts/index.js';
import { evaluatePart } from './evaluate-part.js';
import type { EvaluateOptions, PartEvaluation, Verdict } from './evaluation.js';
import {
  approvalTerm,
  lifecycleTerm,
  marginTerm,
  packageTerm,
  priceScale,
  priceTerm,
  type PriceScale,
  type ScoreParts,
} from './score-candidate.js';

export interface RankOptions extends EvaluateOptions {
  /** Rank banned parts too (scored down heavily). @default false */
  readonly includeBanned?: boolean;
  /** Rank obsolete parts too (scored down heavily). @default false */
  readonly includeObsolete?: boolean;
  /** Packages in order of preference, e.g. ["SOD-123", "SMA"]. */
  readonly packagePreference?: readonly string[];
  /**
   * The price range per currency prices are placed on. By default that of the candidates that meet
   * every hard rating limit; the catalog passes the same range read from its index over every part
   * its prefilter keeps.
   */
  readonly priceScale?: PriceScale;
}

export interface RankedCandidate {
  /** 1-based place; failed parts are numbered in their own list, closest first. */
  readonly rank: number;
  readonly evaluation: PartEvaluation;
  readonly score: number;
  readonly scoreParts: ScoreParts;
}

export interface Ranking {
  /** Parts that pass, then marginal ones, then ones that cannot be judged; each group by score. */
  readonly candidates: readonly RankedCandidate[];
  /** Parts that fail a hard limit, the closest to passing first. */
  readonly failed: readonly RankedCandidate[];
  /** Left out before evaluation: banned or obsolete, unless asked for. */
  readonly excluded: readonly { readonly part: Part; readonly reason: string }[];
  readonly passingCount: number;
}

const TIER: Record<Verdict, number> = { pass: 0, marginal: 1, unknown: 2, fail: 3 };

/** Why a part is left out before evaluation, or undefined when it stays. */
export function exclusionReason(part: Part, options: RankOptions): string | undefined {
  if (part.approval === 'banned' && !options.includeBanned) return `banned${part.approvalNote ? `: ${part.approvalNote}` : ''} (--include-banned to rank it)`;
  if (part.lifecycle === 'obsolete' && !options.includeObsolete) return 'obsolete (--include-obsolete to rank it)';
  return undefined;
}

/** Evaluates every part at the position and ranks them. */
export function rankCandidates(parts: readonly Part[], position: SolvedPosition, policy: DeratingPolicy, options: RankOptions = {}): Ranking {
  const excluded: { part: Part; reason: string }[] = [];
  const evaluations: PartEvaluation[] = [];
  for (const part of parts) {
    const reason = exclusionReason(part, options);
    if (reason) excluded.push({ part, reason });
    else evaluations.push(evaluatePart(part, position, policy, options));
  }
  return { ...rankEvaluations(evaluations, options), excluded: excluded.sort((a, b) => compareIdentity(a.part, b.part)) };
}

/**
 * Orders evaluations: verdict group (pass, marginal, unknown) first, then score, then maker and
 * part number, so equal scores always come out in the same order.
 */
export function rankEvaluations(evaluations: readonly PartEvaluation[], options: RankOptions = {}): Omit<Ranking, 'excluded'> {
  const live = evaluations.filter((e) => e.verdict !== 'fail');
  const failing = evaluations.filter((e) => e.verdict === 'fail');
  const scale = options.priceScale ?? priceScale(evaluations.filter(meetsRatings).map((e) => e.part));
  const score = (e: PartEvaluation) => scoreEvaluation(e, scale, options.packagePreference ?? []);
  const candidates = live
    .map(score)
    .sort((a, b) => TIER[a.evaluation.verdict] - TIER[b.evaluation.verdict] || b.score - a.score || compareIdentity(a.evaluation.part, b.evaluation.part))
    .map((c, i) => ({ ...c, rank: i + 1 }));
  // Sort keys worked out once per part, not at every comparison: a search ranks a hundred failures.
  const failed = failing
    .map((e) => ({ c: score(e), failures: failures(e), closeness: closeness(e) }))
    .sort((a, b) => a.failures - b.failures || b.closeness - a.closeness || compareIdentity(a.c.evaluation.part, b.c.evaluation.part))
    .map(({ c }, i) => ({ ...c, rank: i + 1 }));
  return { candidates, failed, passingCount: candidates.filter((c) => c.evaluation.verdict === 'pass').length };
}

/** The score of one evaluation and its visible parts; the price range is given, so it stands alone. */
export function scoreEvaluation(evaluation: PartEvaluation, scale: PriceScale, preference: readonly string[]): Omit<RankedCandidate, 'rank'> {
  const scoreParts: ScoreParts = {
    margin: marginTerm(evaluation),
    approval: approvalTerm(evaluation.part),
    lifecycle: lifecycleTerm(evaluation.part),
    price: priceTerm(evaluation.part, scale),
    package: packageTerm(evaluation.part, preference),
  };
  const total = Object.values(scoreParts).reduce((s, t) => s + t.points, 0);
  return { evaluation, score: Math.round(total * 100) / 100, scoreParts };
}

/** No hard rating limit fails: what the catalog's SQL prefilter also keeps. */
const meetsRatings = (e: PartEvaluation) => !e.limits.some((l) => l.isHard && l.checkKind === 'rating' && l.verdict === 'fail');

function failures(e: PartEvaluation): number {
  let n = 0;
  for (const l of e.limits) if (l.isHard && l.verdict === 'fail') n++;
  return n;
}

/** The worst headroom among the failed limits: nearer zero is closer to passing. */
function closeness(e: PartEvaluation): number {
  let worst = 0;
  for (const l of e.limits) if (l.verdict === 'fail' && l.headroom !== null) worst = Math.min(worst, l.headroom);
  return worst;
}

/** Maker, then part number, by code point: the catalog's canonical order. */
export function compareIdentity(a: Part, b: Part): number {
  const cmp = (x: string, y: string) => (x < y ? -1 : x > y ? 1 : 0);
  return cmp(a.manufacturer, b.manufacturer) || cmp(a.partNumber, b.partNumber);
}
