import type { ImportConflictError, ImportOutcome } from '../commands/catalog-import.js';
import { formatRowIssue } from '../../catalog/index.js';

export function printImportSummary(result: ImportOutcome): string {
  const { added, updated, unchanged } = result.written;
  const lines = [`Imported ${result.file} into ${result.catalogPath}: ${added} added, ${updated} updated, ${unchanged} unchanged.`];
  if (result.skipped.length > 0) {
    lines.push(`Skipped ${result.skipped.length} problem${result.skipped.length === 1 ? '' : 's'} (--skip-invalid):`);
    for (const issue of result.skipped) lines.push(`  ${formatRowIssue(issue)}`);
  }
  for (const c of result.keptLocal) lines.push(`  kept this catalog's ${c.manufacturer} ${c.partNumber} (changed here since the last import)`);
  for (const c of result.overwritten) lines.push(`  replaced this catalog's ${c.manufacturer} ${c.partNumber} with the file's (it had been changed here)`);
  return lines.join('\n');
}

export function printConflicts(error: ImportConflictError): string {
  return [
    `headroom: ${error.message}:`,
    ...error.conflicts.map(
      (c) => `  ${error.file}:${c.line} ${c.manufacturer} ${c.partNumber}: ${c.isLocalOnly ? 'added or edited here, never imported' : 'edited here since it was last imported'}`,
    ),
    'Next: compare with `headroom catalog show PART`; then import again with --keep-local or --overwrite-local.',
  ].join('\n');
}
