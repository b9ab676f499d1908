import { QUANTITY_KINDS, type QuantityKind } from './quantity-kinds.js';
import { PARSE_PREFIXES, prefixSymbol } from './si-prefixes.js';
import { UNIT_TABLE, type UnitSpelling } from './unit-table.js';

export interface ResolvedUnit {
  /** Power of ten to SI, prefix included. */
  exponent: number;
  offset: number;
  /** Display form, prefix included: 'kΩ', '°C', '%/K', '' for a fraction. */
  label: string;
  /** False when only a prefix was written ("10k"), so the unit itself was assumed. */
  unitWritten: boolean;
}

/**
 * Normalises look-alike characters engineers paste from datasheets, so the
 * tables only list one spelling of each: Greek mu → micro sign, ohm sign →
 * Greek omega, ℃ → °C, ordinal º / ring ˚ → degree sign, U+2212 minus → '-'.
 */
export function normaliseText(text: string): string {
  return text
    .replace(/\u03bc/g, '\u00b5')
    .replace(/\u2126/g, '\u03a9')
    .replace(/\u2103/g, '\u00b0C')
    .replace(/[\u00ba\u02da]/g, '\u00b0')
    .replace(/\u2212/g, '-');
}

function spells(unit: UnitSpelling, text: string, afterPrefix: boolean): boolean {
  return (
    unit.symbols.includes(text) ||
    unit.words.includes(text.toLowerCase()) ||
    (afterPrefix && unit.afterPrefix.includes(text))
  );
}

function resolved(unit: UnitSpelling, prefixExponent: number, unitWritten: boolean): ResolvedUnit {
  return {
    exponent: unit.exponent + prefixExponent,
    offset: unit.offset,
    label: `${prefixSymbol(prefixExponent)}${unit.label}`,
    unitWritten,
  };
}

/**
 * Reads a unit (whitespace already removed) as a unit of `kind`. Whole
 * spellings are tried before prefix + unit so that a spelling starting with a
 * prefix letter is never split.
 */
export function resolveUnit(kind: QuantityKind, unitText: string): ResolvedUnit | undefined {
  if (unitText === '') return undefined;
  const { units, bare } = UNIT_TABLE[kind];
  for (const unit of units) {
    if (spells(unit, unitText, false)) return resolved(unit, 0, true);
  }
  for (const prefix of PARSE_PREFIXES) {
    if (!unitText.startsWith(prefix.symbol)) continue;
    const rest = unitText.slice(prefix.symbol.length);
    if (rest === '') {
      if (bare.prefixable) return resolved(bare, prefix.exponent, false);
      continue;
    }
    for (const unit of units) {
      if (unit.prefixable && spells(unit, rest, true)) return resolved(unit, prefix.exponent, true);
    }
  }
  return undefined;
}

/** The unit a bare number is read in: `bareUnit` if given, else the kind's default. */
export function resolveBareUnit(kind: QuantityKind, bareUnit: string | undefined): ResolvedUnit | undefined {
  if (bareUnit === undefined || bareUnit.trim() === '') {
    return resolved(UNIT_TABLE[kind].bare, 0, false);
  }
  const found = resolveUnit(kind, normaliseText(bareUnit).replace(/\s+/g, ''));
  return found && { ...found, unitWritten: false };
}

/**
 * Kinds whose written unit matches the text, for "got 5 V (a voltage)".
 * A prefix alone says nothing about the quantity, so it does not count.
 * Temperature and temperature difference share spellings; name only the first.
 */
export function kindsSpelledBy(unitText: string): QuantityKind[] {
  const kinds = QUANTITY_KINDS.filter((kind) => resolveUnit(kind, unitText)?.unitWritten === true);
  if (kinds.includes('temperature')) return kinds.filter((kind) => kind !== 'temperature-difference');
  return kinds;
}
