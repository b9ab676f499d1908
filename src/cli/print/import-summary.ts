import type { ImportOutcome } from '../commands/catalog-import.js';
import { formatRowIssue } from '../../catalog/index.js';

export function printImportSummary(result: ImportOutcome): string {
  const { added, updated, unchanged } = result.written;
  const lines = [`Imported ${result.file} into ${result.catalogPath}: ${added} added, ${updated} updated, ${unchanged} unchanged.`];
  if (result.skipped.length > 0) {
    lines.push(`Skipped ${result.skipped.length} problem${result.skipped.length === 1 ? '' : 's'} (--skip-invalid):`);
    for (const issue of result.skipped) lines.push(`  ${formatRowIssue(issue)}`);
  }
  return lines.join('\n');
}
