import { describeKind, expectedForm, type QuantityKind } from './quantity-kinds.js';

export interface UnitIssue {
  code: 'empty' | 'not-a-number' | 'wrong-quantity' | 'unknown-unit' | 'not-finite';
  message: string;
  /** The accepted form with examples, e.g. 'a current such as "1.5 A", "500 mA" or "4m7"'. */
  expected: string;
}

/** What a field expects, for messages: a quantity kind or the surge waveform. */
export interface Subject {
  noun: string;
  expected: string;
}

export function subjectOf(kind: QuantityKind): Subject {
  return { noun: describeKind(kind).noun, expected: expectedForm(kind) };
}

const QUOTE_LIMIT = 40;

/** The input as shown back in messages: trimmed, shortened, control characters escaped. */
export function quoteInput(text: string): string {
  const characters = Array.from(text.trim());
  const shown =
    characters.length > QUOTE_LIMIT ? `${characters.slice(0, QUOTE_LIMIT - 1).join('')}…` : characters.join('');
  return JSON.stringify(shown);
}

function issue(code: UnitIssue['code'], subject: Subject, message: string): UnitIssue {
  return { code, message: `expected ${subject.noun}, got ${message}`, expected: subject.expected };
}

export function emptyIssue(subject: Subject): UnitIssue {
  return issue('empty', subject, 'nothing');
}

export function notANumberIssue(subject: Subject, input: string, advice?: string): UnitIssue {
  const quoted = quoteInput(input);
  return issue('not-a-number', subject, advice ? `${quoted}: ${advice}` : `${quoted}, which is not a number`);
}

export function wrongQuantityIssue(subject: Subject, input: string, kinds: readonly QuantityKind[]): UnitIssue {
  const nouns = kinds.map((kind) => describeKind(kind).noun).join(' or ');
  return issue('wrong-quantity', subject, `${quoteInput(input)} (${nouns})`);
}

export function unknownUnitIssue(subject: Subject, input: string, unitText: string): UnitIssue {
  return issue('unknown-unit', subject, `${quoteInput(input)}: unknown unit ${quoteInput(unitText)}`);
}

export function notFiniteIssue(subject: Subject, input: string): UnitIssue {
  return issue('not-finite', subject, `${quoteInput(input)}, which is not a finite number`);
}
