import { formatQuantity, type QuantityKind } from '../units/index.js';

/**
 * One step of a derivation, as data: the TUI, the CLI and reports all render the same steps.
 * `substituted` shows the formula with the numbers put in, so a reviewer can redo it by hand.
 */
export interface DerivationStep {
  /** What is computed, in words: "peak reverse voltage per diode". */
  readonly quantity: string;
  /** Its symbol, e.g. "VR,max". */
  readonly symbol: string;
  /** Right-hand side only: "√2·Vs,rms·(1 + tol)"; printers put "symbol = " in front. */
  readonly formula: string;
  readonly substituted: string;
  /** Result in SI units. */
  readonly value: number;
  readonly unit: QuantityKind | 'dimensionless';
  /** Where the formula comes from: "Sedra & Smith, peak rectifier" or "common practice". */
  readonly source?: string;
}

export function formatStepValue(step: Pick<DerivationStep, 'value' | 'unit'>): string {
  return step.unit === 'dimensionless' ? String(+step.value.toPrecision(3)) : formatQuantity(step.value, step.unit);
}

/** Collects steps in order and returns each value, so a role reads like its hand calculation. */
export class Derivation {
  readonly steps: DerivationStep[] = [];

  /** Records a step and returns its value; a non-finite result is a programmer error upstream. */
  step(step: DerivationStep): number {
    if (!Number.isFinite(step.value)) {
      throw new RangeError(`derivation step "${step.quantity}" gave ${step.value}; inputs should have been rejected first`);
    }
    // Some roles write "X = …" in the formula; keep one form so every printer can add the symbol.
    const formula = stripSymbol(step.formula, step.symbol);
    this.steps.push({ ...step, formula });
    return step.value;
  }
}

function stripSymbol(formula: string, symbol: string): string {
  for (const relation of [' =', ' ≈']) {
    if (formula.startsWith(symbol + relation)) return formula.slice(symbol.length + relation.length).trim();
  }
  return formula;
}

/** Shorthand for numbers inside `substituted` text. */
export const q = (value: number, unit: QuantityKind): string => formatQuantity(value, unit);
