import { describe, expect, it } from 'vitest';
import type { AuditResult } from '../../src/catalog/index.js';
import { auditHtml, escapeHtml } from '../../src/cli/report/audit-html.js';
import { auditMarkdown } from '../../src/cli/report/audit-markdown.js';
import { aPart } from '../helpers/a-part.js';

const hostile = aPart('schottky', { partNumber: '<img src=x onerror=alert(1)>', manufacturer: 'Evil & "Co"' });
const result: AuditResult = {
  design: 'board.yaml',
  name: '<b>board</b> | one',
  positions: [
    { ref: 'D1', role: 'buck-freewheel', status: 'fail', partSource: 'design', partReference: 'x', part: hostile, findings: ['<script>alert(1)</script>'], evaluation: null, tightest: [], cautions: [], suggestion: null },
  ],
  counts: { pass: 0, warn: 0, fail: 1, unchecked: 0 },
  isPassing: false,
};

describe('audit reports escape everything', () => {
  it('escapes the five HTML special characters', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe('&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;');
  });

  it('keeps catalog and design text inert in HTML and Markdown', () => {
    const html = auditHtml(result);
    expect(html).not.toContain('<img');
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain("default-src 'none'");
    const md = auditMarkdown(result);
    expect(md).not.toContain('<script>');
    expect(md).toContain('&lt;b&gt;board&lt;/b&gt; \\| one');
  });
});
