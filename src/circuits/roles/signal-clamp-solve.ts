import { formatQuantity } from '../../units/index.js';
import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { Limit, OperatingPoint } from '../limits.js';
import type { SolveResult } from '../role.js';
import { ambientFields, ifAvLimit, infeasible, junctionTemperatureLimit, vrrmLimit } from './common-limits.js';
import type { SignalClampConditions } from './signal-clamp.js';

/** Discrete diodes and ESD arrays stop near 0.1 pF; below that no part exists [common practice]. */
const LOWEST_CJ_F = 0.1e-12;
/** Fastest PN small-signal diodes recover in about 4 ns (1N4148 class): below, only a Schottky [common practice]. */
const FASTEST_PN_TRR_S = 4e-9;
/** trr at most a twentieth of the period keeps recovery a small part of each cycle [common practice]. */
const TRR_PERIOD_FRACTION = 20;

/** Above this reverse voltage no small-signal part is made: look among fast rectifiers instead. */
const HIGH_VOLTAGE_SIGNAL_V = 150;

export function solveSignalClamp(c: SignalClampConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const cautions: Caution[] = [];
  const vr = d.step({
    quantity: 'worst reverse voltage', symbol: 'VR', formula: 'VR = reverse_max',
    substituted: q(c.reverse_max, 'voltage'), value: c.reverse_max, unit: 'voltage', source: 'design input',
  });
  const ifPeak = d.step({
    quantity: 'peak forward current', symbol: 'IF,pk', formula: 'IF,pk = forward_peak',
    substituted: q(c.forward_peak, 'current'), value: c.forward_peak, unit: 'current', source: 'design input',
  });
  const ifAv = c.forward_avg === undefined
    ? d.step({
        quantity: 'average forward current: no average given, the peak taken as continuous (conservative)', symbol: 'IF(AV)',
        formula: 'IF(AV) = IF,pk', substituted: q(ifPeak, 'current'), value: ifPeak, unit: 'current', source: 'worst case',
      })
    : d.step({
        quantity: 'average forward current', symbol: 'IF(AV)', formula: 'IF(AV) = forward_avg',
        substituted: q(c.forward_avg, 'current'), value: c.forward_avg, unit: 'current', source: 'design input',
      });
  const duty = ifAv / ifPeak;

  const cjBound = capacitanceBound(d, c);
  if (cjBound !== undefined && cjBound < LOWEST_CJ_F) {
    return infeasible(
      d,
      `no feasible design because Cj must stay below ${q(cjBound, 'capacitance')}, less than the ${q(LOWEST_CJ_F, 'capacitance')} ` +
        'of the lowest-capacitance discrete diodes; lower the source impedance or the bandwidth',
    );
  }
  const trrBound = recoveryBound(d, c);

  const limits: Limit[] = [vrrmLimit(d, vr, policy), ifAvLimit(d, ifAv, policy)];
  if (trrBound !== undefined) {
    const fromFrequency = c.signal_frequency === undefined ? '' : `, a twentieth of the ${q(c.signal_frequency, 'frequency')} period or less [common practice]`;
    limits.push({
      id: 'trr', label: 'trr', check: { kind: 'rating', rating: 'trrS', relation: 'at-most' }, bound: trrBound, quantity: 'time', stress: trrBound,
      reason: `reverse recovery ≤ ${q(trrBound, 'time')}${fromFrequency}; a Schottky has none to speak of`, isHard: true,
    });
    if (trrBound < FASTEST_PN_TRR_S) {
      cautions.push({ level: 'design', text: `trr ≤ ${q(trrBound, 'time')} is below the ~4 ns of the fastest PN signal diodes: only a Schottky will do [common practice].` });
    }
  }
  if (cjBound !== undefined) {
    limits.push({
      id: 'cj', label: 'Cj', check: { kind: 'rating', rating: 'cjF', relation: 'at-most' }, bound: cjBound, quantity: 'capacitance', stress: cjBound,
      reason: `junction capacitance ≤ ${q(cjBound, 'capacitance')}; datasheets give Cj at a stated VR, usually 0 V (the highest)`, isHard: true,
    });
  }
  if (c.leakage_max !== undefined) {
    limits.push({
      id: 'ir', label: 'IR', check: { kind: 'computed', what: 'leakage-at-temperature', relation: 'at-most' }, bound: c.leakage_max, quantity: 'current', stress: c.leakage_max,
      reason: `IR at ${q(vr, 'voltage')} and the hot junction (at least ambient ${formatQuantity(c.ambient_max, 'temperature')}) ≤ ${q(c.leakage_max, 'current')}`, isHard: true,
    });
  }
  limits.push(junctionTemperatureLimit(policy));
  cautions.push(...safetyCautions({ dcV: vr }));

  const operatingPoint: OperatingPoint = {
    ...ambientFields(c), reversePeakV: vr, reverseWorkingV: vr, reverseDuty: 1 - duty,
    forwardAvgA: ifAv, forwardPeakA: ifPeak, forwardRmsA: ifPeak * Math.sqrt(duty), forwardDuty: duty,
    ...(c.signal_frequency === undefined ? {} : { switchingFrequencyHz: c.signal_frequency, switchingVoltageV: vr }),
  };
  const figures: Record<string, number> = {
    vrV: vr, ifAvA: ifAv, ifPeakA: ifPeak,
    ...(cjBound === undefined ? {} : { cjMaxF: cjBound }),
    ...(trrBound === undefined ? {} : { trrMaxS: trrBound }),
  };
  // Small-signal and Schottky parts stop near 100–200 V; above that, clamp and snubber diodes
  // (an RCD clamp on a flyback primary, say) are fast rectifiers.
  const lowVoltage = trrBound !== undefined && trrBound < FASTEST_PN_TRR_S ? ['schottky', 'signal'] : ['signal', 'schottky'];
  const suitableKinds = vr > HIGH_VOLTAGE_SIGNAL_V ? ['fast-recovery', 'ultrafast', 'rectifier'] : lowVoltage;
  return {
    ok: true,
    position: { role: 'signal-clamp', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions, figures, suitableKinds },
  };
}

