import type { AuditResult, AuditStatus, PositionAudit } from '../../catalog/index.js';
import { safeText } from '../../parts/index.js';

export const STATUS_WORD: Record<AuditStatus, string> = { pass: 'PASS', warn: 'WARN', fail: 'FAIL', unchecked: 'UNCHECKED' };

export function partName(p: PositionAudit): string {
  if (p.part) return `${safeText(p.part.manufacturer)} ${safeText(p.part.partNumber)}`;
  return p.partReference ? safeText(p.partReference) : '(none)';
}

export function auditHeadline(result: AuditResult): string {
  const c = result.counts;
  return `${result.isPassing ? 'PASSED' : 'FAILED'}: ${c.pass} pass, ${c.warn} warn, ${c.fail} fail, ${c.unchecked} unchecked of ${result.positions.length} positions`;
}

/** Plain text for the terminal: failures first, then warnings, then passes. */
export function printAudit(result: AuditResult): string {
  const order: Record<AuditStatus, number> = { fail: 0, warn: 1, unchecked: 2, pass: 3 };
  const sorted = [...result.positions].sort((a, b) => order[a.status] - order[b.status]);
  const lines = [`Audit of ${safeText(result.name)} (${result.design})`, auditHeadline(result), ''];
  for (const p of sorted) {
    lines.push(`${STATUS_WORD[p.status].padEnd(9)} ${p.ref.padEnd(6)} ${(p.role ?? '—').padEnd(16)} ${partName(p)}`);
    for (const f of p.findings) lines.push(`            - ${safeText(f)}`);
    if (p.status !== 'fail' && p.tightest[0]) lines.push(`            tightest: ${safeText(p.tightest[0].explanation)}`);
    if (p.suggestion) lines.push(`            suggested: ${safeText(p.suggestion.part.manufacturer)} ${safeText(p.suggestion.part.partNumber)} (${p.suggestion.part.approval}); ${safeText(p.suggestion.summary)}`);
  }
  if (result.positions.some((p) => p.cautions.some((c) => c.level === 'safety'))) {
    lines.push('', '! Some positions involve hazardous voltage or surge protection: verify against datasheets, safety standards and local codes, by qualified people.');
  }
  return lines.join('\n');
}
