import { formatQuantity } from './format-quantity.js';
import {
  decimalText,
  decimalValue,
  looksNonFinite,
  scanNumber,
  separatorAdvice,
  type DecimalText,
} from './number-text.js';
import type { QuantityKind } from './quantity-kinds.js';
import { readRkm } from './rkm.js';
import {
  emptyIssue,
  notANumberIssue,
  notFiniteIssue,
  subjectOf,
  unknownUnitIssue,
  wrongQuantityIssue,
  type Subject,
  type UnitIssue,
} from './unit-issue.js';
import { kindsSpelledBy, normaliseText, resolveBareUnit, resolveUnit, type ResolvedUnit } from './unit-lookup.js';

export type QuantityResult =
  | { ok: true; value: number; usedDefaultUnit: boolean; note?: string }
  | { ok: false; issue: UnitIssue };

export interface ParseQuantityOptions {
  /** Unit assumed for a bare number instead of the kind's default, e.g. 'K' for kelvin columns. */
  bareUnit?: string;
}

type UnitReading = { ok: true; unit: ResolvedUnit } | { ok: false; issue: UnitIssue };

/** Reads the text after a number as a unit of `kind`, or says why it is not one. */
export function readUnit(
  kind: QuantityKind,
  subject: Subject,
  input: string,
  rest: string,
  bareUnit?: string,
): UnitReading {
  const unitText = rest.replace(/\s+/g, '');
  if (unitText === '') {
    const unit = resolveBareUnit(kind, bareUnit);
    return unit ? { ok: true, unit } : { ok: false, issue: unknownUnitIssue(subject, input, bareUnit ?? '') };
  }
  const unit = resolveUnit(kind, unitText);
  if (unit) return { ok: true, unit };
  const kinds = kindsSpelledBy(unitText);
  const issue =
    kinds.length > 0 ? wrongQuantityIssue(subject, input, kinds) : unknownUnitIssue(subject, input, rest);
  return { ok: false, issue };
}

/** Splits text into a number and what follows, or says why it does not start with a number. */
export function readNumber(
  subject: Subject,
  input: string,
  text: string,
): { ok: true; number: DecimalText; rest: string } | { ok: false; issue: UnitIssue } {
  if (/\d,\d/.test(text)) return { ok: false, issue: notANumberIssue(subject, input, separatorAdvice(text)) };
  if (looksNonFinite(text)) return { ok: false, issue: notFiniteIssue(subject, input) };
  const scanned = scanNumber(text);
  if (!scanned || /^[.\d]/.test(scanned.rest)) return { ok: false, issue: notANumberIssue(subject, input) };
  if (/^[\s'’_]+\d/.test(scanned.rest)) {
    return { ok: false, issue: notANumberIssue(subject, input, separatorAdvice(text)) };
  }
  return { ok: true, number: scanned.number, rest: scanned.rest };
}

function bareNote(kind: QuantityKind, number: DecimalText, unit: ResolvedUnit, value: number): string {
  const written = decimalText(number);
  if (unit.label === '') {
    return `no unit given; read as the fraction ${written} (${formatQuantity(value, kind)})`;
  }
  return `no unit given; read as ${written} ${unit.label}`;
}

export function parseQuantity(text: string, kind: QuantityKind, options: ParseQuantityOptions = {}): QuantityResult {
  const input = typeof text === 'string' ? text : typeof text === 'number' ? String(text) : '';
  const subject = subjectOf(kind);
  const source = normaliseText(input).trim();
  if (source === '') return { ok: false, issue: emptyIssue(subject) };

  let number: DecimalText;
  let rest: string;
  const rkm = readRkm(source);
  if (rkm) {
    number = rkm.number;
    rest = rkm.unitText;
  } else {
    const scanned = readNumber(subject, input, source);
    if (!scanned.ok) return scanned;
    number = scanned.number;
    rest = scanned.rest;
  }

  const reading = readUnit(kind, subject, input, rest, options.bareUnit);
  if (!reading.ok) return reading;
  const { unit } = reading;
  const value = decimalValue(number, unit.exponent, unit.offset);
  if (!Number.isFinite(value)) return { ok: false, issue: notFiniteIssue(subject, input) };
  if (unit.unitWritten) return { ok: true, value, usedDefaultUnit: false };
  return { ok: true, value, usedDefaultUnit: true, note: bareNote(kind, number, unit, value) };
}
