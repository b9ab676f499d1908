import type { AuditResult, PositionAudit } from '../../catalog/index.js';
import { formatQuantity } from '../../units/index.js';
import { auditHeadline, partName, STATUS_WORD } from './audit-text.js';

/** Every text that reaches the page goes through here: catalog text is untrusted. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

const COLOUR = { pass: '#2e7d32', marginal: '#b26a00', fail: '#c62828', unknown: '#6b6b6b' } as const;
const MARK = { pass: '✓', marginal: '~', fail: '✗', unknown: '?' } as const;

/** One bar per limit: headroom from −50 % to +100 %, zero marked; symbols as well as colours. */
function marginChart(p: PositionAudit): string {
  const limits = p.evaluation?.limits ?? [];
  if (limits.length === 0) return '<p class="muted">No margins: nothing could be evaluated.</p>';
  const row = 26;
  const x0 = 170;
  const w = 420;
  const lo = -0.5;
  const hi = 1;
  const xOf = (h: number) => x0 + ((Math.min(hi, Math.max(lo, h)) - lo) / (hi - lo)) * w;
  const bars = limits.map((l, i) => {
    const y = 10 + i * row;
    const h = l.headroom;
    const colour = COLOUR[l.verdict];
    const label = `${MARK[l.verdict]} ${escapeHtml(l.label)}`;
    const bar =
      h === null
        ? `<text x="${x0 + 4}" y="${y + 14}" class="muted">unknown: ${escapeHtml(l.explanation)}</text>`
        : `<rect x="${Math.min(xOf(0), xOf(h))}" y="${y + 3}" width="${Math.max(1, Math.abs(xOf(h) - xOf(0)))}" height="14" fill="${colour}"><title>${escapeHtml(l.explanation)}</title></rect>` +
          `<text x="${x0 + w + 8}" y="${y + 14}">${escapeHtml(`${Math.round(h * 100)} %`)}</text>`;
    return `<g class="limit" data-verdict="${l.verdict}"><text x="4" y="${y + 14}">${label}</text>${bar}</g>`;
  });
  const axisY = 14 + limits.length * row;
  const ticks = [-0.5, 0, 0.5, 1].map((t) => `<text x="${xOf(t) - 12}" y="${axisY + 12}" class="muted">${t > 0 ? '+' : ''}${Math.round(t * 100)} %</text>`).join('');
  const height = axisY + 20;
  return (
    `<svg class="margin-chart" role="img" aria-label="headroom per limit at ${escapeHtml(p.ref)}" width="${x0 + w + 70}" height="${height}" viewBox="0 0 ${x0 + w + 70} ${height}">` +
    `<line x1="${xOf(0)}" y1="4" x2="${xOf(0)}" y2="${height - 4}" stroke="#333" stroke-dasharray="3,2"/>` +
    bars.join('') +
    ticks +
    `</svg>`
  );
}

function positionSection(p: PositionAudit): string {
  const thermal = p.evaluation?.thermal;
  const tj = thermal && thermal.outcome.kind === 'stable' ? `<p>Tj ${escapeHtml(formatQuantity(thermal.outcome.tjK, 'temperature'))} at ${escapeHtml(formatQuantity(thermal.ambientK, 'temperature'))} ambient.</p>` : '';
  return [
    `<section class="position status-${p.status}" id="pos-${escapeHtml(p.ref)}">`,
    `<h2>${escapeHtml(p.ref)} <span class="badge">${STATUS_WORD[p.status]}</span></h2>`,
    `<p><b>${escapeHtml(p.role ?? 'no role')}</b> · ${escapeHtml(partName(p))}${p.part ? ` · ${escapeHtml(p.part.approval)}` : ''}</p>`,
    ...p.cautions.filter((c) => c.level === 'safety').map((c) => `<p class="caution">⚠ ${escapeHtml(c.text)}</p>`),
    p.findings.length > 0 ? `<ul>${p.findings.map((f) => `<li>${escapeHtml(f)}</li>`).join('')}</ul>` : '',
    marginChart(p),
    tj,
    p.suggestion ? `<p class="suggestion">Suggested approved alternative: <b>${escapeHtml(p.suggestion.part.manufacturer)} ${escapeHtml(p.suggestion.part.partNumber)}</b> — ${escapeHtml(p.suggestion.summary)}</p>` : '',
    ...p.cautions.filter((c) => c.level !== 'safety').map((c) => `<p class="note">${escapeHtml(c.text)}</p>`),
    `</section>`,
  ].join('\n');
}

/** A self-contained page: no scripts, no fonts or images from the network. */
export function auditHtml(result: AuditResult): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">
<title>Diode audit: ${escapeHtml(result.name)}</title>
<style>
body{font:14px/1.4 system-ui,sans-serif;margin:24px;max-width:980px;color:#222}
.badge{font-size:12px;padding:2px 6px;border:1px solid #999;border-radius:3px}
.status-fail .badge{background:#fde0e0}.status-warn .badge{background:#fff1d6}.status-pass .badge{background:#e3f4e4}
.position{border-top:1px solid #ddd;padding-top:8px;margin-top:16px}
.caution{background:#fff1d6;border-left:4px solid #b26a00;padding:6px}
.muted,.note{color:#666}.margin-chart text{font:12px system-ui,sans-serif}
</style></head><body>
<h1>Diode audit: ${escapeHtml(result.name)}</h1>
<p>${escapeHtml(auditHeadline(result))} — ${escapeHtml(result.design)}</p>
<p class="muted">Bars show the headroom left on each limit after derating: ✓ pass, ~ marginal (meets the circuit but not the derating), ✗ fail, ? unknown (the datasheet lacks a value).</p>
<p class="caution">Headroom is an engineering aid. Where a position involves hazardous voltage or surge protection, verify the results against datasheets, applicable safety standards and local codes, with qualified people.</p>
${result.positions.map(positionSection).join('\n')}
</body></html>
`;
}
