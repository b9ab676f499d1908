import { closestName } from './edit-distance.js';
import { parseChoiceFilter, parseNumberFilter, type Operator } from './parse-filter.js';
import { findQueryField, QUERY_FIELD_NAMES } from './query-fields.js';
import { keywordFilter } from './query-keywords.js';
import type { ParseQueryResult, QueryFilter, QueryIssue, QueryWord, TermSpan } from './query-types.js';
import { squash } from './search-text.js';
import { tokenizeQuery, unquote } from './tokenize-query.js';

// Longest first, so ">=" is never read as ">" followed by "=40".
const OPERATOR = /(>=|<=|>|<|=)/;
// Typed inputs are short; a pasted page is cut rather than parsed at length.
const MAX_INPUT = 2000;

type TermResult = { word: QueryWord } | { filter: QueryFilter } | { issue: QueryIssue } | { skip: true };

function parseTerm(span: TermSpan): TermResult {
  let body = span.term;
  const isNegated = body.startsWith('-') && body.length > 1;
  if (span.term === '-') {
    return { issue: { ...span, code: 'empty-term', message: 'nothing after "-": write -obsolete to leave out obsolete parts' } };
  }
  if (isNegated) body = body.slice(1);
  const quoted = body.startsWith('"');
  const match = quoted ? null : OPERATOR.exec(body);
  if (!match) return wordOrKeyword(span, body, isNegated);

  const op = match[1] as Operator;
  const name = body.slice(0, match.index);
  const value = body.slice(match.index + op.length);
  if (name === '') {
    return { issue: { ...span, code: 'missing-field', message: `expected a field name before "${op}" in ${JSON.stringify(span.term)}, as in vrrm${op}${value || '40V'}` } };
  }
  if (name.endsWith('!')) {
    return { issue: { ...span, code: 'bad-operator', message: `"!=" is not an operator: write -${name.slice(0, -1)}=${value} to leave those parts out` } };
  }
  const field = findQueryField(name);
  if (!field) {
    const guess = closestName(name, QUERY_FIELD_NAMES);
    const hint = guess ? `did you mean "${guess}"? ` : '';
    return { issue: { ...span, code: 'unknown-field', message: `unknown field ${JSON.stringify(name)} in ${JSON.stringify(span.term)} (${hint}fields: ${QUERY_FIELD_NAMES.join(', ')})` } };
  }
  const parsed = field.type === 'number' ? parseNumberFilter(field, op, value, span, isNegated) : parseChoiceFilter(field, op, value, span, isNegated);
  return parsed.ok ? { filter: parsed.filter } : { issue: { ...span, code: parsed.code, message: parsed.message } };
}

function wordOrKeyword(span: TermSpan, body: string, isNegated: boolean): TermResult {
  const keyword = body.startsWith('"') ? undefined : keywordFilter(body);
  if (keyword) return { filter: { ...span, ...keyword, isNegated } as QueryFilter };
  const text = squash(unquote(body));
  // Punctuation alone ("/", "--") matches everything; it is dropped rather than reported.
  if (text === '') return { skip: true };
  return { word: { ...span, text, isNegated } };
}

/**
 * Reads the search box: free words and filters, all of which a part must satisfy.
 * Never throws; every bad term is reported with its position.
 */
export function parseQuery(input: string): ParseQueryResult {
  const text = typeof input === 'string' ? input.slice(0, MAX_INPUT) : '';
  const { terms, issues } = tokenizeQuery(text);
  const words: QueryWord[] = [];
  const filters: QueryFilter[] = [];
  for (const term of terms) {
    const result = parseTerm(term);
    if ('word' in result) words.push(result.word);
    else if ('filter' in result) filters.push(result.filter);
    else if ('issue' in result) issues.push(result.issue);
  }
  if (issues.length > 0) return { ok: false, issues: issues.sort((a, b) => a.start - b.start) };
  return { ok: true, query: { words, filters } };
}

/** Throwing twin of parseQuery, for code that has already checked its input. */
export function parseQueryOrThrow(input: string): { words: QueryWord[]; filters: QueryFilter[] } {
  const result = parseQuery(input);
  if (!result.ok) throw new Error(result.issues.map((i) => i.message).join('; '));
  return result.query as { words: QueryWord[]; filters: QueryFilter[] };
}
