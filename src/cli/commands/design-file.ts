import { existsSync, readFileSync } from 'node:fs';
import { readDesignText, type Design, type DesignIssue } from '../../circuits/design-file.js';
import { UsageError } from '../cli-error.js';

export function formatDesignIssue(issue: DesignIssue): string {
  const where = issue.line > 0 ? `${issue.file}:${issue.line}` : issue.file;
  const field = issue.field ? ` ${issue.field}` : '';
  return `${where}${field}: ${issue.message}${issue.expected ? ` (expected ${issue.expected})` : ''}`;
}

export function designError(file: string, issues: readonly DesignIssue[]): UsageError {
  return new UsageError(
    `${file}: ${issues.length} problem${issues.length === 1 ? '' : 's'} in the design file`,
    'correct the fields named above; docs/design-format.md describes the format',
    issues.map(formatDesignIssue),
    { issues },
  );
}

/** Reads a design file; a missing or malformed file is a usage error that names every problem. */
export function loadDesign(file: string): Design {
  if (!existsSync(file)) throw new UsageError(`no design file ${file}`, 'check the path');
  const result = readDesignText(file, readFileSync(file, 'utf8'));
  if (!result.ok) throw designError(file, result.issues);
  return result.design;
}
