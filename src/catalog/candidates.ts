import type { DeratingPolicy } from '../circuits/derating.js';
import type { SolvedPosition } from '../circuits/role.js';
import type { Part } from '../parts/index.js';
import {
  SCORE_WEIGHTS,
  evaluatePart,
  exclusionReason,
  rankEvaluations,
  scoreEvaluation,
  type PartEvaluation,
  type PriceScale,
  type RankOptions,
  type RankedCandidate,
  type Ranking,
} from '../selection/index.js';
import { CandidateHeap, type BoundedRow } from './candidate-heap.js';
import { openStreams, readParts, readStream, type Stream } from './candidate-streams.js';
import { marginBound, ratingFilter, streamSql } from './candidates-sql.js';
import type { Catalog } from './open-catalog.js';

export interface CandidateOptions extends RankOptions {
  /** Passing parts wanted at the top of the ranking (the --top). @default 10 */
  readonly wanted?: number;
  /** Stop after evaluating this many parts even if the top is not proven. @default 120 */
  readonly maxEvaluated?: number;
  /** Parts always evaluated and placed in the ranking, e.g. the part a design assigns. */
  readonly pinned?: readonly Part[];
}

/** Where a pinned part stands: its place in the candidates or the failures, or why it was left out. */
export interface PinnedPlace {
  readonly part: Part;
  readonly list: 'candidates' | 'failed' | 'excluded';
  /** 1-based place in its list; null when excluded. */
  readonly rank: number | null;
  readonly candidate: RankedCandidate | null;
  readonly reason?: string;
}

export interface CandidateSearch {
  /** The `wanted` best candidates, then the closest failures to fill the list up to `wanted`, explained. */
  readonly ranking: Ranking;
  /** Evaluated parts that did not fail, and that failed, before the ranking was cut to `wanted`. */
  readonly candidateCount: number;
  readonly failedCount: number;
  readonly pinned: readonly PinnedPlace[];
  /** Index rows read: parts that meet the prefilter and whose score bound was still in the running. */
  readonly read: number;
  readonly evaluated: number;
  /**
   * True when the passing parts shown are provably the best of every part the prefilter keeps:
   * every part not evaluated has a score bound below the last of them.
   */
  readonly isComplete: boolean;
  readonly prefilter: readonly string[];
  readonly priceScale: PriceScale;
}

/** Parts evaluated at a time. */
const EVALUATE_BATCH = 8;
/** Rounded scores may exceed an exact bound by half a hundredth. */
const ROUNDING = 0.01;

const identity = (p: Part) => `${p.manufacturer}\u0000${p.partNumber}`.toLowerCase();

/**
 * Candidates for a solved position, best first, by a threshold search: parts are read cheapest
 * first from each (kind, approval, lifecycle, currency) stream of the part_candidate index, each
 * with an upper bound of its final score, and evaluated with the physics in order of that bound,
 * until the `wanted` best passing parts all score above every bound not yet evaluated.
 */
export function findCandidates(catalog: Catalog, position: SolvedPosition, policy: DeratingPolicy, options: CandidateOptions = {}): CandidateSearch {
  const db = catalog.db;
  const wanted = Math.max(1, options.wanted ?? 10);
  const maxEvaluated = Math.max(wanted, options.maxEvaluated ?? 120);
  const filter = ratingFilter(position, options);
  const margin = marginBound(position);
  const sql = streamSql(filter, margin);
  const preference = options.packagePreference ?? [];
  const { streams, scale } = openStreams(db, position, options, sql, filter, preference.length > 0 ? SCORE_WEIGHTS.package : 0);
  const quietly = { ...options, isExplaining: false };

  const pinned = (options.pinned ?? []).filter((p) => !exclusionReason(p, options));
  const pinnedIds = new Set(pinned.map(identity));
  const evaluations: PartEvaluation[] = pinned.map((p) => evaluatePart(p, position, policy, quietly));
  const passing: number[] = [];
  const pending = new CandidateHeap();
  let read = 0;
  let isComplete = false;
  const threshold = () => (passing.length >= wanted ? passing[wanted - 1]! - ROUNDING : Number.NEGATIVE_INFINITY);
  const searched = () => evaluations.length - pinned.length;
  while (searched() < maxEvaluated) {
    const top = streams.reduce<Stream | undefined>((best, s) => (s.bound > (best?.bound ?? Number.NEGATIVE_INFINITY) ? s : best), undefined);
    const streamBound = top?.bound ?? Number.NEGATIVE_INFINITY;
    const rowBound = pending.peek()?.ub ?? Number.NEGATIVE_INFINITY;
    if (Math.max(streamBound, rowBound) <= threshold() || (top === undefined && pending.size === 0)) {
      isComplete = true;
      break;
    }
    if (top && streamBound > rowBound) {
      read += readStream(db, sql, top, scale, margin, threshold(), pending);
      continue;
    }
    // Evaluate the best pending rows, as long as no stream could still hold a better one.
    const batch: BoundedRow[] = [];
    while (batch.length < EVALUATE_BATCH && pending.size > 0 && pending.peek()!.ub >= streamBound && searched() + batch.length < maxEvaluated) batch.push(pending.pop()!);
    for (const part of readParts(db, batch.map((r) => r.id))) {
      if (pinnedIds.has(identity(part))) continue;
      const evaluation = evaluatePart(part, position, policy, quietly);
      evaluations.push(evaluation);
      if (evaluation.verdict === 'pass') {
        passing.push(scoreEvaluation(evaluation, scale, preference).score);
        passing.sort((a, b) => b - a);
      }
    }
  }
  const ranked = rankEvaluations(evaluations, { ...options, priceScale: scale });
  // Explain only what is shown: the same part, position and policy give the same verdicts and scores.
  const explain = (c: RankedCandidate): RankedCandidate => ({ ...c, evaluation: evaluatePart(c.evaluation.part, position, policy, { ...options, isExplaining: true }) });
  const shown = ranked.candidates.slice(0, wanted);
  return {
    ranking: { candidates: shown.map(explain), failed: ranked.failed.slice(0, wanted - shown.length).map(explain), excluded: [], passingCount: ranked.passingCount },
    candidateCount: ranked.candidates.length,
    failedCount: ranked.failed.length,
    pinned: (options.pinned ?? []).map((part) => placeOf(part, ranked, options, explain)),
    read,
    evaluated: searched(),
    isComplete,
    prefilter: filter.described,
    priceScale: scale,
  };
}

function placeOf(part: Part, ranked: Omit<Ranking, 'excluded'>, options: RankOptions, explain: (c: RankedCandidate) => RankedCandidate): PinnedPlace {
  const reason = exclusionReason(part, options);
  if (reason) return { part, list: 'excluded', rank: null, candidate: null, reason };
  for (const list of ['candidates', 'failed'] as const) {
    const found = ranked[list].find((c) => identity(c.evaluation.part) === identity(part));
    if (found) return { part, list, rank: found.rank, candidate: explain(found) };
  }
  return { part, list: 'excluded', rank: null, candidate: null, reason: 'not evaluated' };
}
