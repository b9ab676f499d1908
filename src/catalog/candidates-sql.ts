import type { Limit, RatedField } from '../circuits/limits.js';
import type { SolvedPosition } from '../circuits/role.js';
import { PART_FIELDS, requiredRatings, type PartKind } from '../parts/index.js';
import { formatQuantity } from '../units/index.js';
import { HALF_SCORE_HEADROOM, PRICE_FLOOR, SCORE_WEIGHTS, marginValue } from '../selection/index.js';

/*
 * SQL of a candidate search. Parts are read in "streams": one per kind, approval, lifecycle and
 * currency, cheapest first, along the part_candidate index (migration 005), keeping only parts
 * that meet the hard rating limits at the circuit's raw stress (so marginal parts still appear).
 * Each row carries an upper bound of its final score; see docs/ranking.md.
 */

export type SqlValue = string | number | null;

export interface PrefilterOptions {
  readonly includeBanned?: boolean;
  readonly includeObsolete?: boolean;
  readonly unknownIsFailure?: boolean;
}

const COLUMN: Readonly<Record<string, string>> = Object.fromEntries(PART_FIELDS.map((f) => [f.key, f.column]));
/** Must match the comparison slack of selection's judge: 5.1 V equals 5.1 V however it was parsed. */
const EQUAL_REL = 1e-9;
/** A Schottky without trr or Qrr is taken as recovering instantly, so a NULL there must not be filtered out. */
const RECOVERY: ReadonlySet<RatedField> = new Set(['trrS', 'qrrC']);
/** Headroom never exceeds 1, so no margin term exceeds this (tightest plus the others' mean). */
export const MARGIN_CEILING = (SCORE_WEIGHTS.tightest + SCORE_WEIGHTS.others) * marginValue(1);

/** True when every kind requires the rating (part-schema.ts), so the column is never NULL for them. */
function isAlwaysPresent(field: RatedField, kinds: readonly PartKind[]): boolean {
  return kinds.every((kind) => requiredRatings(kind).includes(field));
}

type RatingLimit = Limit & { check: { kind: 'rating'; rating: RatedField } };

function ratingLimits(position: SolvedPosition): RatingLimit[] {
  return position.limits.filter((l): l is RatingLimit => l.isHard && l.check.kind === 'rating');
}

export interface SqlPart {
  readonly sql: string;
  readonly params: readonly SqlValue[];
}

/** The hard rating limits at the raw stress; a rating some kind may leave out passes when missing. */
export function ratingFilter(position: SolvedPosition, options: PrefilterOptions): SqlPart & { readonly described: readonly string[] } {
  const kinds = position.suitableKinds as PartKind[];
  const terms: string[] = [];
  const params: SqlValue[] = [];
  const described: string[] = [`kind one of ${kinds.join(', ')}`];
  if (!options.includeBanned) described.push('not banned');
  if (!options.includeObsolete) described.push('not obsolete');
  for (const limit of ratingLimits(position)) {
    const column = COLUMN[limit.check.rating]!;
    const isAtLeast = limit.check.relation === 'at-least';
    const test = `${column} ${isAtLeast ? '>=' : '<='} ?`;
    const keepsNull = !isAlwaysPresent(limit.check.rating, kinds) && (!options.unknownIsFailure || RECOVERY.has(limit.check.rating));
    terms.push(keepsNull ? `(${column} IS NULL OR ${test})` : test);
    params.push(limit.stress * (isAtLeast ? 1 - EQUAL_REL : 1 + EQUAL_REL));
    described.push(`${limit.label} ${isAtLeast ? '≥' : '≤'} ${formatQuantity(limit.stress, limit.quantity)} (raw stress)${keepsNull ? ' or not given' : ''}`);
  }
  return { sql: terms.length > 0 ? terms.join(' AND ') : '1', params, described };
}

/**
 * Upper bound of the margin term from the ratings alone. The score is 60·g(tightest headroom) +
 * 10·mean g(the other hard limits); computed limits can only lower the tightest headroom and add at
 * most g(1) each to the others, so the bound is 60·g(hmin) + 10·(Σg − g(hmin) + nc·g(1))/(n − 1)
 * over the rating limits (n hard scored limits, nc computed). Exact requirements (nominal VZ) are
 * not scored; a missing rating counts as headroom 1 (a Schottky's trr, or unscored when unknown).
 */
