import { describeKind, parseQuantity } from '../../units/index.js';
import { APPROVAL_STATES, LIFECYCLES } from '../../parts/index.js';
import { approvalNamed, KIND_SPELLINGS, kindsNamed, lifecycleNamed, packageNamed } from './query-keywords.js';
import type { ChoiceField, NumberField } from './query-fields.js';
import type { ChoiceFilter, NumberFilter, TermSpan } from './query-types.js';
import { squash } from './search-text.js';
import { unquote } from './tokenize-query.js';

export type Operator = '>=' | '<=' | '>' | '<' | '=';
type Failure = { ok: false; code: 'bad-value' | 'bad-operator' | 'empty-range'; message: string };
type Parsed<T> = { ok: true; filter: T } | Failure;

// A bound means the number as written, not bit-for-bit: 15pF read from text may differ from a
// stored 1.5e-11 in the last bit, and 175 °C in kelvin likewise; every bound gives a little.
const EQUAL_TOLERANCE = 1e-9;
const below = (v: number) => v - Math.abs(v) * EQUAL_TOLERANCE;
const above = (v: number) => v + Math.abs(v) * EQUAL_TOLERANCE;
const BARE_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

function readValue(field: NumberField, text: string, head: string): { ok: true; value: number } | Failure {
  const noun = field.quantity ? describeKind(field.quantity).noun : 'a number';
  if (text.trim() === '') return { ok: false, code: 'bad-value', message: `expected ${noun} after ${head}, got nothing` };
  if (!field.quantity) {
    const value = Number(text);
    return BARE_NUMBER.test(text) && Number.isFinite(value) ? { ok: true, value } : { ok: false, code: 'bad-value', message: `expected a plain number after ${head}, got ${JSON.stringify(text)}` };
  }
  const read = parseQuantity(text, field.quantity, field.bareUnit ? { bareUnit: field.bareUnit } : {});
  if (read.ok) return { ok: true, value: read.value };
  const detail = read.issue.code === 'wrong-quantity' ? ` (${read.issue.message.split('(').pop()}` : '';
  return { ok: false, code: 'bad-value', message: `expected ${noun} after ${head}, got ${JSON.stringify(text)}${detail}` };
}

/** "40..100V": a bare end borrows the unit written on the other end. */
function splitRange(text: string): [string, string] {
  const [low = '', high = ''] = [text.slice(0, text.indexOf('..')), text.slice(text.indexOf('..') + 2)];
  const unitOf = (t: string) => t.replace(/^\s*[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?/i, '');
  if (BARE_NUMBER.test(low.trim()) && unitOf(high) !== high) return [low + unitOf(high), high];
  if (BARE_NUMBER.test(high.trim()) && unitOf(low) !== low) return [low, high + unitOf(low)];
  return [low, high];
}

export function parseNumberFilter(field: NumberField, op: Operator, raw: string, span: TermSpan, isNegated: boolean): Parsed<NumberFilter> {
  const text = unquote(raw);
  const head = `${field.name}${op}`;
  const base = { ...span, type: 'number' as const, field: field.name, key: field.key, isNegated, isMinExclusive: false, isMaxExclusive: false };
  if (text.includes('..')) {
    if (op !== '=') return { ok: false, code: 'bad-operator', message: `a range needs "=", as in ${field.name}=${text}` };
    const [lowText, highText] = splitRange(text);
    const low = readValue(field, lowText, head);
    if (!low.ok) return low;
    const high = readValue(field, highText, `${head}${lowText}..`);
    if (!high.ok) return high;
    if (high.value < low.value) return { ok: false, code: 'empty-range', message: `the range ${text} is empty: put the smaller value first` };
    return { ok: true, filter: { ...base, min: below(low.value), max: above(high.value) } };
  }
  const read = readValue(field, text, head);
  if (!read.ok) return read;
  const v = read.value;
  switch (op) {
    case '>=': return { ok: true, filter: { ...base, min: below(v) } };
    case '>': return { ok: true, filter: { ...base, min: above(v), isMinExclusive: true } };
    case '<=': return { ok: true, filter: { ...base, max: above(v) } };
    case '<': return { ok: true, filter: { ...base, max: below(v), isMaxExclusive: true } };
    case '=': return { ok: true, filter: { ...base, min: below(v), max: above(v) } };
  }
}

const list = (values: readonly string[]) => values.join(', ');

export function parseChoiceFilter(field: ChoiceField, op: Operator, raw: string, span: TermSpan, isNegated: boolean): Parsed<ChoiceFilter> {
  if (op !== '=') return { ok: false, code: 'bad-operator', message: `only "=" works with ${field.name}, got "${op}" in ${JSON.stringify(span.term)}` };
  const values = unquote(raw).split(',').map((v) => v.trim()).filter((v) => v !== '');
  if (values.length === 0) return { ok: false, code: 'bad-value', message: `expected a value after ${field.name}=, got nothing (${field.help})` };
  const base = { ...span, isNegated };
  const unknown = (what: string, value: string, known: readonly string[]): Failure => ({
    ok: false,
    code: 'bad-value',
    message: `unknown ${what} ${JSON.stringify(value)} in ${JSON.stringify(span.term)} (${what}s: ${list(known)})`,
  });
  switch (field.name) {
    case 'kind': {
      const bad = values.find((v) => !kindsNamed(v));
      if (bad !== undefined) return unknown('kind', bad, KIND_SPELLINGS);
      return { ok: true, filter: { ...base, type: 'kind', values: [...new Set(values.flatMap((v) => kindsNamed(v)!))] } };
    }
    case 'approval': {
      const bad = values.find((v) => !approvalNamed(v));
      if (bad !== undefined) return unknown('approval state', bad, APPROVAL_STATES);
      return { ok: true, filter: { ...base, type: 'approval', values: values.map((v) => approvalNamed(v)!) } };
    }
    case 'lifecycle': {
      const bad = values.find((v) => !lifecycleNamed(v));
      if (bad !== undefined) return unknown('lifecycle state', bad, LIFECYCLES);
      return { ok: true, filter: { ...base, type: 'lifecycle', values: values.map((v) => lifecycleNamed(v)!) } };
    }
    case 'package':
      // A package the program does not know is compared as typed: catalogs may hold such names.
      return { ok: true, filter: { ...base, type: 'package', values: values.map((v) => packageNamed(v) ?? v) } };
    case 'maker': {
      const squashed = values.map((v) => squash(v).toLowerCase()).filter((v) => v !== '');
      if (squashed.length === 0) return { ok: false, code: 'bad-value', message: `expected part of a maker name after maker=, got ${JSON.stringify(raw)}` };
      return { ok: true, filter: { ...base, type: 'maker', values: squashed } };
    }
    case 'group':
      return { ok: true, filter: { ...base, type: 'group', values } };
  }
}
