import type { Limit } from '../circuits/limits.js';
import type { QuantityKind } from '../units/index.js';
import type { LimitEvaluation, Verdict } from './evaluation.js';
import { explainMeasurement, explainUnknown, textOf, type Measurement, type Text } from './explain.js';

/** Values equal to a bound within this relative amount meet it (5.1 V parsed two ways). */
const EQUAL_REL = 1e-9;
/** Headroom is kept within [−10, 1] so a near-zero capability cannot produce −∞ (JSON has none). */
const HEADROOM_FLOOR = -10;

/**
 * Headroom = 1 − demand/capability, the fraction of the capability left unused. For "at least" the
 * part's value is the capability and the bound the demand; for "at most" the other way round.
 * Temperatures count from `origin` (the ambient): the unused part of the allowed rise.
 */
export function headroomOf(value: number, bound: number, relation: Limit['check']['relation'], origin = 0): number {
  const isAtLeast = relation === 'at-least';
  const capability = (isAtLeast ? value : bound) - origin;
  const demand = (isAtLeast ? bound : value) - origin;
  if (!(capability > 0)) return demand <= capability ? 0 : HEADROOM_FLOOR;
  return Math.max(HEADROOM_FLOOR, 1 - demand / capability);
}

function meets(value: number, bound: number, relation: Limit['check']['relation']): boolean {
  const slack = EQUAL_REL * Math.max(Math.abs(value), Math.abs(bound));
  return relation === 'at-least' ? value >= bound - slack : value <= bound + slack;
}

/**
 * The verdict rule: fail when the part misses the circuit's raw stress (hard limits only);
 * marginal when it meets the stress but not the derated bound, or misses a soft limit;
 * pass when it meets the derated bound.
 */
export function verdictOf(value: number, bound: number, stress: number, relation: Limit['check']['relation'], isHard: boolean): Verdict {
  if (meets(value, bound, relation)) return 'pass';
  if (isHard && !meets(value, stress, relation)) return 'fail';
  return 'marginal';
}

export interface JudgeOptions {
  readonly scoresMargin?: boolean;
  readonly verdict?: Verdict;
}

/**
 * Builds limit evaluations. With `isExplaining` false the verdicts and margins are the same but the
 * text is left empty, so ranking hundreds of parts spends no time formatting what nobody reads.
 */
export interface Judge {
  readonly isExplaining: boolean;
  /** A measured value against its bound and stress. */
  measured(limit: Limit, m: Measurement, options?: JudgeOptions): LimitEvaluation;
  /** A limit the catalog cannot decide: never a silent pass. */
  unknown(limit: Limit, reason: Text, quantity?: QuantityKind, extra?: { value?: number; method?: Text }): LimitEvaluation;
  /** A verdict reached without a number to compare (runaway, a surge that never reaches breakdown). */
  decided(limit: Limit, verdict: 'pass' | 'fail', explanation: Text, quantity?: QuantityKind): LimitEvaluation;
}

/** Every evaluation has one shape (method may be undefined): hundreds are built per search. */
function evaluation(limit: Limit, fields: Omit<LimitEvaluation, 'limitId' | 'label' | 'isHard' | 'checkKind' | 'relation'>): LimitEvaluation {
  return {
    limitId: limit.id,
    label: limit.label,
    isHard: limit.isHard,
    checkKind: limit.check.kind,
    relation: limit.check.relation,
    verdict: fields.verdict,
    value: fields.value,
    quantity: fields.quantity,
    bound: fields.bound,
    stress: fields.stress,
    headroom: fields.headroom,
    marginUnits: fields.marginUnits,
    scoresMargin: fields.scoresMargin,
    explanation: fields.explanation,
    method: fields.method,
  };
}

export function makeJudge(isExplaining: boolean): Judge {
  const say = (t: Text | undefined) => (isExplaining ? textOf(t) : undefined);
  return {
    isExplaining,
    measured(limit, m, options = {}) {
      const relation = limit.check.relation;
      const verdict = options.verdict ?? verdictOf(m.value, m.bound, m.stress, relation, limit.isHard);
      const headroom = headroomOf(m.value, m.bound, relation, m.origin);
      const marginUnits = relation === 'at-least' ? m.value - m.bound : m.bound - m.value;
      const scoresMargin = options.scoresMargin ?? true;
      const isExact = !scoresMargin && Math.abs(m.value - m.bound) <= EQUAL_REL * Math.abs(m.bound);
      return evaluation(limit, {
        verdict, value: m.value, quantity: m.quantity, bound: m.bound, stress: m.stress, headroom, marginUnits, scoresMargin,
        explanation: isExplaining ? explainMeasurement(limit, m, { verdict, headroom, marginUnits, isExact }) : '',
        method: say(m.method),
      });
    },
    unknown(limit, reason, quantity = limit.quantity, extra = {}) {
      return evaluation(limit, {
        verdict: 'unknown', value: extra.value ?? null, quantity, bound: null, stress: null, headroom: null, marginUnits: null, scoresMargin: true,
        explanation: isExplaining ? explainUnknown(limit, textOf(reason)!) : '',
        method: say(extra.method),
      });
    },
    decided(limit, verdict, explanation, quantity = limit.quantity) {
      return evaluation(limit, {
        verdict: limit.isHard || verdict === 'pass' ? verdict : 'marginal',
        value: null, quantity, bound: null, stress: null,
        headroom: verdict === 'pass' ? 1 : HEADROOM_FLOOR,
        marginUnits: null, scoresMargin: true,
        explanation: say(explanation) ?? '',
        method: undefined,
      });
    },
  };
}
