import type { AuditResult } from '../../catalog/index.js';
import { auditHeadline, partName, STATUS_WORD } from './audit-text.js';

/** Markdown cell text: no line breaks, pipes escaped, no raw HTML. */
function cell(text: string): string {
  return text.replace(/[\r\n]+/g, ' ').replace(/\|/g, '\\|').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/** A report for a review comment: a summary table, then the findings per position. */
export function auditMarkdown(result: AuditResult): string {
  const lines = [`## Diode audit: ${cell(result.name)}`, '', `**${auditHeadline(result)}** (\`${cell(result.design)}\`)`, ''];
  const safety = result.positions.filter((p) => p.cautions.some((c) => c.level === 'safety')).map((p) => p.ref);
  if (safety.length > 0) {
    lines.push(`> ⚠ ${safety.join(', ')}: hazardous voltage or surge protection. These results are an engineering aid; verify them against datasheets, applicable safety standards and local codes, with qualified people.`, '');
  }
  lines.push('| Ref | Role | Part | Result | Tightest margin |', '|---|---|---|---|---|');
  for (const p of result.positions) {
    lines.push(`| ${cell(p.ref)} | ${cell(p.role ?? '—')} | ${cell(partName(p))} | ${STATUS_WORD[p.status]} | ${cell(p.tightest[0]?.explanation ?? '—')} |`);
  }
  const detailed = result.positions.filter((p) => p.findings.length > 0 || p.suggestion);
  if (detailed.length > 0) lines.push('', '### Findings');
  for (const p of detailed) {
    lines.push('', `**${cell(p.ref)}** — ${STATUS_WORD[p.status]}`);
    for (const f of p.findings) lines.push(`- ${cell(f)}`);
    if (p.suggestion) lines.push(`- Suggested approved alternative: **${cell(p.suggestion.part.manufacturer)} ${cell(p.suggestion.part.partNumber)}** — ${cell(p.suggestion.summary)}`);
  }
  return lines.join('\n') + '\n';
}
