import { PART_FIELDS } from './part-fields.js';
import type { Part } from './part-schema.js';
import { fieldText } from './part-differences.js';

export interface FieldChange {
  readonly column: string;
  readonly label: string;
  readonly before: string;
  readonly after: string;
}

export interface PartChange {
  readonly manufacturer: string;
  readonly partNumber: string;
  readonly changes: readonly FieldChange[];
}

export interface ApprovalChangeSeen {
  readonly manufacturer: string;
  readonly partNumber: string;
  readonly from: string;
  readonly to: string;
}

export interface PartsDiff {
  readonly added: readonly Part[];
  readonly removed: readonly Part[];
  readonly changed: readonly PartChange[];
  /** Approval moves among the changed parts, listed apart because reviewers look for them first. */
  readonly approvalChanges: readonly ApprovalChangeSeen[];
}

const key = (p: Pick<Part, 'manufacturer' | 'partNumber'>) => `${p.manufacturer}\u0000${p.partNumber}`.toLowerCase();

/** What changed from one set of parts to another, field by field; identity ignores letter case. */
export function diffParts(before: readonly Part[], after: readonly Part[]): PartsDiff {
  const old = new Map(before.map((p) => [key(p), p]));
  const now = new Map(after.map((p) => [key(p), p]));
  const added = after.filter((p) => !old.has(key(p)));
  const removed = before.filter((p) => !now.has(key(p)));
  const changed: PartChange[] = [];
  const approvalChanges: ApprovalChangeSeen[] = [];
  for (const p of after) {
    const q = old.get(key(p));
    if (!q) continue;
    const changes: FieldChange[] = [];
    for (const field of PART_FIELDS) {
      const a = JSON.stringify((q as unknown as Record<string, unknown>)[field.key] ?? null);
      const b = JSON.stringify((p as unknown as Record<string, unknown>)[field.key] ?? null);
      if (a !== b) changes.push({ column: field.column, label: field.label, before: fieldText(q, field), after: fieldText(p, field) });
    }
    if (changes.length > 0) changed.push({ manufacturer: p.manufacturer, partNumber: p.partNumber, changes });
    if (q.approval !== p.approval || (q.approvalNote ?? '') !== (p.approvalNote ?? '')) {
      const show = (x: Part) => x.approval + (x.approvalNote ? ` (${x.approvalNote})` : '');
      approvalChanges.push({ manufacturer: p.manufacturer, partNumber: p.partNumber, from: show(q), to: show(p) });
    }
  }
  return { added, removed, changed, approvalChanges };
}

export function isEmptyDiff(d: PartsDiff): boolean {
  return d.added.length === 0 && d.removed.length === 0 && d.changed.length === 0;
}
