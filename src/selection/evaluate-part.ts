import type { DeratingPolicy } from '../circuits/derating.js';
import type { Limit } from '../circuits/limits.js';
import type { SolvedPosition } from '../circuits/role.js';
import { KIND_LABELS, type Part } from '../parts/index.js';
import { checkRating } from './check-rating.js';
import { checkDissipation, checkForwardDrop, checkJunctionTemperature, checkLeakage } from './check-thermal.js';
import { checkClampVoltage, checkPulsePower } from './check-tvs.js';
import { checkZenerPower, checkZenerVoltage } from './check-zener.js';
import type { EvaluateOptions, LimitEvaluation, PartEvaluation, ThermalEvaluation, Verdict } from './evaluation.js';
import { makeJudge, type Judge } from './judge.js';
import { solveThermal } from './thermal-model.js';

/**
 * How one part meets every limit of a solved position. Pure: the same part, position and policy
 * always give the same evaluation. The heat balance is solved once, and only when a limit needs it.
 */
export function evaluatePart(part: Part, position: SolvedPosition, policy: DeratingPolicy, options: EvaluateOptions = {}): PartEvaluation {
  const isExplaining = options.isExplaining ?? true;
  const j = makeJudge(isExplaining);
  let thermal: ThermalEvaluation | undefined;
  const heat = (): ThermalEvaluation => (thermal ??= solveThermal(part, position, policy, isExplaining));
  const exact = exactRequirements(position.limits);
  const limits = position.limits.map((limit) => evaluateLimit(j, part, limit, position, policy, heat, !exact.has(limit.id)));
  const verdict = overallVerdict(limits, options.unknownIsFailure ?? false);
  const notes: string[] = [];
  if (isExplaining && !position.suitableKinds.includes(part.kind)) {
    notes.push(`A ${KIND_LABELS[part.kind]} is not among the kinds that suit this position (${position.suitableKinds.join(', ')}).`);
  }
  const tightest = tightestOf(limits);
  return {
    part,
    verdict,
    summary: isExplaining ? summarise(verdict, limits, tightest, options.unknownIsFailure ?? false) : '',
    limits,
    tightest,
    ...(thermal ? { thermal } : {}),
    notes,
  };
}

function evaluateLimit(j: Judge, part: Part, limit: Limit, position: SolvedPosition, policy: DeratingPolicy, heat: () => ThermalEvaluation, scoresMargin: boolean): LimitEvaluation {
  const check = limit.check;
  if (check.kind === 'rating') return checkRating(j, part, limit, check.rating, scoresMargin);
  const op = position.operatingPoint;
  switch (check.what) {
    case 'junction-temperature': return checkJunctionTemperature(j, limit, heat());
    case 'leakage-at-temperature': return checkLeakage(j, part, limit, position, heat());
    case 'forward-drop': return checkForwardDrop(j, part, limit, position, heat());
    case 'dissipation': return checkDissipation(j, limit, heat());
    case 'zener-voltage': return checkZenerVoltage(j, part, limit, op);
    case 'zener-power': return checkZenerPower(j, part, limit, op);
    case 'clamp-voltage': return checkClampVoltage(j, part, limit, op);
    case 'pulse-power': return checkPulsePower(j, part, limit, op, policy);
  }
}

/**
 * Limits that pin a rating to one value (nominal VZ = requested: an at-least and an at-most limit
 * on the same rating with the same bound). Their headroom is always zero, so it is not scored.
 */
function exactRequirements(limits: readonly Limit[]): Set<string> {
  const ids = new Set<string>();
  for (const a of limits) {
    for (const b of limits) {
      if (a.check.kind === 'rating' && b.check.kind === 'rating' && a.check.rating === b.check.rating && a.check.relation !== b.check.relation && a.bound === b.bound) ids.add(a.id);
    }
  }
  return ids;
}

/**
 * Fail if a hard limit fails (or is unknown and unknowns count as failures); else unknown if a
 * hard limit is unknown; else marginal if any limit is marginal or a preference is unknown; else pass.
 */
export function overallVerdict(limits: readonly LimitEvaluation[], unknownIsFailure: boolean): Verdict {
  const hard = limits.filter((l) => l.isHard);
  if (hard.some((l) => l.verdict === 'fail' || (unknownIsFailure && l.verdict === 'unknown'))) return 'fail';
  if (hard.some((l) => l.verdict === 'unknown')) return 'unknown';
  if (limits.some((l) => l.verdict === 'marginal' || l.verdict === 'unknown')) return 'marginal';
  return 'pass';
}

/** The judged limit with the least headroom, hard ones first; exact requirements are skipped. */
function tightestOf(limits: readonly LimitEvaluation[]): LimitEvaluation | null {
  const scored = limits.filter((l) => l.scoresMargin && l.headroom !== null);
  const pool = scored.some((l) => l.isHard) ? scored.filter((l) => l.isHard) : scored;
  return pool.reduce<LimitEvaluation | null>((a, b) => (a === null || b.headroom! < a.headroom! ? b : a), null);
}

function summarise(verdict: Verdict, limits: readonly LimitEvaluation[], tightest: LimitEvaluation | null, unknownIsFailure: boolean): string {
  const worst = (v: Verdict) => limits.filter((l) => l.verdict === v);
  const labels = (list: readonly LimitEvaluation[]) => list.map((l) => l.label).join(', ');
  switch (verdict) {
    case 'fail': {
      const failed = worst('fail').filter((l) => l.isHard);
      const first = failed[0] ?? worst('unknown')[0];
      if (failed.length === 0 && unknownIsFailure) return `fails because unknowns count as failures: ${labels(worst('unknown'))} unknown`;
      return `fails ${labels(failed)}: ${first?.explanation ?? ''}`;
    }
    case 'unknown':
      return `cannot be judged on ${labels(worst('unknown').filter((l) => l.isHard))}: ${worst('unknown')[0]?.explanation ?? ''}`;
    case 'marginal': {
      const m = [...worst('marginal'), ...worst('unknown')];
      return `marginal on ${labels(m)}: ${m[0]?.explanation ?? ''}`;
    }
    default:
      return tightest ? `passes every limit; tightest: ${tightest.explanation}` : 'passes every limit';
  }
}
