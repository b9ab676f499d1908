import type { Part } from '../parts/index.js';
import type { Catalog } from './open-catalog.js';
import type { WriteContext } from './part-repository.js';
import { ROW_COLUMNS, partToRow, rowToPart, type PartRow } from './part-rows.js';
import { IDENTITY_WHERE, identityParams } from './identity-sql.js';

export type PartUpdate =
  | {
      readonly ok: true;
      /** The part as stored now. */
      readonly part: Part;
      /** False when the edit matched the stored row: nothing was written. */
      readonly isChanged: boolean;
      /** An approval_event was appended (the state or its note changed). */
      readonly isApprovalChanged: boolean;
    }
  | { readonly ok: false; readonly code: 'unknown-part' | 'duplicate-part'; readonly message: string };

const SELECT_BY_IDENTITY = `SELECT id, ${ROW_COLUMNS.join(', ')} FROM part WHERE ${IDENTITY_WHERE}`;
const OTHER_WITH_IDENTITY = `SELECT id FROM part WHERE ${IDENTITY_WHERE} AND id <> ?`;
const UPDATE_BY_ID = `UPDATE part SET ${ROW_COLUMNS.map((c) => `${c} = @${c}`).join(', ')}, updated_at = @updated_at WHERE id = @id`;
const EVENT_SQL = `INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason)
  VALUES (?, ?, ?, ?, ?, ?, ?, ?)`;

const ref = (p: Pick<Part, 'manufacturer' | 'partNumber'>) => `${p.manufacturer}:${p.partNumber}`;

/**
 * Rewrites one stored part with edited values, in one write transaction. The row found by the
 * original's maker and part number is updated in place (same row, so search stays indexed); a new
 * maker or part number is refused when another part already has it. The approval trail gains an
 * entry only when the approval state or its condition changes.
 */
export function updatePart(catalog: Catalog, original: Pick<Part, 'manufacturer' | 'partNumber'>, edited: Part, context: WriteContext): PartUpdate {
  const { db } = catalog;
  const at = context.at ?? new Date().toISOString();
  const run = db.transaction((): PartUpdate => {
    const existing = db.prepare(SELECT_BY_IDENTITY).get(...identityParams(original.manufacturer, original.partNumber)) as (PartRow & { id: number }) | undefined;
    if (!existing) return { ok: false, code: 'unknown-part', message: `${ref(original)} is no longer in the catalog` };
    const clash = db.prepare(OTHER_WITH_IDENTITY).get(...identityParams(edited.manufacturer, edited.partNumber), existing.id);
    if (clash) {
      return {
        ok: false,
        code: 'duplicate-part',
        message: `${ref(edited)} is already in the catalog as another part; a maker and part number name one part only`,
      };
    }
    const row = partToRow(edited);
    if (ROW_COLUMNS.every((c) => (existing[c] ?? null) === (row[c] ?? null))) {
      return { ok: true, part: rowToPart(existing), isChanged: false, isApprovalChanged: false };
    }
    db.prepare(UPDATE_BY_ID).run({ ...row, updated_at: at, id: existing.id });
    const isApprovalChanged = existing.approval !== row.approval || (existing.approval_note ?? null) !== (row.approval_note ?? null);
    if (isApprovalChanged) {
      db.prepare(EVENT_SQL).run(edited.manufacturer, edited.partNumber, at, context.by, existing.approval, edited.approval, edited.approvalNote ?? null, context.reason);
    }
    const stored = db.prepare(SELECT_BY_IDENTITY).get(...identityParams(edited.manufacturer, edited.partNumber)) as PartRow;
    return { ok: true, part: rowToPart(stored), isChanged: true, isApprovalChanged };
  });
  return run.immediate();
}
