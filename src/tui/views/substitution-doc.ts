import { LIFECYCLE_LABELS, safeText, type Part } from '../../parts/index.js';
import type { LimitEvaluation } from '../../selection/index.js';
import type { Comparison, Direction, ParameterComparison, SubstitutionCheck } from '../../selection/substitution/index.js';
import { docBuilder, type DocBuilder } from '../text/doc.js';
import { displayWidth } from '../text/fit.js';
import type { Segment, StyledLine, Tone } from '../text/styled.js';
import { VERDICT_MARK, VERDICT_TONE, headroomBar, headroomText } from './verdict.js';

interface Mark {
  readonly mark: string;
  readonly word: string;
  readonly tone: Tone;
}

/** A mark and a word for every comparison, so nothing depends on colour. */
const MARKS: Readonly<Record<Comparison, Mark>> = {
  better: { mark: '✓', word: 'better', tone: 'good' },
  equal: { mark: '~', word: 'same', tone: 'muted' },
  worse: { mark: '✗', word: 'worse', tone: 'bad' },
  different: { mark: '✗', word: 'differs', tone: 'bad' },
  unknown: { mark: '?', word: 'unknown', tone: 'warn' },
};
// Price decides buying, not fit: marked apart so it never reads as a technical failure.
const PRICE_MARKS: Readonly<Record<Comparison, Mark>> = {
  better: { mark: '·', word: 'cheaper', tone: 'muted' },
  equal: { mark: '·', word: 'same', tone: 'muted' },
  worse: { mark: '·', word: 'dearer', tone: 'muted' },
  different: { mark: '·', word: 'differs', tone: 'muted' },
  unknown: { mark: '·', word: 'unknown', tone: 'muted' },
};
const DIRECTION: Readonly<Record<Direction, string>> = { higher: 'higher is better', lower: 'lower is better', same: 'must match' };

export function ratingMark(p: Pick<ParameterComparison, 'key' | 'direction' | 'comparison'>): Mark {
  if (p.key === 'unitPrice') return PRICE_MARKS[p.comparison];
  if (p.direction === 'same' && p.comparison === 'equal') return { mark: '✓', word: 'matches', tone: 'good' };
  return MARKS[p.comparison];
}

const currencyOf = (p: Part) => (p.currency ? ` ${safeText(p.currency)}` : '');
const shown = (value: string) => (value === '—' ? 'unknown' : safeText(value));
export const partName = (p: Part) => `${safeText(p.manufacturer)} ${safeText(p.partNumber)}`;

/** The core's reasons speak of command-line options; here a position comes from the screens. */
const screenWords = (reason: string) => reason.replace(' (give --design and --ref)', ' (open the comparison from a candidate of a position to judge it there)');

/** The pinned headline: the verdict in words and mark, and the tally of the ratings. */
export function verdictLine(check: SubstitutionCheck): StyledLine {
  const technical = check.parameters.filter((p) => p.key !== 'unitPrice');
  const count = (what: Comparison) => technical.filter((p) => p.comparison === what).length;
  const differ = count('different');
  const tally = [['better', count('better')], ['same', count('equal')], ['worse', count('worse')], [differ === 1 ? 'differs' : 'differ', differ], ['unknown', count('unknown')]]
    .filter(([, n]) => n !== 0)
    .map(([w, n]) => `${n} ${w}`)
    .join(' · ');
  const where = check.inCircuit ? ' at this position' : '';
  return [
    check.isDropIn ? { text: `✓ DROP-IN${where}`, tone: 'good', bold: true } : { text: `✗ NOT A DROP-IN${where}`, tone: 'bad', bold: true },
    { text: tally ? `  ratings: ${tally}` : '', tone: 'muted' },
  ];
}

function reasonsSection(doc: DocBuilder, check: SubstitutionCheck): void {
  doc.heading(check.isDropIn ? 'WHY IT FITS' : 'WHY NOT');
  for (const r of check.reasons) doc.para(`• ${safeText(screenWords(r))}`, { indent: 2, hang: 2 });
}

function ratingsSection(doc: DocBuilder, check: SubstitutionCheck): void {
  const rows = check.parameters;
  doc.blank();
  doc.heading(`RATINGS (${rows.length})`);
  if (rows.length === 0) {
    doc.para('Neither datasheet gives a rating both could be compared on.', { indent: 2, tone: 'muted' });
    return;
  }
  const label = Math.min(14, Math.max(6, ...rows.map((r) => displayWidth(r.label))));
  const cell = (r: ParameterComparison, which: 'original' | 'alternate') => shown(r[which]) + (r.key === 'unitPrice' && r[which] !== '—' ? currencyOf(check[which]) : '');
  // Two spaces at least between columns: "70.0 °C/W" against "70.0 °C/W" must not run together.
  const value = Math.min(13, 1 + Math.max(9, ...rows.flatMap((r) => [displayWidth(cell(r, 'original')), displayWidth(cell(r, 'alternate'))])));
  const isWide = doc.width >= 100;
  const pad = (text: string, n: number) => text + ' '.repeat(Math.max(0, n - displayWidth(text)));
  doc.para([{ text: `    ${pad('', label)} ${pad('ORIGINAL', value)} ${pad('ALTERNATE', value)} ${isWide ? pad('', 9) + 'BETTER WHEN' : ''}`, tone: 'muted' }]);
  const hang = 4 + label + 1 + (value + 1) * 2 + 9;
  for (const r of rows) {
    const m = ratingMark(r);
    const cells: Segment[] = [
      { text: '  ' },
      { text: `${m.mark} `, tone: m.tone, bold: true },
      { text: `${pad(r.label, label)} `, bold: true },
      { text: `${pad(cell(r, 'original'), value)} `, ...(r.original === '—' ? { tone: 'warn' as const } : {}) },
      { text: `${pad(cell(r, 'alternate'), value)} `, ...(r.alternate === '—' ? { tone: 'warn' as const } : {}) },
      { text: pad(m.word, 8) + ' ', tone: m.tone },
      ...(isWide ? [{ text: pad(r.key === 'unitPrice' ? 'lower (price)' : DIRECTION[r.direction], 17) + ' ', tone: 'muted' as const }] : []),
      ...(r.condition ? [{ text: safeText(r.condition), tone: 'muted' as const }] : []),
    ];
    doc.para(cells, { hang: isWide ? hang + 18 : hang });
  }
}

