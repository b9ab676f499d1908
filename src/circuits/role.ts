import type { z } from 'zod';
import type { QuantityKind } from '../units/index.js';
import type { Caution } from './caution.js';
import type { DeratingPolicy } from './derating.js';
import type { DerivationStep } from './derivation.js';
import type { Limit, OperatingPoint } from './limits.js';

export type RoleId =
  | 'rectifier'
  | 'buck-freewheel'
  | 'boost-output'
  | 'flyback-output'
  | 'coil-freewheel'
  | 'polarity-guard'
  | 'zener-regulator'
  | 'transient-clamp'
  | 'signal-clamp';

/** One input a role takes, for `headroom roles`, the form in the TUI and the docs. */
export interface RoleInput {
  readonly name: string;
  readonly label: string;
  readonly quantity?: QuantityKind;
  /** Allowed words for a choice input. */
  readonly choices?: readonly string[];
  /** Default as people would type it; absent when the input is required. */
  readonly default?: string;
  readonly help: string;
}

export interface SolvedPosition {
  readonly role: RoleId;
  readonly policyId: string;
  readonly operatingPoint: OperatingPoint;
  readonly limits: readonly Limit[];
  readonly steps: readonly DerivationStep[];
  readonly cautions: readonly Caution[];
  /** Role-specific figures worth showing (ripple, resistor choice, decay time …), each also a step. */
  readonly figures: Readonly<Record<string, number>>;
  /** Part kinds that suit the position, best first. */
  readonly suitableKinds: readonly string[];
}

/** Expected failures are values: a design may be impossible, and the reason is the answer. */
export type SolveResult =
  | { readonly ok: true; readonly position: SolvedPosition }
  | { readonly ok: false; readonly infeasible: { readonly reason: string; readonly steps: readonly DerivationStep[] } };

export interface RoleDefinition<S extends z.ZodType = z.ZodType> {
  readonly id: RoleId;
  readonly title: string;
  readonly summary: string;
  readonly inputs: readonly RoleInput[];
  /** Validates conditions (numbers in SI, or text with units) into SI numbers. */
  readonly schema: S;
  readonly solve: (conditions: z.output<S>, policy: DeratingPolicy) => SolveResult;
}
