import { formatQuantity } from '../../units/index.js';
import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { Limit, OperatingPoint } from '../limits.js';
import type { SolveResult } from '../role.js';
import { ambientFields, ifAvLimit, ifsmLimit, infeasible, junctionTemperatureLimit, vrrmLimit } from './common-limits.js';
import type { PolarityGuardConditions } from './polarity-guard.js';

/** Above this reverse voltage a Schottky leaks too much and costs too much: a PN rectifier leads [common practice]. */
const SCHOTTKY_UP_TO_V = 100;
/** No diode carries useful current below this drop; an ideal-diode MOSFET controller does [common practice]. */
const LOWEST_DIODE_DROP_V = 0.1;
/** Orientation VF before a part is chosen: Schottky and PN rectifier at rated current [common practice]. */
const ASSUMED_VF_SCHOTTKY_V = 0.5;
const ASSUMED_VF_RECTIFIER_V = 1.0;
/** The usual IFSM rating pulse, a 10 ms half-sine (8.3 ms at 60 Hz). */
const IFSM_PULSE_S = 10e-3;

const PRACTICE = 'common practice';

export function solvePolarityGuard(c: PolarityGuardConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const isOring = c.mode === 'oring';

  if (c.drop_max !== undefined && c.drop_max < LOWEST_DIODE_DROP_V) {
    return infeasible(
      d,
      `no feasible design because the drop budget ${q(c.drop_max, 'voltage')} is below ${q(LOWEST_DIODE_DROP_V, 'voltage')}, ` +
        'less than any diode drops at load current; use an ideal-diode (MOSFET) controller',
    );
  }
  const lowestLossW = LOWEST_DIODE_DROP_V * c.load_max;
  if (c.dissipation_max !== undefined && c.dissipation_max < lowestLossW) {
    return infeasible(
      d,
      `no feasible design because the dissipation budget ${q(c.dissipation_max, 'power')} is below ${q(lowestLossW, 'power')} = ` +
        `${q(LOWEST_DIODE_DROP_V, 'voltage')} × load_max ${q(c.load_max, 'current')}, the loss of the lowest-drop diode; use an ideal-diode (MOSFET) controller`,
    );
  }

  // Series: the reversed supply. OR-ing: this input off or shorted while the other source holds the bus
  // (its own diode drop neglected, conservative); a reversed input while the other feeds adds both.
  const vr = isOring
    ? d.step({
        quantity: 'worst reverse voltage, this input off (or reversed) while the other source feeds the bus', symbol: 'VR',
        formula: c.reverse_max === undefined ? 'VR = Vother,max − 0 V (this input off or shorted)' : 'VR = Vother,max + Vreverse,max',
        substituted: c.reverse_max === undefined ? q(c.other_source_max!, 'voltage') : `${q(c.other_source_max!, 'voltage')} + ${q(c.reverse_max, 'voltage')}`,
        value: c.other_source_max! + (c.reverse_max ?? 0), unit: 'voltage', source: 'circuit analysis; the other diode\'s drop neglected (conservative)',
      })
    : d.step({
        quantity: 'worst reverse voltage, supply connected backwards', symbol: 'VR',
        formula: c.reverse_max === undefined ? 'VR = Vsupply,max (reverse_max not given)' : 'VR = Vreverse,max', substituted: q(c.reverse_max ?? c.supply_max, 'voltage'),
        value: c.reverse_max ?? c.supply_max, unit: 'voltage', source: 'circuit analysis',
      });
  const ifAv = d.step({
    quantity: 'average forward current (continuous conduction, duty 1)', symbol: 'IF(AV)',
    formula: 'IF(AV) = IL,max·δ, δ = 1', substituted: `${q(c.load_max, 'current')} × 1`, value: c.load_max, unit: 'current', source: 'circuit analysis',
  });
  const isSchottkyFirst = vr / policy.factors.vrrm.value <= SCHOTTKY_UP_TO_V;
  const vfAssumed = isSchottkyFirst ? ASSUMED_VF_SCHOTTKY_V : ASSUMED_VF_RECTIFIER_V;
  const lossW = d.step({
    quantity: `forward loss for orientation, assumed VF ${q(vfAssumed, 'voltage')} (${isSchottkyFirst ? 'Schottky' : 'PN rectifier'}); the chosen part's VF decides`, symbol: 'PF',
    formula: 'PF ≈ VF·IF(AV)', substituted: `${q(vfAssumed, 'voltage')} × ${q(ifAv, 'current')}`, value: vfAssumed * ifAv, unit: 'power', source: `assumed VF [${PRACTICE}]`,
  });

  const limits: Limit[] = [vrrmLimit(d, vr, policy), ifAvLimit(d, ifAv, policy, 'continuous load current')];
  const cautions: Caution[] = [];
  if (c.load_peak !== undefined && c.peak_duration !== undefined) {
    limits.push(ifsmLimit(d, c.load_peak, c.peak_duration, policy, 'load peak'));
    if (c.peak_duration > IFSM_PULSE_S) {
      cautions.push({ level: 'design', text: `The ${q(c.peak_duration, 'time')} peak is longer than the 8.3/10 ms half-sine IFSM is rated with: check the part's surge-current-versus-time curve.` });
    }
  }
  limits.push(junctionTemperatureLimit(policy));
  if (c.drop_max !== undefined) {
    limits.push({
      id: 'vf', label: 'VF', check: { kind: 'computed', what: 'forward-drop', relation: 'at-most' }, bound: c.drop_max, quantity: 'voltage', stress: c.drop_max,
      reason: `VF at ${q(ifAv, 'current')} and the coldest junction (ambient ${formatQuantity(c.ambient_min, 'temperature')}, where VF is highest) ≤ drop budget ${q(c.drop_max, 'voltage')}`, isHard: true,
    });
  }
  if (c.dissipation_max !== undefined) {
    limits.push({
      id: 'dissipation', label: 'P', check: { kind: 'computed', what: 'dissipation', relation: 'at-most' }, bound: c.dissipation_max, quantity: 'power', stress: c.dissipation_max,
      reason: `forward loss VF·IF at ${q(ifAv, 'current')} (duty 1) at the solved junction temperature ≤ budget ${q(c.dissipation_max, 'power')}`, isHard: true,
    });
  }
  if (c.leakage_max !== undefined) {
    limits.push({
      id: 'ir', label: 'IR', check: { kind: 'computed', what: 'leakage-at-temperature', relation: 'at-most' }, bound: c.leakage_max, quantity: 'current', stress: c.leakage_max,
      reason: `IR at ${q(vr, 'voltage')} and the hot junction (at least ambient ${formatQuantity(c.ambient_max, 'temperature')}) ≤ ${q(c.leakage_max, 'current')}${isOring ? ', the current back-fed into the other source' : ''}`, isHard: true,
    });
  }

  if (isOring) {
    cautions.push({
      level: 'design',
      text: "A Schottky's reverse leakage roughly doubles every 12.6 °C: hot, it back-feeds the other source and adds reverse loss that can run away. Check IR at the hot junction (give leakage_max).",
    });
    cautions.push({
      level: 'note',
      text: 'Conducting and blocking exclude each other: the junction temperature is solved for the conducting state (duty 1); leakage while blocking is checked by the leakage limit.',
    });
  } else if (lossW > 1) {
    cautions.push({ level: 'note', text: `About ${q(lossW, 'power')} lost in a series diode: a P-MOSFET guard or an ideal-diode controller loses far less [${PRACTICE}].` });
  }
  cautions.push(...safetyCautions({ dcV: Math.max(c.supply_max, vr) }));

  const operatingPoint: OperatingPoint = {
    ...ambientFields(c),
    reversePeakV: vr, reverseWorkingV: vr, reverseDuty: 0,
    forwardAvgA: ifAv, forwardRmsA: ifAv, forwardPeakA: ifAv, forwardDuty: 1,
    ...(c.load_peak !== undefined ? { surgeA: c.load_peak, surgePulseS: c.peak_duration } : {}),
  };
  const suitableKinds = isSchottkyFirst ? ['schottky', 'rectifier'] : ['rectifier', 'fast-recovery'];
  return {
    ok: true,
    position: { role: 'polarity-guard', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions, figures: { vrV: vr, ifAvA: ifAv, lossEstimateW: lossW }, suitableKinds },
  };
}