/** ✓ what matches, ✗ what rules the alternate out, ! what must be checked by hand. */
function fitMark(note: string): { mark: string; tone: Tone } {
  if (note.startsWith('same')) return { mark: '✓', tone: 'good' };
  if (note.startsWith('different package') || note.startsWith('different polarity') || note.startsWith('a ')) return { mark: '✗', tone: 'bad' };
  return { mark: '!', tone: 'warn' };
}

function fitSection(doc: DocBuilder, check: SubstitutionCheck): void {
  doc.heading('PACKAGE AND KIND');
  for (const note of check.fit.notes) {
    const m = fitMark(note);
    doc.para([{ text: `${m.mark} `, tone: m.tone, bold: true }, { text: safeText(note) }], { indent: 2, hang: 2 });
  }
}

function limitCell(l: LimitEvaluation | undefined): Segment[] {
  if (!l) return [{ text: '— not judged'.padEnd(19), tone: 'muted' }];
  const bar = l.verdict === 'unknown' || l.headroom === null ? ' '.repeat(8) : headroomBar(l.headroom, 8);
  return [{ text: `${VERDICT_MARK[l.verdict]} ${bar} ${headroomText(l).padStart(6)}`, tone: VERDICT_TONE[l.verdict] }, { text: '  ' }];
}

function circuitSection(doc: DocBuilder, check: SubstitutionCheck, where: string): void {
  const c = check.inCircuit;
  if (!c) return;
  doc.blank();
  doc.heading(`IN THE CIRCUIT${where ? ` AT ${where.toUpperCase()}` : ''}`);
  for (const [who, e] of [['Original ', c.original], ['Alternate', c.alternate]] as const) {
    doc.para([{ text: `${who} `, tone: 'muted' }, { text: `${VERDICT_MARK[e.verdict]} ${e.verdict}`, tone: VERDICT_TONE[e.verdict], bold: true }, { text: ` — ${safeText(e.summary)}` }], { indent: 2, hang: 12 });
  }
  const label = Math.max(6, ...c.original.limits.map((l) => displayWidth(l.label)));
  doc.para([{ text: `  ${' '.repeat(label)}  ${'original'.padEnd(19)}alternate`, tone: 'muted' }]);
  const alternate = new Map(c.alternate.limits.map((l) => [l.limitId, l]));
  for (const o of c.original.limits) {
    const a = alternate.get(o.limitId);
    doc.para([{ text: `  ${o.label}${' '.repeat(label - displayWidth(o.label))}  `, bold: true }, ...limitCell(o), ...limitCell(a)]);
    if (a) doc.para(`alternate: ${safeText(a.explanation)}`, { indent: 4 + label, hang: 11, tone: 'muted' });
  }
}

function cautions(check: SubstitutionCheck): string[] {
  const a = check.alternate;
  const out = check.fit.notes.filter((n) => fitMark(n).mark === '!');
  if (a.approval === 'conditional') out.push(`the alternate is approved only on condition${a.approvalNote ? `: ${a.approvalNote}` : ''}`);
  if (a.approval === 'pending') out.push('the alternate is not yet approved (pending review)');
  if (a.lifecycle !== 'active') out.push(`the alternate is ${LIFECYCLE_LABELS[a.lifecycle]}`);
  if (check.inCircuit) out.push(...check.inCircuit.alternate.notes);
  else out.push('judged rating by rating only: a worse rating may still be enough for a given position (open the comparison from a candidate of a position to see both parts against its limits)');
  return out;
}

function cautionSection(doc: DocBuilder, check: SubstitutionCheck): void {
  doc.blank();
  doc.heading('CAUTIONS');
  const all = cautions(check);
  if (all.length === 0) doc.para('None.', { indent: 2, tone: 'muted' });
  for (const c of all) doc.para([{ text: '! ', tone: 'warn', bold: true }, { text: safeText(c) }], { indent: 2, hang: 2 });
}

/** The verdict's reasons and the rating-by-rating table: the left column on wide terminals. */
export function ratingsDoc(check: SubstitutionCheck, width: number): StyledLine[] {
  const doc = docBuilder(width);
  reasonsSection(doc, check);
  ratingsSection(doc, check);
  return doc.lines;
}

/** Package and kind, both parts at the position (when there is one), and cautions. */
export function contextDoc(check: SubstitutionCheck, width: number, where = ''): StyledLine[] {
  const doc = docBuilder(width);
  fitSection(doc, check);
  circuitSection(doc, check, where);
  cautionSection(doc, check);
  return doc.lines;
}