/** The user's cj_max, the bandwidth bound, or the lower of both. */
function capacitanceBound(d: Derivation, c: SignalClampConditions): number | undefined {
  const derived = c.source_impedance !== undefined && c.bandwidth !== undefined
    ? d.step({
        quantity: 'largest Cj that keeps the source\'s RC corner at the bandwidth', symbol: 'Cj,max,bw', formula: 'Cj ≤ 1/(2π·R·f3dB)',
        substituted: `1/(2π × ${q(c.source_impedance, 'resistance')} × ${q(c.bandwidth, 'frequency')})`,
        value: 1 / (2 * Math.PI * c.source_impedance * c.bandwidth), unit: 'capacitance', source: 'single-pole RC low-pass [published physics]',
      })
    : undefined;
  return lowerOf(d, c.cj_max, derived, 'Cj,max', 'capacitance');
}

/** The user's trr_max, a twentieth of the signal period, or the lower of both. */
function recoveryBound(d: Derivation, c: SignalClampConditions): number | undefined {
  const derived = c.signal_frequency === undefined
    ? undefined
    : d.step({
        quantity: `largest trr, a 1/${TRR_PERIOD_FRACTION} of the signal period`, symbol: 'trr,max,f', formula: `trr ≤ 1/(${TRR_PERIOD_FRACTION}·f)`,
        substituted: `1/(${TRR_PERIOD_FRACTION} × ${q(c.signal_frequency, 'frequency')})`, value: 1 / (TRR_PERIOD_FRACTION * c.signal_frequency), unit: 'time', source: 'common practice',
      });
  return lowerOf(d, c.trr_max, derived, 'trr,max', 'time');
}

function lowerOf(d: Derivation, given: number | undefined, derived: number | undefined, symbol: string, unit: 'capacitance' | 'time'): number | undefined {
  if (given === undefined) return derived;
  if (derived === undefined) {
    return d.step({ quantity: `${symbol} given`, symbol, formula: `${symbol} = design input`, substituted: q(given, unit), value: given, unit, source: 'design input' });
  }
  return d.step({
    quantity: `${symbol}: the lower of the given and the derived bound`, symbol, formula: 'min(given, derived)',
    substituted: `min(${q(given, unit)}, ${q(derived, unit)})`, value: Math.min(given, derived), unit, source: 'stricter bound',
  });
}
