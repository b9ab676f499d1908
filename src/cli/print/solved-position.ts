import { describeBound, describeOperatingPoint } from '../../circuits/describe-solution.js';
import { formatStepValue } from '../../circuits/derivation.js';
import type { SolveOutcome } from '../commands/solve.js';

/** Operating point, limits, derivation and cautions of one position, as plain text. */
export function printSolvedPosition(outcome: SolveOutcome): string {
  const lines: string[] = [`${outcome.ref} · role ${outcome.role} · derating policy ${outcome.policy} · ${outcome.design}`];
  const { result } = outcome;
  if (!result.ok) {
    lines.push('', `No feasible design: ${result.infeasible.reason}`);
    if (result.infeasible.steps.length > 0) lines.push('', 'Derivation so far', ...steps(result.infeasible.steps));
    return lines.join('\n');
  }
  const p = result.position;
  const safety = p.cautions.filter((c) => c.level === 'safety');
  for (const c of safety) lines.push(`! ${c.text}`);
  lines.push('', 'Operating point (worst case)');
  for (const row of describeOperatingPoint(p.operatingPoint)) lines.push(`  ${row.label.padEnd(34)} ${row.value}`);
  lines.push('', 'Limits a part must meet');
  for (const limit of p.limits) {
    lines.push(`  ${describeBound(limit).padEnd(30)} ${limit.isHard ? '' : '(preferred) '}${limit.reason}`);
    if (limit.derating) lines.push(`  ${''.padEnd(30)} ${limit.derating.policyId} policy, ${limit.derating.factor} ${limit.derating.value}: ${limit.derating.source}`);
  }
  if (p.suitableKinds.length > 0) lines.push('', `Suitable kinds: ${p.suitableKinds.join(', ')}`);
  lines.push('', 'Derivation', ...steps(p.steps));
  const others = p.cautions.filter((c) => c.level !== 'safety');
  if (others.length > 0) lines.push('', 'Cautions', ...others.map((c) => `  - ${c.text}`));
  return lines.join('\n');
}

function steps(list: readonly { quantity: string; symbol: string; formula: string; substituted: string; value: number; unit: never | string; source?: string }[]): string[] {
  return list.flatMap((s, i) => {
    const value = formatStepValue(s as never);
    // An input restated needs no "= 32.0 V = 32.0 V".
    const worked = s.substituted === value ? value : `${s.substituted} = ${value}`;
    return [
      `  ${String(i + 1).padStart(2)}. ${s.quantity}: ${s.symbol} = ${s.formula}`,
      `      = ${worked}${s.source ? `   [${s.source}]` : ''}`,
    ];
  });
}
