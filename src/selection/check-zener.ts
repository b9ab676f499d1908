import type { Limit, OperatingPoint } from '../circuits/limits.js';
import { T25C_K, breakdownMechanism, zenerDynamicShift, zenerWindow } from '../physics/index.js';
import type { Part } from '../parts/index.js';
import { formatQuantity } from '../units/index.js';
import type { LimitEvaluation } from './evaluation.js';
import type { Judge } from './judge.js';

/**
 * Typical tempco magnitudes by breakdown mechanism, used only when the catalog gives none:
 * tunnelling about −0.05 %/K, avalanche about +0.07 %/K, mixed within ±0.02 %/K [common practice].
 * The sign follows Sze & Ng §2.4.3 (physics breakdownMechanism).
 */
const TYPICAL_ALPHA = { negative: [-5e-4], positive: [7e-4], 'near-zero': [-2e-4, 2e-4] } as const;

export interface PartZenerWindow {
  readonly minV: number;
  readonly maxV: number;
  readonly method: () => string;
}

/** The part's VZ over its tolerance, its tempco over the ambient range and, with ZZT, the IZ range. */
export function partZenerWindow(part: Part, op: OperatingPoint): PartZenerWindow | undefined {
  if (part.vzV === undefined || part.vzTol === undefined) return undefined;
  const pct = (a: number) => formatQuantity(a, 'tempco');
  let alphas: readonly number[];
  let tempcoText: () => string;
  if (part.vzTempcoPerK !== undefined) {
    alphas = [part.vzTempcoPerK];
    tempcoText = () => `datasheet αVZ ${pct(part.vzTempcoPerK!)}`;
  } else {
    const m = breakdownMechanism(part.vzV);
    const typical = TYPICAL_ALPHA[m.tempcoSign];
    alphas = typical;
    tempcoText = () => `no αVZ in the catalog: ${m.mechanism} breakdown, typical ${typical.map(pct).join(' or ')} [common practice]`;
  }
  const windows = alphas.map((alphaPerK) => zenerWindow({ vzNominalV: part.vzV!, tolerance: part.vzTol!, alphaPerK, tMinK: op.ambientMinK, tMaxK: op.ambientMaxK }));
  let minV = Math.min(...windows.map((w) => w.minV));
  let maxV = Math.max(...windows.map((w) => w.maxV));
  const izMin = op.zenerCurrentMinA;
  const izMax = op.zenerCurrentMaxA;
  const zzt = part.zztOhm;
  const izt = part.iztA;
  const hasShift = zzt !== undefined && izt !== undefined && izMin !== undefined && izMax !== undefined;
  if (hasShift) {
    // VZ(IZ) = VZ(IZT) + ZZT·(IZ − IZT): lowest at IZ,min, highest at IZ,max.
    minV += zenerDynamicShift(izMin, izt, zzt);
    maxV += zenerDynamicShift(izMax, izt, zzt);
  }
  const t = (k: number) => formatQuantity(k, 'temperature');
  const shiftText = () =>
    hasShift ? `; plus ZZT·(IZ − IZT) with ZZT ${formatQuantity(zzt, 'resistance')}, IZT ${formatQuantity(izt, 'current')}, IZ ${formatQuantity(izMin, 'current')} … ${formatQuantity(izMax, 'current')}` : '';
  return {
    minV,
    maxV,
    method: () => `VZ·(1 ± tol)·(1 + α·(T − 25 °C)) over ${t(op.ambientMinK)} … ${t(op.ambientMaxK)} ambient, ${tempcoText()}${shiftText()}`,
  };
}

/** One edge of the part's VZ window against one edge of the allowed window. */
export function checkZenerVoltage(j: Judge, part: Part, limit: Limit, op: OperatingPoint): LimitEvaluation {
  const w = partZenerWindow(part, op);
  if (!w) return j.unknown(limit, 'the catalog gives no VZ and tolerance for this part');
  const isLow = limit.check.relation === 'at-least';
  return j.measured(limit, {
    value: isLow ? w.minV : w.maxV, bound: limit.bound, stress: limit.stress, quantity: 'voltage',
    context: `(the part's ${isLow ? 'lowest' : 'highest'} VZ)`, method: w.method,
  });
}

/**
 * PD available at the highest ambient: (Tj max − Ta)/RθJA capped at the rated PD when an RθJA is
 * known, else the usual linear derating from PD at 25 °C to zero at Tj max. Held against PZ ÷ k(PD).
 */
export function checkZenerPower(j: Judge, part: Part, limit: Limit, op: OperatingPoint): LimitEvaluation {
  if (part.pdW === undefined) return j.unknown(limit, 'the catalog gives no PD for this part');
  if (part.tjMaxK === undefined) return j.unknown(limit, 'the catalog gives no Tj max for this part');
  const ta = op.ambientMaxK;
  const rth = op.rthJaOverrideKPerW ?? part.rthJaKPerW;
  const headroomK = Math.max(0, part.tjMaxK - ta);
  const available = rth !== undefined
    ? Math.min(part.pdW, headroomK / rth)
    : part.pdW * Math.min(1, headroomK / (part.tjMaxK - T25C_K));
  const pd = part.pdW;
  const how = () => (rth !== undefined
    ? `PD = min(PD rated, (Tj max − Ta)/RθJA) with RθJA ${formatQuantity(rth, 'thermal-resistance')}`
    : 'PD derated linearly from 25 °C to zero at Tj max (no RθJA)');
  return j.measured(limit, {
    value: available, bound: limit.bound, stress: limit.stress, quantity: 'power',
    context: () => `(${formatQuantity(pd, 'power')} rated) at ${formatQuantity(ta, 'temperature')} ambient`,
    method: () => `${how()} [common practice]`,
  });
}
