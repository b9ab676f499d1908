import { describePart, safeText } from '../../parts/index.js';
import { thermalSweep, type RankedCandidate, type ThermalEvaluation } from '../../selection/index.js';
import { formatQuantity } from '../../units/index.js';
import { leakageChart, plotColumns, sweepRange, tjChart } from '../chart/thermal-chart.js';
import type { PositionSession } from '../state/position-draft.js';
import { docBuilder, type DocBuilder } from '../text/doc.js';
import type { StyledLine } from '../text/styled.js';
import { VERDICT_MARK, VERDICT_TONE, VERDICT_WORD, headroomBar, headroomText } from './verdict.js';

const T = (k: number) => formatQuantity(k, 'temperature');
const W = (w: number) => formatQuantity(w, 'power');

function thermalSection(doc: DocBuilder, thermal: ThermalEvaluation): void {
  doc.blank();
  doc.heading(`HEAT BALANCE AT ${T(thermal.ambientK)} AMBIENT`);
  const o = thermal.outcome;
  if (o.kind === 'stable') {
    doc.row('Junction', `Tj ${T(o.tjK)} (policy ceiling ${T(thermal.ceilingK)}, Tj max ${T(thermal.tjMaxK)})`, 14, { indent: 2 });
  } else if (o.kind === 'runaway') {
    doc.row('Junction', `✗ thermal runaway: ${o.message}`, 14, { indent: 2, tone: 'bad' });
  } else {
    doc.row('Junction', `? unknown: ${o.reason}`, 14, { indent: 2, tone: 'warn' });
  }
  const rth = thermal.rthJaKPerW === null ? '? unknown' : `${formatQuantity(thermal.rthJaKPerW, 'thermal-resistance')} (${thermal.rthSource})`;
  doc.row('RθJA', rth, 14, { indent: 2 });
  const l = thermal.losses;
  if (l) {
    doc.row('Losses', `conduction ${W(l.conductionW)} · reverse ${W(l.reverseW)} · switching ${W(l.switchingW)} · total ${W(l.totalW)}`, 14, { indent: 2 });
  } else {
    doc.row('Losses', '? unknown (the loss model needs data the catalog lacks)', 14, { indent: 2, tone: 'warn' });
  }
  for (const note of thermal.notes) doc.para(`• ${note}`, { indent: 2, hang: 2, tone: 'muted' });
}

function chartSection(doc: DocBuilder, candidate: RankedCandidate, session: PositionSession): void {
  if (!session.result.ok) return;
  const position = session.result.position;
  const op = position.operatingPoint;
  const cols = plotColumns(doc.width);
  const { fromK, toK } = sweepRange(op.ambientMinK, op.ambientMaxK);
  const sweep = thermalSweep(candidate.evaluation.part, position, session.policy, fromK, toK, cols - 1);
  doc.blank();
  doc.heading('JUNCTION TEMPERATURE AGAINST AMBIENT');
  if (!sweep.ok) {
    doc.para(`No chart: ${sweep.reason}.`, { indent: 2, tone: 'muted' });
    return;
  }
  const options = { width: doc.width, height: 7, ambientMaxK: op.ambientMaxK };
  doc.raw(tjChart(sweep, options));
  doc.para('█ Tj   ┄ policy ceiling   ┬ highest ambient of the position   × runaway   ░ no stable Tj', { indent: 2, tone: 'muted' });
  const leakage = leakageChart(sweep, { ...options, height: 5 });
  doc.blank();
  doc.heading('LEAKAGE AGAINST AMBIENT (log scale, at the working reverse voltage)');
  if (leakage) doc.raw(leakage);
  else doc.para('No chart: the catalog gives no IR points for this part, or it never blocks here.', { indent: 2, tone: 'muted' });
}

/** Everything about one candidate at the position: verdict, each margin explained, heat, charts, ratings. */
export function candidateDoc(candidate: RankedCandidate, session: PositionSession, width: number): StyledLine[] {
  const doc = docBuilder(width);
  const e = candidate.evaluation;
  const part = e.part;
  doc.para([{ text: `${safeText(part.manufacturer)} ${safeText(part.partNumber)}`, bold: true }, { text: `  ${safeText(part.package)} · ${part.kind} · ${part.approval}${part.unitPrice !== undefined ? ` · ${part.unitPrice} ${safeText(part.currency ?? '')}` : ''}`, tone: 'muted' }]);
  doc.para([{ text: `${VERDICT_MARK[e.verdict]} ${VERDICT_WORD[e.verdict]}`, tone: VERDICT_TONE[e.verdict], bold: true }, { text: ` — ${e.summary}` }], { hang: 2 });
  const s = candidate.scoreParts;
  doc.para(
    `Score ${candidate.score}: margin ${s.margin.points} (${s.margin.reason}) + approval ${s.approval.points} (${safeText(s.approval.reason)}) + lifecycle ${s.lifecycle.points} + price ${s.price.points} (${safeText(s.price.reason)}) + package ${s.package.points}`,
    { hang: 2, tone: 'muted' },
  );
  doc.blank();
  doc.heading('MARGINS');
  const labelWidth = Math.max(6, ...e.limits.map((l) => l.label.length));
  for (const l of e.limits) {
    const bar = l.verdict === 'unknown' || l.headroom === null ? '  ?   '.padEnd(10) : headroomBar(l.headroom, 10);
    doc.para([
      { text: `${VERDICT_MARK[l.verdict]} `, tone: VERDICT_TONE[l.verdict] },
      { text: l.label.padEnd(labelWidth), bold: true },
      { text: ` ${bar} `, tone: VERDICT_TONE[l.verdict] },
      { text: headroomText(l).padStart(6) },
      ...(l.isHard ? [] : [{ text: '  preferred', tone: 'muted' as const }]),
    ]);
    doc.para(l.explanation, { indent: 4 });
    if (l.method) doc.para(l.method, { indent: 4, tone: 'muted' });
  }
  if (e.thermal) thermalSection(doc, e.thermal);
  chartSection(doc, candidate, session);
  if (e.notes.length > 0) {
    doc.blank();
    doc.heading('NOTES');
    for (const n of e.notes) doc.para(`• ${n}`, { indent: 2, hang: 2 });
  }
  doc.blank();
  doc.heading('EVERY RATING IN THE CATALOG');
  for (const row of describePart(part)) doc.row(row.label, safeText(row.value), 20, { indent: 2 });
  return doc.lines;
}
