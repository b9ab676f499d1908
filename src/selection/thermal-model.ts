import { tjCeilingK, type DeratingPolicy } from '../circuits/derating.js';
import type { SolvedPosition } from '../circuits/role.js';
import { estimateLeakage, solveJunctionTemperature, sweepAmbient } from '../physics/index.js';
import { junctionFamily, type Part } from '../parts/index.js';
import { formatQuantity } from '../units/index.js';
import type { LossBreakdown, ThermalEvaluation } from './evaluation.js';
import { blockingStress, buildLossModel, type LossModel } from './loss-model.js';
import { provesRunaway } from './runaway-proof.js';

interface Board {
  readonly rthJaKPerW: number | null;
  readonly rthSource: ThermalEvaluation['rthSource'];
}

/** The position's board override wins over the datasheet RθJA (JESD51 boards are not real boards). */
function boardOf(part: Part, position: SolvedPosition): Board {
  const override = position.operatingPoint.rthJaOverrideKPerW;
  if (override !== undefined) return { rthJaKPerW: override, rthSource: 'board' };
  if (part.rthJaKPerW !== undefined) return { rthJaKPerW: part.rthJaKPerW, rthSource: 'datasheet' };
  return { rthJaKPerW: null, rthSource: 'unknown' };
}

function rthNote(board: Board): string {
  if (board.rthJaKPerW === null) return 'no RθJA: neither the position (rth_ja) nor the catalog gives one';
  const r = formatQuantity(board.rthJaKPerW, 'thermal-resistance');
  return board.rthSource === 'board' ? `RθJA ${r} from the position (board value)` : `RθJA ${r} from the datasheet (JESD51 test board; give rth_ja for your board)`;
}

/**
 * Tj at the position's highest ambient: the lowest stable fixed point of Tj = Ta + RθJA·P(Tj)
 * (physics solveJunctionTemperature). No fixed point below Tj max is a thermal runaway.
 */
export function solveThermal(part: Part, position: SolvedPosition, policy: DeratingPolicy, isExplaining = true): ThermalEvaluation {
  const op = position.operatingPoint;
  const tjMaxK = part.tjMaxK ?? Number.NaN;
  const base = { ambientK: op.ambientMaxK, tjMaxK, ceilingK: tjCeilingK(policy, tjMaxK), policyMarginK: policy.tj.marginBelowMaxK };
  const board = boardOf(part, position);
  const built = buildLossModel(part, op);
  if (!built.ok) return { ...base, ...board, outcome: { kind: 'unknown', reason: built.reason }, losses: null, notes: isExplaining ? [rthNote(board)] : [] };
  const notes = isExplaining ? [rthNote(board), ...built.model.describe()] : [];
  if (board.rthJaKPerW === null || !Number.isFinite(tjMaxK)) {
    const reason = board.rthJaKPerW === null ? 'no RθJA (give rth_ja for the position)' : 'the catalog gives no Tj max';
    return { ...base, ...board, outcome: { kind: 'unknown', reason }, losses: built.model.at(op.ambientMaxK), notes };
  }
  if (!isExplaining && provesRunaway(built.model, op.ambientMaxK, board.rthJaKPerW, tjMaxK)) {
    return { ...base, ...board, outcome: { kind: 'runaway', message: '' }, losses: built.model.at(tjMaxK), notes };
  }
  // The model's lower bound lets the solver's bracketing scan skip what cannot hold a balance.
  const result = solveJunctionTemperature({ lossAt: built.model.totalAt, lossBound: built.model, ambientK: op.ambientMaxK, rthJaKPerW: board.rthJaKPerW, tjMaxK });
  if (result.kind === 'stable') {
    return { ...base, ...board, outcome: { kind: 'stable', tjK: result.tjK, stabilityMargin: result.stabilityMargin }, losses: built.model.at(result.tjK), notes };
  }
  return { ...base, ...board, outcome: { kind: 'runaway', message: result.message }, losses: built.model.at(tjMaxK), notes };
}

export interface ThermalSweepPoint {
  readonly ambientK: number;
  /** Null where the junction runs away (no stable balance below Tj max). */
  readonly tjK: number | null;
  readonly losses: LossBreakdown | null;
  /** IR at the working reverse voltage and the solved Tj; null without IR points or at runaway. */
  readonly leakageA: number | null;
  readonly isRunaway: boolean;
}

export type ThermalSweep =
  | {
      readonly ok: true;
      readonly points: readonly ThermalSweepPoint[];
      readonly tjMaxK: number;
      readonly ceilingK: number;
      readonly rthJaKPerW: number;
      readonly notes: readonly string[];
    }
  | { readonly ok: false; readonly reason: string };

/** Tj and leakage against ambient for a chart: steps + 1 points from fromK to toK, runaway marked. */
export function thermalSweep(part: Part, position: SolvedPosition, policy: DeratingPolicy, fromK: number, toK: number, steps: number): ThermalSweep {
  const board = boardOf(part, position);
  const built = buildLossModel(part, position.operatingPoint);
  if (!built.ok) return { ok: false, reason: built.reason };
  if (board.rthJaKPerW === null) return { ok: false, reason: rthNote(board) };
  if (part.tjMaxK === undefined) return { ok: false, reason: 'the catalog gives no Tj max' };
  const model: LossModel = built.model;
  const blocking = blockingStress(position.operatingPoint);
  const leakageAt = (tjK: number): number | null => {
    if (!blocking || part.irPoints.length === 0) return null;
    const e = estimateLeakage(part.irPoints, blocking.vrV, tjK, junctionFamily(part.kind));
    return e.ok ? e.value : null;
  };
  const raw = sweepAmbient(model.totalAt, board.rthJaKPerW, part.tjMaxK, fromK, toK, steps);
  const points = raw.map((p) => ({
    ambientK: p.ambientK,
    tjK: p.tjK,
    losses: p.tjK === null ? null : model.at(p.tjK),
    leakageA: p.tjK === null ? null : leakageAt(p.tjK),
    isRunaway: p.isRunaway,
  }));
  return { ok: true, points, tjMaxK: part.tjMaxK, ceilingK: tjCeilingK(policy, part.tjMaxK), rthJaKPerW: board.rthJaKPerW, notes: [rthNote(board), ...model.describe()] };
}
