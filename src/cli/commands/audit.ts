import { existsSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { extname } from 'node:path';
import { auditDesign, parseBomMapping, readBomText, type AuditResult, type BomLine } from '../../catalog/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { auditHtml } from '../report/audit-html.js';
import { auditMarkdown } from '../report/audit-markdown.js';
import { loadDesign } from './design-file.js';
import { teamPolicies } from './team-policies.js';

export interface AuditOptions extends CatalogOptions {
  readonly report?: string;
  readonly bom?: string;
  readonly bomColumns?: string;
  readonly allowUnknown?: boolean;
}

function loadBom(file: string, columns: string | undefined): BomLine[] {
  if (!existsSync(file)) throw new UsageError(`no BOM file ${file}`, 'check the path');
  const mapping = columns ? parseBomMapping(columns) : { ok: true as const, mapping: {} };
  if (!mapping.ok) throw new UsageError(`--bom-columns: ${mapping.message}`, 'e.g. --bom-columns "ref=Designator,maker=Mfr,part=MPN"');
  const read = readBomText(readFileSync(file, 'utf8'), mapping.mapping);
  if (!read.ok) throw new UsageError(`${file}: the BOM cannot be used`, 'fix the BOM or map its columns with --bom-columns', read.issues.map((i) => `${file}:${i.line}: ${i.message}`));
  return read.lines;
}

/** Writes the report beside and renames it, so a reader never sees half a file. */
function writeReport(path: string, result: AuditResult): void {
  const ext = extname(path).toLowerCase();
  const text = ext === '.html' || ext === '.htm' ? auditHtml(result) : ext === '.md' || ext === '.markdown' ? auditMarkdown(result) : undefined;
  if (text === undefined) throw new UsageError(`cannot tell the report format of ${path}`, 'name the report .md (Markdown) or .html');
  const temp = `${path}.partial-${process.pid}`;
  writeFileSync(temp, text);
  renameSync(temp, path);
}

export function runAudit(designFile: string, options: AuditOptions): AuditResult {
  const design = loadDesign(designFile);
  const bom = options.bom ? loadBom(options.bom, options.bomColumns) : undefined;
  const result = withCatalog(options, (catalog) =>
    auditDesign(catalog, design, { ...(bom ? { bom } : {}), teamPolicies: teamPolicies(options), unknownIsFailure: !options.allowUnknown }),
  );
  if (options.report) writeReport(options.report, result);
  return result;
}
