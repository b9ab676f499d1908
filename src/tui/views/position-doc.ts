import { formatStepValue, type DerivationStep } from '../../circuits/derivation.js';
import { describeBound, describeOperatingPoint } from '../../circuits/describe-solution.js';
import type { Caution } from '../../circuits/caution.js';
import { safeText } from '../../parts/index.js';
import type { PositionSession } from '../state/position-draft.js';
import { docBuilder, type DocBuilder } from '../text/doc.js';
import type { StyledLine } from '../text/styled.js';

/** Safety cautions of a session: shown at the top of every screen of the position. */
export function safetyCautions(session: PositionSession): Caution[] {
  return session.result.ok ? session.result.position.cautions.filter((c) => c.level === 'safety') : [];
}

function origin(doc: DocBuilder, session: PositionSession): void {
  const o = session.draft.origin;
  if (!o) return;
  doc.row('Design', `${safeText(o.designName)} (${o.path})`, 14);
  if (o.part) doc.row('Part now', safeText(o.part), 14);
  if (o.notes) doc.row('Notes', safeText(o.notes), 14);
}

/** Operating point, limits and cautions: the left half on wide terminals, the top otherwise. */
export function positionSummary(session: PositionSession, width: number): StyledLine[] {
  const doc = docBuilder(width);
  origin(doc, session);
  doc.row('Policy', `${session.policy.name} — ${session.policy.description}`, 14);
  const result = session.result;
  if (!result.ok) {
    doc.blank();
    doc.heading('NO FEASIBLE DESIGN');
    doc.para(result.infeasible.reason, { tone: 'bad', indent: 2 });
    doc.para('Change the conditions (Esc, back to the form) and solve again.', { indent: 2, tone: 'muted' });
    return doc.lines;
  }
  const p = result.position;
  doc.blank();
  doc.heading('OPERATING POINT (worst case)');
  for (const row of describeOperatingPoint(p.operatingPoint)) doc.row(row.label, row.value, 30, { indent: 2 });
  doc.blank();
  doc.heading('LIMITS A PART MUST MEET');
  for (const limit of p.limits) {
    doc.para([{ text: describeBound(limit), bold: true }, ...(limit.isHard ? [] : [{ text: '  (preferred)', tone: 'muted' as const }])], { indent: 2 });
    doc.para(limit.reason, { indent: 4, tone: 'muted' });
    if (limit.derating) doc.para(`derating ${limit.derating.value} (${limit.derating.policyId}): ${limit.derating.source}`, { indent: 4, tone: 'muted' });
  }
  if (p.suitableKinds.length > 0) doc.row('Suitable kinds', p.suitableKinds.join(', '), 16, { indent: 2 });
  const others = p.cautions.filter((c) => c.level !== 'safety');
  if (others.length > 0) {
    doc.blank();
    doc.heading('CAUTIONS');
    for (const c of others) doc.para(`• ${c.level === 'design' ? 'design: ' : ''}${c.text}`, { indent: 2, hang: 2, tone: c.level === 'design' ? 'warn' : undefined });
  }
  return doc.lines;
}

/** The derivation, step by step, each with its formula, the numbers put in and its source. */
export function derivationLines(steps: readonly DerivationStep[], width: number): StyledLine[] {
  const doc = docBuilder(width);
  doc.heading('DERIVATION');
  steps.forEach((s, i) => {
    const value = formatStepValue(s);
    const worked = s.substituted === value ? value : `${s.substituted} = ${value}`;
    doc.para([{ text: `${String(i + 1).padStart(2)}. ` }, { text: s.quantity }], { hang: 4 });
    doc.para([{ text: `${s.symbol} = ${s.formula}`, tone: 'accent' }], { indent: 4, hang: 2 });
    doc.para([{ text: `= ${worked}`, bold: true }], { indent: 4, hang: 2 });
    if (s.source) doc.para(`[${s.source}]`, { indent: 4, tone: 'muted' });
  });
  if (steps.length === 0) doc.para('No steps.', { tone: 'muted' });
  return doc.lines;
}

/** The steps of a position, solved or not. */
export function sessionSteps(session: PositionSession): readonly DerivationStep[] {
  return session.result.ok ? session.result.position.steps : session.result.infeasible.steps;
}
