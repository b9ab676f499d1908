import type { Limit } from '../circuits/limits.js';
import type { SolvedPosition } from '../circuits/role.js';
import { estimateForwardVoltage, estimateLeakage } from '../physics/index.js';
import { junctionFamily, type Part } from '../parts/index.js';
import { formatQuantity } from '../units/index.js';
import type { LimitEvaluation, ThermalEvaluation } from './evaluation.js';
import type { Judge } from './judge.js';
import { blockingStress, conductionCurrents } from './loss-model.js';

const t = (k: number) => formatQuantity(k, 'temperature');

/** Tj at the highest ambient against the policy's ceiling for this part; runaway is a failure. */
export function checkJunctionTemperature(j: Judge, limit: Limit, thermal: ThermalEvaluation): LimitEvaluation {
  const o = thermal.outcome;
  if (o.kind === 'unknown') return j.unknown(limit, () => `Tj cannot be solved: ${o.reason}`, 'temperature');
  if (o.kind === 'runaway') {
    return j.decided(limit, 'fail', () => `Tj: thermal runaway at ${t(thermal.ambientK)} ambient. ${o.message}`, 'temperature');
  }
  return j.measured(limit, {
    value: o.tjK,
    bound: thermal.ceilingK,
    stress: thermal.tjMaxK,
    quantity: 'temperature',
    origin: thermal.ambientK,
    context: () => `at ${t(thermal.ambientK)} ambient (${formatQuantity(thermal.losses?.totalW ?? 0, 'power')})`,
    boundNote: j.isExplaining ? ceilingNote(thermal) : '',
    stressName: 'Tj max',
    isMarginInUnits: true,
    method: () => thermal.notes.join('; '),
  });
}

/** Which rule set the ceiling: the margin below Tj max, or the policy's absolute ceiling. */
function ceilingNote(thermal: ThermalEvaluation): string {
  const byMargin = thermal.tjMaxK - thermal.policyMarginK;
  const margin = formatQuantity(thermal.policyMarginK, 'temperature-difference');
  return thermal.ceilingK < byMargin - 1e-9
    ? ` (the policy's absolute ceiling, below Tj max ${t(thermal.tjMaxK)} less ${margin})`
    : ` (Tj max ${t(thermal.tjMaxK)} less ${margin})`;
}

/**
 * When Tj is unknown the value at the ambient is a one-sided bound: failing there is a failure,
 * meeting the limit there is not a pass (self-heating is left out), so it stays unknown.
 */
function atAmbientOnly(j: Judge, limit: Limit, judged: LimitEvaluation, why: string): LimitEvaluation {
  if (judged.verdict === 'fail') return judged;
  return j.unknown(limit, () => `${judged.explanation}, but Tj is unknown (${why}), so self-heating is left out`, judged.quantity, { value: judged.value ?? undefined });
}

function tjWhy(thermal: ThermalEvaluation): string {
  return thermal.outcome.kind === 'unknown' ? thermal.outcome.reason : '';
}

/** IR at the working reverse voltage and the solved Tj (the hot junction). */
export function checkLeakage(j: Judge, part: Part, limit: Limit, position: SolvedPosition, thermal: ThermalEvaluation): LimitEvaluation {
  const b = blockingStress(position.operatingPoint);
  if (!b) return j.unknown(limit, 'the position gives no reverse voltage');
  if (part.irPoints.length === 0) return j.unknown(limit, 'the catalog gives no IR points for this part');
  const o = thermal.outcome;
  if (o.kind === 'runaway') return j.decided(limit, 'fail', () => `IR: the junction runs away at ${t(thermal.ambientK)} ambient, so the leakage has no bound. ${o.message}`);
  const tjK = o.kind === 'stable' ? o.tjK : thermal.ambientK;
  const e = estimateLeakage(part.irPoints, b.vrV, tjK, junctionFamily(part.kind));
  if (!e.ok) return j.unknown(limit, e.message);
  const where = () => (o.kind === 'stable' ? `Tj ${t(tjK)}` : `${t(tjK)} ambient`);
  const judged = j.measured(limit, {
    value: e.value, bound: limit.bound, stress: limit.stress, quantity: 'current',
    context: () => `at ${formatQuantity(b.vrV, 'voltage')} and ${where()}`, method: e.method,
  });
  return o.kind === 'stable' ? judged : atAmbientOnly(j, limit, judged, tjWhy(thermal));
}

/** VF at the conducting current, highest of the coldest ambient and the solved Tj (VF falls with T). */
export function checkForwardDrop(j: Judge, part: Part, limit: Limit, position: SolvedPosition, thermal: ThermalEvaluation): LimitEvaluation {
  const op = position.operatingPoint;
  const i = conductionCurrents(op);
  if (!i) return j.unknown(limit, 'the position gives no forward current');
  if (part.vfPoints.length === 0) return j.unknown(limit, 'the catalog gives no VF points for this part');
  let worst: { tjK: number; vfV: number; method: string } | undefined;
  for (const tjK of [op.ambientMinK, ...(thermal.outcome.kind === 'stable' ? [thermal.outcome.tjK] : [])]) {
    const e = estimateForwardVoltage(part.vfPoints, i.conductingA, tjK);
    if (!e.ok) return j.unknown(limit, e.message);
    if (!worst || e.value > worst.vfV) worst = { tjK, vfV: e.value, method: e.method };
  }
  const w = worst!;
  return j.measured(limit, {
    value: w.vfV, bound: limit.bound, stress: limit.stress, quantity: 'voltage',
    context: () => `at ${formatQuantity(i.conductingA, 'current')} and Tj ${t(w.tjK)}`, method: w.method,
  });
}

/** Total loss at the solved Tj against the budget. */
export function checkDissipation(j: Judge, limit: Limit, thermal: ThermalEvaluation): LimitEvaluation {
  const o = thermal.outcome;
  if (o.kind === 'runaway') return j.decided(limit, 'fail', () => `P: thermal runaway at ${t(thermal.ambientK)} ambient. ${o.message}`);
  if (!thermal.losses) return j.unknown(limit, o.kind === 'unknown' ? o.reason : 'no loss model');
  const tjK = o.kind === 'stable' ? o.tjK : thermal.ambientK;
  const judged = j.measured(limit, {
    value: thermal.losses.totalW, bound: limit.bound, stress: limit.stress, quantity: 'power',
    context: () => `at ${o.kind === 'stable' ? `Tj ${t(tjK)}` : `${t(tjK)} ambient`}`, method: () => thermal.notes.join('; '),
  });
  return o.kind === 'stable' ? judged : atAmbientOnly(j, limit, judged, tjWhy(thermal));
}
