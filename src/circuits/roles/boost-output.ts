import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { OperatingPoint } from '../limits.js';
import type { RoleDefinition, SolveResult } from '../role.js';
import { ERICKSON, allowanceNote, schottkyLeakageNote, switchingLossNote } from './common-cautions.js';
import { ambientFields, infeasible, rectifyingLimits, switchingKinds, withAllowance } from './common-limits.js';
import { BOOST_OUTPUT_INPUTS, boostOutputSchema, type BoostOutputConditions } from './boost-output-conditions.js';
import { deriveBoostCurrents, deriveStartupSurge } from './boost-output-currents.js';

function solveBoost(c: BoostOutputConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const currents = deriveBoostCurrents(d, c);
  if (!currents.ok) return infeasible(d, currents.reason);
  const x = currents.value;
  const ifAv = d.step({
    quantity: 'average diode current (the diode carries all the output charge)', symbol: 'IF(AV)', formula: 'IF(AV) = Iout',
    substituted: q(c.iout, 'current'), value: c.iout, unit: 'current', source: ERICKSON,
  });
  const voutMax = c.vout_max ?? c.vout;
  const vr = d.step({
    quantity: 'reverse voltage while the switch conducts', symbol: 'VR', formula: c.vout_max === undefined ? 'VR = Vout' : 'VR = Vout,max',
    substituted: q(voutMax, 'voltage'), value: voutMax, unit: 'voltage', source: ERICKSON,
  });
  const vrPeak = withAllowance(d, vr, c.ringing_allowance, 'common practice: VRRM ≥ 1.2–1.5 × VR');
  const surge = deriveStartupSurge(d, c);
  const operatingPoint: OperatingPoint = {
    ...ambientFields(c),
    reversePeakV: vrPeak,
    reverseWorkingV: vr,
    reverseDuty: x.dMax,
    forwardAvgA: ifAv,
    forwardRmsA: x.rmsA,
    forwardPeakA: x.peakA,
    forwardRepetitivePeakA: x.peakA,
    ...(surge === undefined ? {} : { surgeA: surge.peakA, surgePulseS: surge.pulseS }),
    forwardDuty: 1 - x.dMax,
    switchingFrequencyHz: c.frequency,
    switchingVoltageV: vr,
  };
  const limits = rectifyingLimits(d, operatingPoint, policy, { surge: 'start-up inrush into the output capacitor' });
  const suitableKinds = switchingKinds(limits[0]?.bound ?? vrPeak);
  const cautions: Caution[] = [
    ...safetyCautions({ dcV: voutMax }),
    allowanceNote(c.ringing_allowance, 'ringing'),
    switchingLossNote(vr, c.frequency),
    {
      level: 'design',
      text: 'In continuous conduction the switch turns the diode off hard: its recovery charge also flows through the switch. A Schottky (or a SiC Schottky at high voltage) has almost none.',
    },
    ...schottkyLeakageNote(suitableKinds, c.ambient_max),
  ];
  if (surge === undefined) {
    cautions.push({ level: 'note', text: 'The start-up inrush into the output capacitor is not evaluated: give output_capacitance and inductance or source_resistance.' });
  } else {
    cautions.push({
      level: 'design',
      text: `At power-up the output capacitor charges through the inductor and the diode, about ${q(surge.peakA, 'current')} for ${q(surge.pulseS, 'time')}, before the converter starts; IFSM is rated for one 8.3 ms or 10 ms half-sine.`,
    });
  }
  if (c.inductance === undefined) {
    cautions.push({ level: 'note', text: `No inductance given: the ripple is taken as ${q(c.ripple_fraction, 'ratio')} of the inductor current; give inductance for the real peak current.` });
  }
  return {
    ok: true,
    position: {
      role: 'boost-output', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions,
      figures: {
        duty_max: x.dMax, inductor_current_a: x.inductorA, ripple_current_a: x.rippleA, peak_current_a: x.peakA,
        ...(surge === undefined ? {} : { inrush_a: surge.peakA, inrush_pulse_s: surge.pulseS }),
      },
      suitableKinds,
    },
  };
}

export const boostOutputRole: RoleDefinition<ReturnType<typeof boostOutputSchema>> = {
  id: 'boost-output',
  title: 'Boost converter output diode',
  summary: 'The output diode of a non-synchronous boost converter in continuous conduction: reverse voltage at the highest output, peak current at the lowest input, start-up inrush into the output capacitor.',
  inputs: BOOST_OUTPUT_INPUTS,
  get schema() {
    return boostOutputSchema();
  },
  solve: solveBoost,
};
