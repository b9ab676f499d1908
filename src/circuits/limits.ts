import type { QuantityKind } from '../units/index.js';
import type { Waveform } from '../units/index.js';

/**
 * What a part must meet at a position. A `rating` limit compares one catalog rating with a bound;
 * a `computed` limit needs the part's data and the operating point together (junction temperature,
 * leakage at temperature, clamp voltage at the circuit's surge current …) and is evaluated in
 * selection with the physics models.
 */
export type LimitCheck =
  | { readonly kind: 'rating'; readonly rating: RatedField; readonly relation: 'at-least' | 'at-most' }
  | { readonly kind: 'computed'; readonly what: ComputedCheck; readonly relation: 'at-least' | 'at-most' };

/** Catalog ratings a limit can name (keys of the part model). */
export type RatedField =
  | 'vrrmV' | 'ifAvA' | 'ifsmA' | 'trrS' | 'qrrC' | 'cjF' | 'pdW' | 'tjMaxK'
  | 'vzV' | 'vrwmV' | 'vbrMinV' | 'vbrMaxV' | 'vcV' | 'pppmW';

export type ComputedCheck =
  /** Tj solved from forward, reverse and switching loss ≤ the policy's ceiling for that part. */
  | 'junction-temperature'
  /** IR at the solved (or maximum ambient) junction temperature and working VR ≤ bound. */
  | 'leakage-at-temperature'
  /** VF at the operating current and temperature ≤ bound (drop budget). */
  | 'forward-drop'
  /** Forward conduction plus reverse loss at the operating point ≤ bound. */
  | 'dissipation'
  /** Zener VZ over tolerance and temperature inside [min, max] (two limits, one each side). */
  | 'zener-voltage'
  /** Zener dissipation ≤ derated PD at the solved temperature. */
  | 'zener-power'
  /** TVS clamp at the circuit's surge current ≤ the protected circuit's withstand voltage. */
  | 'clamp-voltage'
  /** TVS peak pulse power scaled to the circuit's waveform, derated, ≥ required. */
  | 'pulse-power';

export interface Limit {
  /** Stable id, unique within a position: 'vrrm', 'if-av', 'tj' … */
  readonly id: string;
  /** Trade term shown to people: 'VRRM', 'IF(AV)', 'Tj'. */
  readonly label: string;
  readonly check: LimitCheck;
  /** The bound in SI units, derating already applied (NaN never: roles reject such inputs). */
  readonly bound: number;
  readonly quantity: QuantityKind;
  /** The circuit's own stress before derating, e.g. the worst reverse voltage. */
  readonly stress: number;
  /** Which policy and factor turned the stress into the bound, if any. */
  readonly derating?: { readonly policyId: string; readonly factor: string; readonly value: number; readonly source: string };
  /** One line in engineering terms: "worst reverse voltage 373 V ÷ 0.8 (commercial VRRM factor)". */
  readonly reason: string;
  /** False for preferences (e.g. a fast part preferred): a miss is marginal, not a failure. */
  readonly isHard: boolean;
}

/** Worst-case conditions at the position; fields a role does not use are left out. SI units. */
export interface OperatingPoint {
  readonly ambientMinK: number;
  readonly ambientMaxK: number;
  /** Highest instantaneous reverse voltage, spikes and ringing included. */
  readonly reversePeakV?: number;
  /** Reverse voltage held during the blocking interval, for leakage loss. */
  readonly reverseWorkingV?: number;
  /** Fraction of time the diode blocks at reverseWorkingV. */
  readonly reverseDuty?: number;
  readonly forwardAvgA?: number;
  readonly forwardRmsA?: number;
  readonly forwardPeakA?: number;
  readonly forwardRepetitivePeakA?: number;
  /** Non-repetitive surge (inrush, fault) and its duration. */
  readonly surgeA?: number;
  readonly surgePulseS?: number;
  /** Fraction of time the diode conducts. */
  readonly forwardDuty?: number;
  readonly switchingFrequencyHz?: number;
  /** Reverse voltage at which the diode switches off, for recovery and capacitive loss. */
  readonly switchingVoltageV?: number;
  /** Board thermal resistance override for this position. */
  readonly rthJaOverrideKPerW?: number;
  /** Zener positions: current range through the Zener. */
  readonly zenerCurrentMinA?: number;
  readonly zenerCurrentMaxA?: number;
  /** TVS positions: the surge the clamp must absorb. */
  readonly surge?: {
    readonly openCircuitV: number;
    readonly sourceOhm: number;
    readonly waveform: Waveform;
    readonly withstandV: number;
    readonly workingV: number;
  };
}
