import type { Limit, RatedField } from '../circuits/limits.js';
import { junctionFamily, type Part } from '../parts/index.js';
import type { LimitEvaluation } from './evaluation.js';
import type { Judge } from './judge.js';

/** Recovery ratings a Schottky datasheet leaves out because there is no stored charge to recover. */
const RECOVERY_FIELDS: ReadonlySet<RatedField> = new Set(['trrS', 'qrrC']);

const SCHOTTKY_RECOVERY = 'no trr or Qrr given; a Schottky junction stores no minority carriers, so recovery is taken as none (capacitive charge only)';

/**
 * A rating limit: the catalog value itself against the bound and the raw stress. A missing
 * value is unknown, except a Schottky's recovery time or charge, which is zero by physics.
 */
export function checkRating(j: Judge, part: Part, limit: Limit, rating: RatedField, scoresMargin: boolean): LimitEvaluation {
  const raw = (part as unknown as Partial<Record<RatedField, number>>)[rating];
  const hasNoRecovery = raw === undefined && RECOVERY_FIELDS.has(rating) && junctionFamily(part.kind) !== 'pn';
  if (raw === undefined && !hasNoRecovery) {
    return j.unknown(limit, () => `the catalog gives no ${limit.label} for this part`);
  }
  return j.measured(
    limit,
    {
      value: raw ?? 0,
      bound: limit.bound,
      stress: limit.stress,
      quantity: limit.quantity,
      ...(hasNoRecovery ? { context: '(Schottky)', method: SCHOTTKY_RECOVERY } : {}),
    },
    { scoresMargin },
  );
}
