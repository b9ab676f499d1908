import { APPROVAL_STATES, type ApprovalState, type Part } from '../parts/index.js';
import { CatalogError } from './catalog-error.js';
import type { Catalog } from './open-catalog.js';
import { findPart } from './part-repository.js';
import { IDENTITY_WHERE, identityParams } from './identity-sql.js';

export interface ApprovalEvent {
  readonly id: number;
  readonly manufacturer: string;
  readonly partNumber: string;
  readonly at: string;
  readonly by: string;
  readonly fromState: ApprovalState | null;
  readonly toState: ApprovalState;
  readonly note: string | null;
  readonly reason: string;
}

export interface ApprovalChange {
  readonly state: ApprovalState;
  /** The condition of a conditional approval; kept as the part's approval note. */
  readonly condition?: string;
  readonly reason: string;
  readonly by: string;
  readonly at?: string;
}

export function isApprovalState(text: string): text is ApprovalState {
  return (APPROVAL_STATES as readonly string[]).includes(text);
}

/**
 * Changes a part's approval and appends the change to its trail, in one write transaction:
 * the state read, the update and the trail entry cannot interleave with another process.
 */
export function changeApproval(catalog: Catalog, reference: string, change: ApprovalChange): { part: Part; event: ApprovalEvent } {
  if (!change.reason.trim()) throw new CatalogError('invalid-change', 'a reason is required for every approval change', 'add --reason "…"');
  if (change.state === 'conditional' && !change.condition?.trim()) {
    throw new CatalogError('invalid-change', 'a conditional approval needs its condition', 'add --condition "…", e.g. "only below 60 °C ambient"');
  }
  const { db } = catalog;
  const at = change.at ?? new Date().toISOString();
  const run = db.transaction(() => {
    const before = findPart(catalog, reference);
    const note = change.state === 'conditional' ? change.condition!.trim() : null;
    db.prepare(`UPDATE part SET approval = ?, approval_note = ?, updated_at = ? WHERE ${IDENTITY_WHERE}`).run(
      change.state,
      note,
      at,
      ...identityParams(before.manufacturer, before.partNumber),
    );
    const info = db
      .prepare('INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason) VALUES (?, ?, ?, ?, ?, ?, ?, ?)')
      .run(before.manufacturer, before.partNumber, at, change.by, before.approval, change.state, note, change.reason.trim());
    const part: Part = { ...before, approval: change.state, ...(note ? { approvalNote: note } : {}) } as Part;
    if (!note) delete (part as { approvalNote?: string }).approvalNote;
    return { part, eventId: Number(info.lastInsertRowid) };
  });
  const { part, eventId } = run.immediate();
  return { part, event: approvalHistory(catalog, part).find((e) => e.id === eventId)! };
}

/** The whole trail of one part, oldest first. Entries are never changed or removed. */
export function approvalHistory(catalog: Catalog, part: Pick<Part, 'manufacturer' | 'partNumber'>): ApprovalEvent[] {
  // Entries written by a bulk import name their part's row (migration 006); the others its identity.
  const rows = catalog.db
    .prepare(
      `SELECT id, manufacturer, part_number, at, by, from_state, to_state, note, reason FROM approval_event
       WHERE part_id IN (SELECT id FROM part WHERE ${IDENTITY_WHERE})
       UNION ALL
       SELECT id, manufacturer, part_number, at, by, from_state, to_state, note, reason FROM approval_event
       WHERE part_id IS NULL AND part_number = ? COLLATE NOCASE AND manufacturer = ? COLLATE NOCASE
       ORDER BY id`,
    )
    .all(...identityParams(part.manufacturer, part.partNumber), part.partNumber, part.manufacturer) as Record<string, string | number | null>[];
  return rows.map((r) => ({
    id: Number(r.id),
    manufacturer: String(r.manufacturer),
    partNumber: String(r.part_number),
    at: String(r.at),
    by: String(r.by),
    fromState: (r.from_state as ApprovalState | null) ?? null,
    toState: r.to_state as ApprovalState,
    note: (r.note as string | null) ?? null,
    reason: String(r.reason),
  }));
}
