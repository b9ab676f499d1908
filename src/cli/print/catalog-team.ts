import type { ApprovalEvent } from '../../catalog/index.js';
import { isEmptyDiff, safeText, type Part } from '../../parts/index.js';
import type { DiffOutcome } from '../commands/catalog-diff.js';
import type { GroupView } from '../commands/catalog-groups.js';
import { textTable } from './text-table.js';

const name = (p: Pick<Part, 'manufacturer' | 'partNumber'>) => `${safeText(p.manufacturer)} ${safeText(p.partNumber)}`;

export function printHistory(part: Part, events: readonly ApprovalEvent[]): string {
  const lines = [`Approval history of ${name(part)} (now ${part.approval}${part.approvalNote ? `: ${safeText(part.approvalNote)}` : ''})`];
  for (const e of events) {
    const move = e.fromState ? `${e.fromState} → ${e.toState}` : `entered as ${e.toState}`;
    lines.push(`  ${e.at}  ${safeText(e.by)}  ${move}${e.note ? ` (${safeText(e.note)})` : ''}  — ${safeText(e.reason)}`);
  }
  return lines.join('\n');
}

export function printGroup(group: GroupView): string {
  const lines = [`Second-source group ${safeText(group.name)}: ${group.members.map(name).join(', ')}`];
  if (group.differences.length === 0) {
    lines.push('  The members agree on every rating.');
  } else {
    lines.push('', textTable(
      [{ header: 'Field' }, ...group.members.map((m) => ({ header: m.partNumber, max: 34 }))],
      group.differences.map((d) => [d.label, ...d.values]),
    ));
  }
  return lines.join('\n');
}

export function printGroupList(groups: readonly GroupView[]): string {
  if (groups.length === 0) return 'No second-source groups yet. Declare one with `headroom catalog group NAME PART PART…`.';
  return groups.map((g) => `${safeText(g.name)}: ${g.members.map((m) => safeText(m.partNumber)).join(', ')}  (${g.differences.length} field${g.differences.length === 1 ? '' : 's'} differ)`).join('\n');
}

export function printDiff({ before, after, diff }: DiffOutcome): string {
  if (isEmptyDiff(diff)) return `No differences between ${before} and ${after}.`;
  const lines = [`${before} → ${after}: ${diff.added.length} added, ${diff.removed.length} removed, ${diff.changed.length} changed`];
  if (diff.approvalChanges.length > 0) {
    lines.push('', 'Approval changes');
    for (const a of diff.approvalChanges) lines.push(`  ${name(a)}: ${safeText(a.from)} → ${safeText(a.to)}`);
  }
  if (diff.added.length > 0) lines.push('', 'Added', ...diff.added.map((p) => `  + ${name(p)} (${p.kind}, ${p.package}, ${p.approval})`));
  if (diff.removed.length > 0) lines.push('', 'Removed', ...diff.removed.map((p) => `  - ${name(p)}`));
  if (diff.changed.length > 0) {
    lines.push('', 'Changed');
    for (const c of diff.changed) {
      lines.push(`  ${name(c)}`);
      for (const f of c.changes) lines.push(`      ${f.label}: ${safeText(f.before)} → ${safeText(f.after)}`);
    }
  }
  return lines.join('\n');
}
