/** A located problem in an imported file: enough to find and fix the cell without guessing. */
export interface RowIssue {
  readonly file: string;
  /** 1-based line where the record starts; 0 when the problem is with the file as a whole. */
  readonly line: number;
  readonly column: string;
  readonly value: string;
  readonly message: string;
  readonly expected: string;
}

export function formatRowIssue(issue: RowIssue): string {
  const where = issue.line > 0 ? `${issue.file}:${issue.line}` : issue.file;
  const cell = issue.column ? ` column ${issue.column}` : '';
  const value = issue.value !== '' ? ` value "${issue.value}"` : '';
  const expected = issue.expected ? ` (expected ${issue.expected})` : '';
  return `${where}${cell}${value}: ${issue.message}${expected}`;
}
