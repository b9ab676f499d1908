import type { ApprovalEvent } from '../../catalog/approval-repository.js';
import { describePart, safeText, type Part } from '../../parts/index.js';
import { docBuilder } from '../text/doc.js';
import type { StyledLine } from '../text/styled.js';

/** "2026-01-05 09:00" from an ISO time. */
const when = (iso: string) => iso.replace('T', ' ').slice(0, 16);

/** Every stored fact of a catalog part, then its approval trail, oldest first. */
export function partDoc(part: Part, history: readonly ApprovalEvent[], width: number): StyledLine[] {
  const doc = docBuilder(width);
  doc.para([{ text: `${safeText(part.manufacturer)} ${safeText(part.partNumber)}`, bold: true }]);
  for (const row of describePart(part)) doc.row(row.label, [{ text: safeText(row.value), ...(row.section === 'ratings' ? {} : {}) }], 20, { indent: 2 });
  doc.blank();
  doc.heading(`APPROVAL TRAIL (${history.length})`);
  if (history.length === 0) doc.para('No approval changes recorded.', { indent: 2, tone: 'muted' });
  for (const e of history) {
    const change = `${e.fromState ?? '(new)'} → ${e.toState}`;
    doc.para([{ text: `${when(e.at)}  ` , tone: 'muted' }, { text: change, bold: true }, { text: `  by ${safeText(e.by)}`, tone: 'muted' }], { indent: 2, hang: 4 });
    doc.para(`reason: ${safeText(e.reason)}${e.note ? ` · condition: ${safeText(e.note)}` : ''}`, { indent: 6, hang: 2 });
  }
  return doc.lines;
}
