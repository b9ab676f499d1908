import { PART_KINDS, type ApprovalState, type Part, type PartKind } from '../parts/index.js';
import type BetterSqlite3 from 'better-sqlite3';
import { CatalogError } from './catalog-error.js';
import type { Catalog } from './open-catalog.js';
import { ROW_COLUMNS, comparePartIdentity, partToRow, rowToPart, type PartRow } from './part-rows.js';
import { deferSearchIndex } from './search/bulk-index.js';
import { searchKey } from '../selection/query/search-text.js';
import { IDENTITY_WHERE, NUMBER_WHERE, identityParams, numberParams } from './identity-sql.js';

export interface WriteSummary {
  readonly added: number;
  readonly updated: number;
  readonly unchanged: number;
}

export interface WriteContext {
  /** Who made the change: the OS user or the --by option. */
  readonly by: string;
  /** Why, for the approval trail, e.g. "import of parts.csv". */
  readonly reason: string;
  /** ISO time; a parameter so tests can fix it. */
  readonly at?: string;
}

// The search key is stored by the writer (migration 006): the triggers that would fill it stay idle.
const INSERT_SQL = `INSERT INTO part (${ROW_COLUMNS.join(', ')}, search_key, updated_at)
  VALUES (${ROW_COLUMNS.map((c) => '@' + c).join(', ')}, @search_key, @updated_at)`;
const UPDATE_SQL = `UPDATE part SET ${ROW_COLUMNS.map((c) => `${c} = @${c}`).join(', ')}, updated_at = @updated_at WHERE id = @id`;
const SELECT_IDENTITY_SQL = `SELECT id, ${ROW_COLUMNS.join(', ')} FROM part WHERE ${IDENTITY_WHERE}`;
const EVENT_SQL = `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason)
  VALUES (?, ?, ?, ?, ?, ?, ?, ?)`;

function sameRow(a: PartRow, b: PartRow): boolean {
  return ROW_COLUMNS.every((c) => (a[c] ?? null) === (b[c] ?? null));
}

/**
 * Adds new parts and updates existing ones (same maker and part number, any letter case)
 * in one write transaction: all of them or none. Approval changes enter the trail.
 */
export function writeParts(catalog: Catalog, parts: readonly Part[], context: WriteContext): WriteSummary {
  const { db } = catalog;
  const insert = db.prepare(INSERT_SQL);
  const update = db.prepare(UPDATE_SQL);
  const select = db.prepare(SELECT_IDENTITY_SQL);
  const event = db.prepare(EVENT_SQL);
  const at = context.at ?? new Date().toISOString();
  const run = db.transaction(() => {
    // A large write indexes its new parts for search in one statement at the end.
    const finishSearchIndex = deferSearchIndex(db, parts.length);
    let added = 0;
    let updated = 0;
    let unchanged = 0;
    for (const part of parts) {
      const row = partToRow(part);
      const existing = select.get(...identityParams(part.manufacturer, part.partNumber)) as (PartRow & { id: number }) | undefined;
      if (!existing) {
        insert.run({ ...row, search_key: searchKey(part.partNumber), updated_at: at });
        event.run(part.manufacturer, part.partNumber, at, context.by, null, part.approval, part.approvalNote ?? null, context.reason);
        added++;
      } else if (sameRow(existing, row)) {
        unchanged++;
      } else {
        update.run({ ...row, updated_at: at, id: existing.id });
        if (existing.approval !== part.approval || (existing.approval_note ?? null) !== (part.approvalNote ?? null)) {
          event.run(part.manufacturer, part.partNumber, at, context.by, existing.approval, part.approval, part.approvalNote ?? null, context.reason);
        }
        updated++;
      }
    }
    finishSearchIndex();
    return { added, updated, unchanged };
  });
  return run.immediate();
}

export interface PartFilter {
  readonly kind?: PartKind;
  readonly approval?: ApprovalState;
  readonly manufacturer?: string;
}

export function listParts(catalog: Catalog, filter: PartFilter = {}): Part[] {
  const where: string[] = [];
  const params: string[] = [];
  if (filter.kind) {
    where.push('kind = ?');
    params.push(filter.kind);
  }
  if (filter.approval) {
    where.push('approval = ?');
    params.push(filter.approval);
  }
  if (filter.manufacturer) {
    where.push('manufacturer = ? COLLATE NOCASE');
    params.push(filter.manufacturer);
  }
  const sql = `SELECT ${ROW_COLUMNS.join(', ')} FROM part ${where.length ? 'WHERE ' + where.join(' AND ') : ''}`;
  const rows = catalog.db.prepare(sql).all(...params) as PartRow[];
  return rows.map(rowToPart).sort(comparePartIdentity);
}

export function countParts(catalog: Catalog): number {
  return (catalog.db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n;
}

/**
 * Finds one part from what a person types: "PART-NUMBER" or "Manufacturer:PART-NUMBER",
 * letter case ignored. Unknown or ambiguous references are errors that say what to type.
 */
// Prepared once per connection: an audit looks up hundreds of parts.
const LOOKUPS = new WeakMap<BetterSqlite3.Database, { byIdentity: BetterSqlite3.Statement; byNumber: BetterSqlite3.Statement }>();

function lookupStatements(db: BetterSqlite3.Database) {
  let found = LOOKUPS.get(db);
  if (!found) {
    found = {
      byIdentity: db.prepare(`SELECT ${ROW_COLUMNS.join(', ')} FROM part WHERE ${IDENTITY_WHERE}`),
      byNumber: db.prepare(`SELECT ${ROW_COLUMNS.join(', ')} FROM part WHERE ${NUMBER_WHERE}`),
    };
    LOOKUPS.set(db, found);
  }
  return found;
}

export function findPart(catalog: Catalog, reference: string): Part {
  const text = reference.trim();
  const colon = text.indexOf(':');
  const statements = lookupStatements(catalog.db);
  const rows = (colon > 0
    ? statements.byIdentity.all(...identityParams(text.slice(0, colon).trim(), text.slice(colon + 1).trim()))
    : statements.byNumber.all(...numberParams(text))) as PartRow[];
  if (rows.length === 0) {
    throw new CatalogError('unknown-part', `no part "${text}" in ${catalog.path}`, 'list parts with `headroom catalog list`');
  }
  if (rows.length > 1) {
    const makers = rows.map((r) => `${r.manufacturer}:${r.part_number}`).join(', ');
    throw new CatalogError('ambiguous-part', `"${text}" is made by more than one maker: ${makers}`, 'write it as MANUFACTURER:PART-NUMBER');
  }
  return rowToPart(rows[0]!);
}

export function isPartKind(text: string): text is PartKind {
  return (PART_KINDS as readonly string[]).includes(text);
}
