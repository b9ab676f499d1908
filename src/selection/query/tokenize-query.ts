import type { QueryIssue, TermSpan } from './query-types.js';

/**
 * Splits typed text at white space into terms with their positions. A double-quoted stretch
 * keeps its spaces ("low leakage", maker="ketterby components"); an unclosed quote is an issue.
 */
export function tokenizeQuery(input: string): { terms: TermSpan[]; issues: QueryIssue[] } {
  const terms: TermSpan[] = [];
  const issues: QueryIssue[] = [];
  let i = 0;
  while (i < input.length) {
    if (/\s/.test(input[i]!)) {
      i++;
      continue;
    }
    const start = i;
    let isOpenQuote = false;
    while (i < input.length && (isOpenQuote || !/\s/.test(input[i]!))) {
      if (input[i] === '"') isOpenQuote = !isOpenQuote;
      i++;
    }
    const term = { term: input.slice(start, i), start, end: i };
    if (isOpenQuote) {
      issues.push({ ...term, code: 'unclosed-quote', message: `unclosed quote in ${term.term}: close it with another "` });
    } else terms.push(term);
  }
  return { terms, issues };
}

/** The text inside quotes, quotes removed: `"low leakage"` → `low leakage`. */
export function unquote(text: string): string {
  return text.replace(/"/g, '');
}