export function marginBound(position: SolvedPosition): SqlPart {
  const list = ratingLimits(position);
  const scored = list.filter((a) => !list.some((b) => b !== a && b.check.rating === a.check.rating && b.check.relation !== a.check.relation && b.bound === a.bound));
  const computed = position.limits.filter((l) => l.isHard && l.check.kind === 'computed').length;
  const n = scored.length + computed;
  const params: SqlValue[] = [];
  const gOf = (limit: RatingLimit) => {
    const column = COLUMN[limit.check.rating]!;
    params.push(limit.bound, limit.bound, limit.bound, limit.bound);
    const h = limit.check.relation === 'at-least' ? `coalesce(1.0 - ?/${column}, 1.0)` : `coalesce(1.0 - ${column}/?, 1.0)`;
    return gSql(h);
  };
  const gs = scored.map(gOf);
  const best = SCORE_WEIGHTS.tightest * marginValue(1);
  if (gs.length === 0) return { sql: `${best + (n > 1 ? SCORE_WEIGHTS.others * marginValue(1) : 0)}`, params: [] };
  // min() and max() need two arguments to be the scalar functions.
  const gMin = `min(${[...gs, '1.0'].join(', ')})`;
  const others = n > 1 ? ` + ${SCORE_WEIGHTS.others} * ((${gs.join(' + ')}) - ${gMin} + ${computed * marginValue(1)}) / ${n - 1}` : '';
  // The text holds min(g…), then the sum and min(g…) again: their parameters in that order.
  return { sql: `(${SCORE_WEIGHTS.tightest} * ${gMin}${others})`, params: n > 1 ? [...params, ...params, ...params] : params };
}

/** g(h) of score-candidate.ts in SQL; h is an expression with one parameter, written four times. */
function gSql(h: string): string {
  return `(CASE WHEN ${h} >= 0 THEN ${h}/(${h} + ${HALF_SCORE_HEADROOM}) ELSE max(-1.0, ${h}/${HALF_SCORE_HEADROOM}) END)`;
}

const STREAM = 'kind = ? AND approval = ? AND lifecycle = ? AND currency IS ?';

export interface StreamSql {
  /** Distinct currencies of one kind, approval and lifecycle, by a skip scan of the index. */
  readonly currencies: string;
  /** Cheapest and dearest price of a stream's matching parts. */
  readonly cheapest: string;
  readonly dearest: string;
  /**
   * Next matching parts of a priced stream after (price, id), with each row's score bound `ub`;
   * rows at or below a threshold are skipped. Parameters: class points, price range (lnMax, span,
   * half-points flag), the margin bound's, the stream's, the filter's, price, id, threshold, limit.
   */
  readonly priced: string;
  /** The same for parts without a price, best bound first, after (ub, id). */
  readonly unpriced: string;
}

export function streamSql(filter: SqlPart, margin: SqlPart): StreamSql {
  const where = `${STREAM} AND ${filter.sql}`;
  const price = `(CASE WHEN ? > 0 THEN ${SCORE_WEIGHTS.price / 2} ELSE ${SCORE_WEIGHTS.price} * min(1.0, max(0.0, (? - ln(max(unit_price, ${PRICE_FLOOR}))) / ?)) END)`;
  const next = (column: string) => `(SELECT ${column} FROM part WHERE kind = ? AND approval = ? AND lifecycle = ? AND ${column} > c.x ORDER BY ${column} LIMIT 1)`;
  return {
    currencies: `WITH RECURSIVE c(x) AS (
        SELECT (SELECT currency FROM part WHERE kind = ? AND approval = ? AND lifecycle = ? AND currency IS NOT NULL ORDER BY currency LIMIT 1)
        UNION ALL SELECT ${next('currency')} FROM c WHERE c.x IS NOT NULL)
      SELECT x AS currency FROM c WHERE x IS NOT NULL`,
    cheapest: `SELECT unit_price AS price FROM part WHERE ${where} AND unit_price IS NOT NULL ORDER BY unit_price LIMIT 1`,
    dearest: `SELECT unit_price AS price FROM part WHERE ${where} AND unit_price IS NOT NULL ORDER BY unit_price DESC LIMIT 1`,
    priced: `SELECT id, unit_price AS price, ? + ${price} + ${margin.sql} AS ub FROM part
      WHERE ${where} AND unit_price IS NOT NULL AND (unit_price, id) > (?, ?) AND ub > ?
      ORDER BY unit_price, id LIMIT ?`,
    unpriced: `SELECT id, NULL AS price, ? + ${margin.sql} AS ub FROM part
      WHERE ${where} AND unit_price IS NULL AND (ub < ? OR (ub = ? AND id > ?)) AND ub > ?
      ORDER BY ub DESC, id LIMIT ?`,
  };
}

export function streamParams(kind: string, approval: string, lifecycle: string, currency: string | null, filter: { readonly params: readonly SqlValue[] }): SqlValue[] {
  return [kind, approval, lifecycle, currency, ...filter.params];
}

/** Parameters of the price term: 1 when all prices of the currency are equal (half points). */
export function priceParams(range: { lnMin: number; lnMax: number }): SqlValue[] {
  const span = range.lnMax - range.lnMin;
  return span < 1e-12 ? [1, 0, 1] : [0, range.lnMax, span];
}
