import { safeText, type Part } from '../../parts/index.js';
import type { SubstitutionCheck } from '../../selection/substitution/index.js';
import type { SwapOutcome } from '../commands/swap.js';
import { textTable } from './text-table.js';

const name = (p: Part) => `${safeText(p.manufacturer)} ${safeText(p.partNumber)}`;
const MARK: Record<string, string> = { equal: '=', better: '+ better', worse: '− worse', different: '≠ differs', unknown: '? no data' };

function printCheck(c: SubstitutionCheck, where: string): string {
  const lines = [
    `${name(c.alternate)} for ${name(c.original)}${where}: ${c.isDropIn ? 'SAFE DROP-IN' : 'NOT A SAFE DROP-IN'}`,
    ...c.reasons.map((r) => `  - ${r}`),
    '',
    'Package and kind',
    ...c.fit.notes.map((n) => `  ${n}`),
    '',
    textTable(
      [{ header: 'Rating' }, { header: 'Original' }, { header: 'Alternate' }, { header: 'Verdict' }, { header: 'Condition', max: 30 }],
      c.parameters.map((p) => [p.label, p.original, p.alternate, MARK[p.comparison] ?? p.comparison, p.condition ?? '']),
    ),
  ];
  if (c.inCircuit) {
    lines.push('', 'In the circuit');
    const alt = new Map(c.inCircuit.alternate.limits.map((l) => [l.limitId, l]));
    for (const o of c.inCircuit.original.limits) {
      const a = alt.get(o.limitId);
      lines.push(`  ${o.label.padEnd(8)} original ${o.verdict.padEnd(8)} alternate ${(a?.verdict ?? '—').padEnd(8)} ${a?.explanation ?? ''}`);
    }
  }
  return lines.join('\n');
}

export function printSwap(outcome: SwapOutcome): string {
  const where = outcome.ref ? ` at ${outcome.ref} of ${outcome.design}` : '';
  if (outcome.mode === 'check') return printCheck(outcome.check, where);
  if (outcome.replacements.length === 0) return `No catalog part in ${outcome.original.package} of a compatible kind could replace ${name(outcome.original)}.`;
  return [
    `Possible replacements for ${name(outcome.original)}${where} (${outcome.considered} considered: same package, compatible kind, not banned or obsolete)`,
    ...outcome.replacements.map((r) => `  ${String(r.rank).padStart(2)}. ${name(r.check.alternate).padEnd(36)} ${r.check.alternate.approval.padEnd(11)} ${r.basis}`),
  ].join('\n');
}
