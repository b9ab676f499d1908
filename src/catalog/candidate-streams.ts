import type BetterSqlite3 from 'better-sqlite3';
import type { SolvedPosition } from '../circuits/role.js';
import { APPROVAL_STATES, LIFECYCLES, type Part } from '../parts/index.js';
import { APPROVAL_POINTS, LIFECYCLE_POINTS, lnPrice, pricePoints, type PriceScale } from '../selection/index.js';
import type { CandidateHeap, BoundedRow } from './candidate-heap.js';
import { MARGIN_CEILING, priceParams, streamParams, type SqlValue, type StreamSql } from './candidates-sql.js';
import { ROW_COLUMNS, valuesToPart } from './part-rows.js';

/*
 * The streams of a candidate search: the parts of one kind, approval, lifecycle and currency that
 * meet the rating prefilter, read cheapest first along the part_candidate index (migration 005).
 */

/** Rows read from a stream at a time. */
const READ_BATCH = 128;

export interface Stream {
  readonly key: readonly SqlValue[];
  readonly classPoints: number;
  readonly currency: string;
  readonly isPriced: boolean;
  /** Bound of any row not yet read from the stream; −∞ when exhausted. */
  bound: number;
  /** Keyset of the last row read: (price, id), or (bound, id) for unpriced parts. */
  after: [number, number];
}

export interface StreamOptions {
  readonly includeBanned?: boolean;
  readonly includeObsolete?: boolean;
}

const statements = new WeakMap<BetterSqlite3.Database, Map<string, BetterSqlite3.Statement>>();

/** Statements are prepared once per catalog connection and SQL text. */
export function prepared(db: BetterSqlite3.Database, sql: string): BetterSqlite3.Statement {
  let cache = statements.get(db);
  if (!cache) statements.set(db, (cache = new Map()));
  let statement = cache.get(sql);
  if (!statement) cache.set(sql, (statement = db.prepare(sql)));
  return statement;
}

/** Every stream of the suitable kinds, and the price range per currency of the parts they keep. */
export function openStreams(db: BetterSqlite3.Database, position: SolvedPosition, options: StreamOptions, sql: StreamSql, filter: { params: readonly SqlValue[] }, slack: number): { streams: Stream[]; scale: PriceScale } {
  const approvals = APPROVAL_STATES.filter((a) => a !== 'banned' || options.includeBanned);
  const lifecycles = LIFECYCLES.filter((l) => l !== 'obsolete' || options.includeObsolete);
  const streams: Stream[] = [];
  const ranges: Record<string, { lnMin: number; lnMax: number }> = {};
  for (const kind of position.suitableKinds) {
    for (const approval of approvals) {
      for (const lifecycle of lifecycles) {
        const currencies = (prepared(db, sql.currencies).all(kind, approval, lifecycle, kind, approval, lifecycle) as { currency: string }[]).map((r) => r.currency);
        const classPoints = APPROVAL_POINTS[approval] + LIFECYCLE_POINTS[lifecycle] + slack;
        for (const currency of [null, ...currencies]) {
          const key = streamParams(kind, approval, lifecycle, currency, filter);
          const low = prepared(db, sql.cheapest).get(...key) as { price: number } | undefined;
          const base = { key, classPoints, currency: currency ?? '', after: [Number.NEGATIVE_INFINITY, 0] as [number, number] };
          // Parts without a price first bound themselves by margin alone; their stream is read best-first.
          streams.push({ ...base, isPriced: false, bound: classPoints + MARGIN_CEILING });
          if (!low) continue;
          const high = prepared(db, sql.dearest).get(...key) as { price: number };
          const range = (ranges[currency ?? ''] ??= { lnMin: lnPrice(low.price), lnMax: lnPrice(high.price) });
          range.lnMin = Math.min(range.lnMin, lnPrice(low.price));
          range.lnMax = Math.max(range.lnMax, lnPrice(high.price));
          // Ids start at 1: (cheapest, 0) sorts before every row of the stream.
          streams.push({ ...base, isPriced: true, bound: Number.NaN, after: [low.price, 0] });
        }
      }
    }
  }
  // A priced stream's bound: class points, the price points of its cheapest unread price, the best margin.
  for (const s of streams) if (s.isPriced) s.bound = s.classPoints + pricePoints(lnPrice(s.after[0]), ranges[s.currency]!) + MARGIN_CEILING;
  return { streams, scale: ranges as PriceScale };
}

/** Reads the next rows of a stream above the threshold into the pending list (kept best first). */
export function readStream(db: BetterSqlite3.Database, sql: StreamSql, s: Stream, scale: PriceScale, margin: { params: readonly SqlValue[] }, threshold: number, pending: CandidateHeap): number {
  const floor = Number.isFinite(threshold) ? threshold : -1e9;
  let rows: BoundedRow[];
  if (s.isPriced) {
    const range = scale[s.currency]!;
    rows = prepared(db, sql.priced).all(s.classPoints, ...priceParams(range), ...margin.params, ...s.key, s.after[0], s.after[1], floor, READ_BATCH) as BoundedRow[];
    const last = rows[rows.length - 1];
    if (last) s.after = [last.price!, last.id];
    s.bound = rows.length < READ_BATCH ? Number.NEGATIVE_INFINITY : s.classPoints + pricePoints(lnPrice(s.after[0]), range) + MARGIN_CEILING;
  } else {
    const [ub, id] = s.after[0] === Number.NEGATIVE_INFINITY ? [1e9, 0] : s.after;
    rows = prepared(db, sql.unpriced).all(s.classPoints, ...margin.params, ...s.key, ub, ub, id, floor, READ_BATCH) as BoundedRow[];
    const last = rows[rows.length - 1];
    if (last) s.after = [last.ub, last.id];
    s.bound = rows.length < READ_BATCH ? Number.NEGATIVE_INFINITY : s.after[0];
  }
  for (const row of rows) pending.push(row);
  return rows.length;
}

/** Full rows for the ids, in the order given. */
export function readParts(db: BetterSqlite3.Database, ids: readonly number[]): Part[] {
  // One rowid lookup each: measured several times quicker on a cold 1 M-part catalog than one
  // statement over a json_each list of the ids (bench/README.md, pick). Values as arrays: quicker
  // than 45-key row objects; the SQL text is this function's own, so its cached statement is raw.
  const byId = prepared(db, `SELECT ${ROW_COLUMNS.join(', ')} FROM part WHERE id = ? -- read raw`).raw(true);
  return ids.flatMap((id) => {
    const values = byId.get(id) as (string | number | null)[] | undefined;
    return values ? [valuesToPart(values)] : [];
  });
}
