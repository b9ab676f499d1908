import type { PinnedPlace } from '../../catalog/candidates.js';
import type { RankedCandidate, ScoreParts } from '../../selection/index.js';
import type { PickOutcome } from '../commands/pick.js';
import { safeText } from '../output.js';
import { textTable } from './text-table.js';

const points = (x: number) => String(Math.round(x * 10) / 10);
const pct = (h: number | null) => (h === null ? '?' : `${Math.round(h * 100)} %`);
const name = (c: RankedCandidate) => `${c.evaluation.part.manufacturer} ${c.evaluation.part.partNumber}`;

/** Ranked candidates of one position as plain text: a table, then why each ranks where it does. */
export function printPickResult(outcome: PickOutcome): string {
  const lines = [`${outcome.ref} · role ${outcome.role} · derating policy ${outcome.policy} · ${outcome.design}`];
  if (!outcome.result.ok) {
    lines.push('', `No feasible design: ${outcome.result.infeasible.reason}`, `Next: run headroom solve ${outcome.design} --ref ${outcome.ref} for the derivation.`);
    return lines.join('\n');
  }
  const search = outcome.search!;
  lines.push(`Catalog parts considered: ${search.prefilter.join('; ')}.`, '');
  const { candidates, failed, passingCount } = search.ranking;
  if (passingCount === 0) {
    const closest = [...candidates, ...failed].slice(0, outcome.top);
    if (closest.length === 0) {
      lines.push('No catalog part passes, and none meets the ratings above.', 'Next: widen the kinds or ratings in the catalog, or check the conditions with headroom solve.');
      return lines.join('\n');
    }
    lines.push(`No catalog part passes; the closest are:`, '', ...section(closest));
  } else {
    lines.push(...section(candidates.slice(0, outcome.top)));
  }
  lines.push('', footer(outcome));
  if (outcome.assigned) lines.push(assignedLine(outcome.assigned.reference, outcome.assigned.place, outcome.assigned.problem));
  return lines.join('\n');
}

function section(list: readonly RankedCandidate[]): string[] {
  const table = textTable(
    [{ header: '#', align: 'right' }, { header: 'Part', max: 44 }, { header: 'Approval' }, { header: 'Verdict' }, { header: 'Tightest', max: 24 }, { header: 'Score', align: 'right' }],
    list.map((c) => [
      `${c.evaluation.verdict === 'fail' ? '✗' : ''}${c.rank}`,
      name(c),
      c.evaluation.part.approval + (c.evaluation.part.lifecycle === 'active' ? '' : `, ${c.evaluation.part.lifecycle}`),
      c.evaluation.verdict,
      c.evaluation.tightest ? `${c.evaluation.tightest.label} ${pct(c.evaluation.tightest.headroom)}` : '—',
      points(c.score),
    ]),
  );
  const why = list.flatMap((c) => [
    `${c.evaluation.verdict === 'fail' ? '✗' : ''}${c.rank}. ${safeText(name(c))}: ${safeText(c.evaluation.verdict === 'pass' ? c.evaluation.tightest?.explanation ?? c.evaluation.summary : c.evaluation.summary)}`,
    `   score ${points(c.score)} = ${scoreText(c.scoreParts)}`,
  ]);
  return [table, '', ...why];
}

function scoreText(s: ScoreParts): string {
  return (['margin', 'approval', 'lifecycle', 'price', 'package'] as const).map((k) => `${k} ${points(s[k].points)} (${safeText(s[k].reason)})`).join(' + ');
}

function footer(outcome: PickOutcome): string {
  const s = outcome.search!;
  const n = s.ranking.passingCount;
  const head = n === 0
    ? `None of the ${s.evaluated} parts evaluated passes (${s.failedCount} fail a hard limit).`
    : `${n} of the ${s.evaluated} parts evaluated ${n === 1 ? 'passes' : 'pass'}; ${Math.min(outcome.top, s.ranking.candidates.length)} shown, passing parts first.`;
  const tail = s.isComplete
    ? ' No part left unevaluated can score higher (the search is complete).'
    : ' The search stopped before proving no other part scores higher.';
  return head + tail;
}

function assignedLine(reference: string, place: PinnedPlace | null, problem?: string): string {
  const what = `Assigned part ${safeText(reference)}`;
  if (!place) return `${what}: ${safeText(problem ?? 'not in the catalog')}.`;
  if (place.list === 'excluded') return `${what}: left out of the ranking, ${safeText(place.reason ?? '')}.`;
  const c = place.candidate!;
  if (place.list === 'failed') return `${what}: fails, ${safeText(c.evaluation.summary)}`;
  return `${what}: rank ${place.rank} (${c.evaluation.verdict}, score ${points(c.score)}).`;
}
