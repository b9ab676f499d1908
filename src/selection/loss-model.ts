import type { OperatingPoint } from '../circuits/limits.js';
import { estimateForwardVoltage, forwardVoltageValue, leakageValue } from '../physics/index.js';
import { junctionFamily, type Part } from '../parts/index.js';
import { formatQuantity } from '../units/index.js';
import type { LossBreakdown } from './evaluation.js';
import { compileLoss, temperatureBreakpoints, type ConductionShape, type ReverseShape } from './loss-function.js';

/** Dissipation as a function of junction temperature, with its assumptions in words. */
export interface LossModel {
  readonly at: (tjK: number) => LossBreakdown;
  /** The total alone, without allocating: the solver calls it thousands of times. */
  readonly totalAt: (tjK: number) => number;
  /** The assumptions in words, built on demand. */
  readonly describe: () => string[];
  /** Temperatures where the model changes line (see loss-function.ts). */
  readonly breakpoints: readonly number[];
  /** A lower bound of the total over [t1, t2] when no breakpoint lies inside. */
  readonly lowerBound: (t1: number, t2: number) => number;
}

export type LossModelResult = { readonly ok: true; readonly model: LossModel } | { readonly ok: false; readonly reason: string };

/** At or below this frequency recovery loss is negligible beside conduction [common practice]. */
const LINE_FREQUENCY_MAX_HZ = 1000;
const PRACTICE = '[common practice]';

type Note = () => string;
type Term<T> = { ok: true; shape: T | undefined; note?: Note } | { ok: false; reason: string };

/**
 * P(Tj) = conduction + reverse + switching. Conduction linearises VF(I, Tj) ≈ VF0 + rd·I through
 * the average current during conduction and the peak current, so P = VF0·IF(AV) + rd·IF(RMS)².
 * Reverse: VR,working·IR(VR, Tj)·reverse duty. Switching: Qrr·VR·fs plus ½·Cj·VR²·fs (Tj-independent).
 */
export function buildLossModel(part: Part, op: OperatingPoint): LossModelResult {
  if (part.kind === 'zener' && op.zenerCurrentMaxA !== undefined) return zenerLoss(part, op.zenerCurrentMaxA);
  const c = conduction(part, op);
  if (!c.ok) return c;
  const r = reverse(part, op);
  if (!r.ok) return r;
  const s = switching(part, op);
  if (!s.ok) return s;
  const switchingW = s.shape ?? 0;
  const f = compileLoss({ ...(c.shape ? { conduction: c.shape } : {}), ...(r.shape ? { reverse: r.shape } : {}), switchingW });
  return {
    ok: true,
    model: {
      describe: () => [c.note, r.note, s.note].flatMap((n) => (n ? [n()] : [])),
      totalAt: f.totalAt,
      breakpoints: f.breakpoints,
      lowerBound: f.lowerBound,
      at: (tjK) => {
        const conductionW = f.conductionAt(tjK);
        const reverseW = f.reverseAt(tjK);
        return { conductionW, reverseW, switchingW, totalW: conductionW + reverseW + switchingW };
      },
    },
  };
}

/** A Zener in breakdown dissipates VZ·IZ, taken at its highest VZ (tolerance) and the highest IZ. */
function zenerLoss(part: Part, izMaxA: number): LossModelResult {
  const vzMaxV = (part.vzV ?? 0) * (1 + (part.vzTol ?? 0));
  const w = vzMaxV * izMaxA;
  const note = () => `Zener dissipation VZ·IZ = ${formatQuantity(vzMaxV, 'voltage')} (VZ + tolerance) × ${formatQuantity(izMaxA, 'current')} (IZ,max), counted as reverse loss`;
  return {
    ok: true,
    model: { describe: () => [note()], totalAt: () => w, breakpoints: [], lowerBound: () => w, at: () => ({ conductionW: 0, reverseW: w, switchingW: 0, totalW: w }) },
  };
}

/** Current during conduction (IF(AV)/duty) and the peak, the two points of the VF line. */
export function conductionCurrents(op: OperatingPoint): { avgA: number; conductingA: number; peakA: number; rmsA: number } | undefined {
  const avgA = op.forwardAvgA;
  if (avgA === undefined || !(avgA > 0)) return undefined;
  const duty = op.forwardDuty !== undefined && op.forwardDuty > 0 ? Math.min(1, op.forwardDuty) : 1;
  const conductingA = avgA / duty;
  const peakA = Math.max(conductingA, op.forwardPeakA ?? conductingA);
  const rmsA = op.forwardRmsA ?? avgA / Math.sqrt(duty);
  return { avgA, conductingA, peakA, rmsA };
}

