import type { DeratingPolicy } from '../circuits/derating.js';
import type { Limit, OperatingPoint } from '../circuits/limits.js';
import { scalePeakPulsePower, tvsClampEstimate, tvsDynamicResistance, type ClampEstimate } from '../physics/index.js';
import type { Part } from '../parts/index.js';
import { formatQuantity, formatWaveform } from '../units/index.js';
import type { LimitEvaluation } from './evaluation.js';
import type { Judge } from './judge.js';

/** Without VBR max, datasheets' VBR spread of about ±5 % around nominal puts it near 1.1 × VBR min [common practice]. */
const VBR_MAX_FROM_MIN = 1.1;

export type PartClamp =
  | { readonly ok: true; readonly clamp: ClampEstimate; readonly rdynOhm: number; readonly vbrMaxV: number; readonly method: () => string }
  | { readonly ok: false; readonly reason: string };

/** The part at the position's surge: Rdyn from its rated clamp point, then IPP and VC at Voc behind Zs. */
export function partClamp(part: Part, op: OperatingPoint): PartClamp {
  const surge = op.surge;
  if (!surge) return { ok: false, reason: 'the position gives no surge' };
  if (part.vcV === undefined || part.ippA === undefined || part.vbrMinV === undefined) {
    return { ok: false, reason: 'the catalog gives no VC, IPP and VBR for this part' };
  }
  const vbrMaxV = part.vbrMaxV ?? VBR_MAX_FROM_MIN * part.vbrMinV;
  const vbrText = part.vbrMaxV !== undefined ? 'VBR,max from the datasheet' : `VBR,max ≈ ${VBR_MAX_FROM_MIN} × VBR,min (no VBR max in the catalog) [common practice]`;
  const { vcV, ippA } = part;
  if (!(vcV >= vbrMaxV)) return { ok: false, reason: `its VC ${formatQuantity(vcV, 'voltage')} is below VBR,max ${formatQuantity(vbrMaxV, 'voltage')}: the clamp data are inconsistent` };
  const rdynOhm = tvsDynamicResistance(vcV, vbrMaxV, ippA);
  const clamp = tvsClampEstimate({ vocV: surge.openCircuitV, sourceOhm: surge.sourceOhm, vbrMaxV, rdynOhm });
  const method = () =>
    `Rdyn = (VC − VBR,max)/IPP = (${formatQuantity(vcV, 'voltage')} − ${formatQuantity(vbrMaxV, 'voltage')})/${formatQuantity(ippA, 'current')} = ${formatQuantity(rdynOhm, 'resistance')}, ${vbrText}; ${clamp.method}`;
  return { ok: true, clamp, rdynOhm, vbrMaxV, method };
}

/** VC at the circuit's surge current ≤ the protected circuit's withstand. */
export function checkClampVoltage(j: Judge, part: Part, limit: Limit, op: OperatingPoint): LimitEvaluation {
  const c = partClamp(part, op);
  if (!c.ok) return j.unknown(limit, c.reason);
  return j.measured(limit, {
    value: c.clamp.vcV, bound: limit.bound, stress: limit.stress, quantity: 'voltage',
    context: () => `at IPP ${formatQuantity(c.clamp.ippA, 'current')}`, method: c.method,
  });
}

/**
 * The part's PPPM scaled from its rated pulse to the surge's width by P(t2) = P(t1)·(t1/t2)^0.5
 * (Wunsch & Bell, ±30 %), held against this part's own VC·IPP at the surge: fail below VC·IPP,
 * marginal below VC·IPP ÷ k(PPPM).
 */
export function checkPulsePower(j: Judge, part: Part, limit: Limit, op: OperatingPoint, policy: DeratingPolicy): LimitEvaluation {
  const c = partClamp(part, op);
  if (!c.ok) return j.unknown(limit, c.reason);
  if (part.pppmW === undefined || part.pppmDecayS === undefined) return j.unknown(limit, 'the catalog gives no PPPM and its pulse for this part');
  const surge = op.surge!;
  if (c.clamp.ippA === 0) return j.decided(limit, 'pass', () => `PPPM: the surge stays below VBR,max ${formatQuantity(c.vbrMaxV, 'voltage')}, so the part absorbs no pulse`);
  const scaled = scalePeakPulsePower(part.pppmW, part.pppmDecayS, surge.waveform.decayS);
  const demandW = c.clamp.vcV * c.clamp.ippA;
  const k = policy.factors.pppm.value;
  const { pppmW, pppmDecayS, pppmRiseS } = part;
  const rated = () => (pppmRiseS !== undefined ? formatWaveform({ riseS: pppmRiseS, decayS: pppmDecayS }) : formatQuantity(pppmDecayS, 'time'));
  return j.measured(limit, {
    value: scaled.value, bound: demandW / k, stress: demandW, quantity: 'power',
    context: () => `(${formatQuantity(pppmW, 'power')} at ${rated()}, scaled to ${formatQuantity(surge.waveform.decayS, 'time')} by the √t rule, ±30 %)`,
    boundNote: j.isExplaining ? ` for VC·IPP ${formatQuantity(demandW, 'power')} after ${+(k * 100).toFixed(1)} % derating` : '',
    method: () => `${scaled.method}; demand VC·IPP = ${formatQuantity(c.clamp.vcV, 'voltage')} × ${formatQuantity(c.clamp.ippA, 'current')} at this part's clamp`,
  });
}
