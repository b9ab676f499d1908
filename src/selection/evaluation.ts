import type { Limit } from '../circuits/limits.js';
import type { Part } from '../parts/index.js';
import type { QuantityKind } from '../units/index.js';

/** How a part stands against one limit, or overall. */
export type Verdict = 'pass' | 'marginal' | 'fail' | 'unknown';

export interface EvaluateOptions {
  /** Count a limit the catalog cannot decide (missing datasheet value) as a failure. @default false */
  readonly unknownIsFailure?: boolean;
  /**
   * Write the explanations, methods and notes. Verdicts and margins are the same without them;
   * a catalog search leaves them out while it ranks, then explains the parts it shows. @default true
   */
  readonly isExplaining?: boolean;
}

/** One limit of a position, judged for one part under the circuit's conditions. */
export interface LimitEvaluation {
  readonly limitId: string;
  readonly label: string;
  readonly isHard: boolean;
  /** A catalog rating compared directly, or a value computed with the physics models. */
  readonly checkKind: Limit['check']['kind'];
  readonly relation: Limit['check']['relation'];
  readonly verdict: Verdict;
  /** The part's value under the circuit's conditions (rating, or computed Tj, IR, VC …); null when unknown. */
  readonly value: number | null;
  readonly quantity: QuantityKind;
  /** The bound the value was held against, derating applied (for Tj: the ceiling for this part). */
  readonly bound: number | null;
  /** The circuit's raw stress: missing it is a failure (for Tj: the part's Tj max). */
  readonly stress: number | null;
  /** 1 − demand/capability: the fraction of the capability left unused; negative when short of the bound. */
  readonly headroom: number | null;
  /** Capability − demand, in the quantity's unit (kelvin for temperatures). */
  readonly marginUnits: number | null;
  /** False for an exact requirement (nominal VZ = requested), whose headroom means nothing for ranking. */
  readonly scoresMargin: boolean;
  /** One line in engineering terms: "VRRM 600 V against 373 V needed after 80 % derating: 38 % headroom". */
  readonly explanation: string;
  /** How the value was obtained (model and source), when it was not read straight from the catalog. */
  readonly method: string | undefined;
}

/** Power lost in the part at the solved junction temperature, W. */
export interface LossBreakdown {
  readonly conductionW: number;
  /** Reverse leakage loss; for a Zener in breakdown, its dissipation VZ·IZ. */
  readonly reverseW: number;
  readonly switchingW: number;
  readonly totalW: number;
}

export type ThermalOutcome =
  | { readonly kind: 'stable'; readonly tjK: number; readonly stabilityMargin: number }
  | { readonly kind: 'runaway'; readonly message: string }
  | { readonly kind: 'unknown'; readonly reason: string };

/** The heat balance at the position's highest ambient. */
export interface ThermalEvaluation {
  readonly ambientK: number;
  readonly rthJaKPerW: number | null;
  readonly rthSource: 'board' | 'datasheet' | 'unknown';
  readonly tjMaxK: number;
  /** Tj the policy allows this part: tjCeilingK(policy, Tj max). */
  readonly ceilingK: number;
  /** The policy's margin below Tj max, K. */
  readonly policyMarginK: number;
  readonly outcome: ThermalOutcome;
  /** Losses at the solved Tj (at Tj max after a runaway); null when the loss model is unknown. */
  readonly losses: LossBreakdown | null;
  /** Model assumptions in words, each with its source. */
  readonly notes: readonly string[];
}

export interface PartEvaluation {
  readonly part: Part;
  readonly verdict: Verdict;
  /** One line: what decides the verdict. */
  readonly summary: string;
  readonly limits: readonly LimitEvaluation[];
  /** The scoring limit with the least headroom (hard limits first); null when none could be judged. */
  readonly tightest: LimitEvaluation | null;
  /** Present when a limit needed the heat balance. */
  readonly thermal?: ThermalEvaluation;
  readonly notes: readonly string[];
}