function conduction(part: Part, op: OperatingPoint): Term<ConductionShape> {
  const i = conductionCurrents(op);
  if (!i) {
    const pulse = op.forwardPeakA !== undefined ? ': the diode conducts single pulses, which IFSM covers' : '';
    return { ok: true, shape: undefined, ...(pulse ? { note: () => `no average forward current${pulse}` } : {}) };
  }
  if (part.vfPoints.length === 0) return { ok: false, reason: 'the catalog gives no VF points, so the conduction loss is unknown' };
  // Each temperature group of points is used somewhere in Tj: check each once, before the solver
  // runs. The value alone first (NaN when there is no estimate); the words only for the message.
  const temperatures = [...new Set(part.vfPoints.map((p) => p.tjK))];
  for (const tjK of temperatures) {
    for (const ifA of [i.conductingA, i.peakA]) {
      if (!Number.isNaN(forwardVoltageValue(part.vfPoints, ifA, tjK))) continue;
      const probe = estimateForwardVoltage(part.vfPoints, ifA, tjK);
      if (!probe.ok) return { ok: false, reason: probe.message };
    }
  }
  const vfAt = (ifA: number, tjK: number) => {
    const v = forwardVoltageValue(part.vfPoints, ifA, tjK);
    return Number.isNaN(v) ? 0 : v;
  };
  const hasSlope = i.peakA > i.conductingA * (1 + 1e-6);
  const q = (a: number) => formatQuantity(a, 'current');
  return {
    ok: true,
    shape: { ...i, vfAt, breakpoints: temperatureBreakpoints(temperatures) },
    note: () => (hasSlope
      ? `conduction P = VF0·IF(AV) + rd·IF(RMS)², VF linearised through ${q(i.conductingA)} and ${q(i.peakA)} from the datasheet points`
      : `conduction P = VF·IF(AV) at ${q(i.conductingA)} from the datasheet points`),
  };
}

/** Reverse voltage held while blocking, and for what fraction of the time. */
export function blockingStress(op: OperatingPoint): { vrV: number; duty: number } | undefined {
  const vrV = op.reverseWorkingV ?? op.reversePeakV;
  if (vrV === undefined || !(vrV > 0)) return undefined;
  const duty = op.reverseDuty ?? (op.forwardDuty !== undefined ? 1 - op.forwardDuty : 1);
  return { vrV, duty: Math.min(1, Math.max(0, duty)) };
}

function reverse(part: Part, op: OperatingPoint): Term<ReverseShape> {
  const b = blockingStress(op);
  if (!b || b.duty === 0) return { ok: true, shape: undefined };
  const family = junctionFamily(part.kind);
  if (part.irPoints.length === 0) {
    if (family === 'schottky') return { ok: false, reason: "the catalog gives no IR points, and a Schottky's leakage can decide its temperature" };
    return { ok: true, shape: undefined, note: () => 'no IR points: reverse loss left out (small for a PN or SiC junction)' };
  }
  const lnIrAt = (tjK: number) => {
    const v = leakageValue(part.irPoints, b.vrV, tjK, family);
    return Number.isNaN(v) ? Number.NEGATIVE_INFINITY : Math.log(v);
  };
  return {
    ok: true,
    shape: { ...b, lnIrAt, breakpoints: temperatureBreakpoints(part.irPoints.map((p) => p.tjK)) },
    note: () => `reverse P = VR·IR(VR, Tj)·duty at ${formatQuantity(b.vrV, 'voltage')}, duty ${formatQuantity(b.duty, 'ratio')}`,
  };
}

function switching(part: Part, op: OperatingPoint): Term<number> {
  const fs = op.switchingFrequencyHz;
  const v = op.switchingVoltageV ?? op.reverseWorkingV ?? op.reversePeakV;
  if (fs === undefined || v === undefined || !(fs > 0 && v > 0)) return { ok: true, shape: 0 };
  const family = junctionFamily(part.kind);
  const cj = part.cjF;
  const capacitiveW = cj !== undefined ? 0.5 * cj * v * v * fs : 0;
  const capNote = () => (cj !== undefined ? ` + capacitive ½·Cj·VR²·fs (Cj ${formatQuantity(cj, 'capacitance')}, its highest value, conservative)` : '');
  let qrrC: number;
  let how: Note;
  if (part.qrrC !== undefined) {
    const given = part.qrrC;
    qrrC = given;
    how = () => `recovery Qrr·VR·fs with the datasheet Qrr ${formatQuantity(given, 'charge')}`;
  } else if (family === 'pn' && part.trrS !== undefined) {
    // Hard turn-off at the conducting current: a triangular recovery with IRM ≈ IF.
    const ifA = conductionCurrents(op)?.conductingA ?? op.forwardPeakA ?? 0;
    const trr = part.trrS;
    qrrC = 0.5 * trr * ifA;
    how = () => `recovery Qrr·VR·fs with Qrr ≈ ½·trr·IF = ½·${formatQuantity(trr, 'time')}·${formatQuantity(ifA, 'current')} (triangular recovery, IRM ≈ IF) ${PRACTICE}`;
  } else if (family !== 'pn') {
    qrrC = 0;
    how = () => 'no recovery loss (Schottky: no stored charge)';
  } else if (fs <= LINE_FREQUENCY_MAX_HZ) {
    qrrC = 0;
    how = () => `recovery loss at ${formatQuantity(fs, 'frequency')} taken as negligible ${PRACTICE}`;
  } else {
    return { ok: false, reason: `the catalog gives no trr or Qrr, so the recovery loss at ${formatQuantity(fs, 'frequency')} is unknown` };
  }
  return {
    ok: true,
    shape: qrrC * v * fs + capacitiveW,
    note: () => `switching: ${how()}${capNote()}, at ${formatQuantity(v, 'voltage')} and ${formatQuantity(fs, 'frequency')}`,
  };
}
