import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { OperatingPoint } from '../limits.js';
import type { RoleDefinition, SolveResult } from '../role.js';
import { ERICKSON, allowanceNote, schottkyLeakageNote, switchingLossNote } from './common-cautions.js';
import { ambientFields, infeasible, rectifyingLimits, switchingKinds, withAllowance } from './common-limits.js';
import { FLYBACK_OUTPUT_INPUTS, flybackOutputSchema, type FlybackOutputConditions } from './flyback-output-conditions.js';
import { deriveFlybackCcm, deriveFlybackDcm } from './flyback-output-currents.js';

function turnsRatio(d: Derivation, c: FlybackOutputConditions): number {
  const given = c.turns_ratio_ns_np;
  // The schema guarantees either the ratio or both turn counts.
  const [ns, np] = [c.ns ?? 0, c.np ?? 1];
  return d.step({
    quantity: 'turns ratio', symbol: 'n', formula: 'n = Ns/Np',
    substituted: given === undefined ? `${ns}/${np}` : `${given} (given)`, value: given ?? ns / np, unit: 'dimensionless',
  });
}

function solveFlyback(c: FlybackOutputConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const n = turnsRatio(d, c);
  const voutMax = c.vout_max ?? c.vout;
  const vr = d.step({
    quantity: 'reverse voltage while the primary switch conducts', symbol: 'VR', formula: `VR = Vout${c.vout_max === undefined ? '' : ',max'} + n·Vin,max`,
    substituted: `${q(voutMax, 'voltage')} + ${n.toPrecision(4)}·${q(c.vin_max, 'voltage')}`, value: voutMax + n * c.vin_max, unit: 'voltage',
    source: `${ERICKSON}; before the leakage-inductance spike`,
  });
  const vrPeak = withAllowance(d, vr, c.spike_allowance, 'common practice: VRRM ≥ 1.2–1.5 × VR');
  const ifAv = d.step({
    quantity: 'average diode current (the diode carries all the output charge)', symbol: 'IF(AV)', formula: 'IF(AV) = Iout',
    substituted: q(c.iout, 'current'), value: c.iout, unit: 'current', source: ERICKSON,
  });
  const lm = c.primary_inductance;
  const currents = c.mode === 'dcm' && lm !== undefined ? deriveFlybackDcm(d, c, n, lm) : deriveFlybackCcm(d, c, n);
  if (!currents.ok) return infeasible(d, currents.reason);
  const x = currents.value;
  const operatingPoint: OperatingPoint = {
    ...ambientFields(c),
    reversePeakV: vrPeak,
    reverseWorkingV: vr,
    // Conservative: the diode is taken to block VR for the whole time it does not conduct.
    reverseDuty: 1 - x.forwardDuty,
    forwardAvgA: ifAv,
    forwardRmsA: x.rmsA,
    forwardPeakA: x.peakA,
    forwardRepetitivePeakA: x.peakA,
    forwardDuty: x.forwardDuty,
    switchingFrequencyHz: c.frequency,
    switchingVoltageV: vr,
  };
  const limits = rectifyingLimits(d, operatingPoint, policy);
  const suitableKinds = switchingKinds(limits[0]?.bound ?? vrPeak);
  const cautions: Caution[] = [
    ...safetyCautions({ dcV: Math.max(c.vin_max, vr) }),
    allowanceNote(c.spike_allowance, 'leakage-spike'),
    c.mode === 'ccm'
      ? { level: 'design', text: 'In continuous conduction the diode is turned off hard at the start of each on time: its recovery charge adds to the switch current and to ringing. A Schottky, or an ultrafast part, keeps this small.' }
      : { level: 'note', text: 'In discontinuous conduction the diode turns off at zero current, so recovery matters little; its capacitance still rings with the leakage inductance.' },
    switchingLossNote(vr, c.frequency),
    ...schottkyLeakageNote(suitableKinds, c.ambient_max),
  ];
  if (c.mode === 'ccm' && lm === undefined) {
    cautions.push({ level: 'note', text: `No primary_inductance given: the ripple is taken as ${q(c.ripple_fraction, 'ratio')} of the secondary current; give it for the real peak.` });
  }
  return {
    ok: true,
    position: {
      role: 'flyback-output', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions,
      figures: { turns_ratio: n, reverse_voltage_v: vr, peak_current_a: x.peakA, forward_duty: x.forwardDuty },
      suitableKinds,
    },
  };
}

export const flybackOutputRole: RoleDefinition<ReturnType<typeof flybackOutputSchema>> = {
  id: 'flyback-output',
  title: 'Flyback converter output rectifier',
  summary: 'The secondary rectifier of a flyback converter (ccm or dcm): reverse voltage from the reflected input plus the spike, peak and RMS secondary current.',
  inputs: FLYBACK_OUTPUT_INPUTS,
  get schema() {
    return flybackOutputSchema();
  },
  solve: solveFlyback,
};
