import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { OperatingPoint } from '../limits.js';
import type { RoleDefinition, SolveResult } from '../role.js';
import { AMBIENT_INPUTS, ambientFields, ambientShape, checkMinMax, infeasible, rectifyingLimits, requiredQuantity, switchingKinds, withAllowance } from './common-limits.js';
import { ERICKSON, allowanceNote, schottkyLeakageNote, switchingLossNote } from './common-cautions.js';
import { lazySchema } from './lazy-schema.js';

export const buckFreewheelSchema = lazySchema(() =>
  z
    .object({
      vin_min: requiredQuantity('voltage', { positive: true }),
      vin_max: requiredQuantity('voltage', { positive: true }),
      vout: requiredQuantity('voltage', { positive: true }),
      iout: requiredQuantity('current', { positive: true }),
      frequency: requiredQuantity('frequency', { positive: true }),
      inductance: quantitySchema('inductance', { positive: true }).optional(),
      ripple_fraction: quantitySchema('ratio', { min: 0.01, max: 1.5 }).default(0.3),
      ringing_allowance: quantitySchema('ratio', { min: 0, max: 2 }).default(0.2),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'vin_min', 'vin_max', 'voltage');
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      if (c.vout >= c.vin_max) {
        ctx.addIssue({ code: 'custom', path: ['vout'], message: `vout ${q(c.vout, 'voltage')} is not below vin_max ${q(c.vin_max, 'voltage')}: a buck converter only steps down` });
      }
    }),
);

export type BuckFreewheelConditions = z.output<ReturnType<typeof buckFreewheelSchema>>;

function solveBuck(c: BuckFreewheelConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const dMax = d.step({
    quantity: 'duty cycle at the lowest input', symbol: 'Dmax', formula: 'Dmax = Vout/Vin,min',
    substituted: `${q(c.vout, 'voltage')}/${q(c.vin_min, 'voltage')}`, value: c.vout / c.vin_min, unit: 'ratio', source: ERICKSON,
  });
  if (dMax >= 1) {
    return infeasible(d, `at vin_min ${q(c.vin_min, 'voltage')} a buck cannot make vout ${q(c.vout, 'voltage')}: it would need a duty cycle of ${q(dMax, 'ratio')}; raise vin_min or use a buck-boost`);
  }
  // Ideal D (no diode drop): including VF raises D and lowers the diode's share, so ideal is the safe side.
  const dMin = d.step({
    quantity: 'duty cycle at the highest input (worst for the diode)', symbol: 'Dmin', formula: 'Dmin = Vout/Vin,max',
    substituted: `${q(c.vout, 'voltage')}/${q(c.vin_max, 'voltage')}`, value: c.vout / c.vin_max, unit: 'ratio',
    source: `${ERICKSON}, buck CCM; ideal switches, which overstates the diode's share slightly`,
  });
  const ifAv = d.step({
    quantity: 'average diode current', symbol: 'IF(AV)', formula: 'IF(AV) = Iout·(1 − Dmin)',
    substituted: `${q(c.iout, 'current')}·(1 − ${dMin.toPrecision(4)})`, value: c.iout * (1 - dMin), unit: 'current', source: ERICKSON,
  });
  const ripple = c.inductance === undefined
    ? d.step({
        quantity: 'inductor ripple current (assumed fraction of Iout)', symbol: 'ΔIL', formula: 'ΔIL = r·Iout',
        substituted: `${q(c.ripple_fraction, 'ratio')}·${q(c.iout, 'current')}`, value: c.ripple_fraction * c.iout, unit: 'current', source: 'common practice: 20–40 % ripple',
      })
    : d.step({
        quantity: 'inductor ripple current at the highest input', symbol: 'ΔIL', formula: 'ΔIL = (Vin,max − Vout)·Dmin/(L·fs)',
        substituted: `(${q(c.vin_max, 'voltage')} − ${q(c.vout, 'voltage')})·${dMin.toPrecision(4)}/(${q(c.inductance, 'inductance')}·${q(c.frequency, 'frequency')})`,
        value: ((c.vin_max - c.vout) * dMin) / (c.inductance * c.frequency), unit: 'current', source: ERICKSON,
      });
  if (ripple / 2 >= c.iout) {
    return infeasible(d, `the inductor ripple ${q(ripple, 'current')} is at least twice iout ${q(c.iout, 'current')}: the converter runs discontinuous at full load, which this role does not model; use a larger inductance`);
  }
  const peak = d.step({
    quantity: 'peak diode current', symbol: 'IF,pk', formula: 'IF,pk = Iout + ΔIL/2',
    substituted: `${q(c.iout, 'current')} + ${q(ripple, 'current')}/2`, value: c.iout + ripple / 2, unit: 'current', source: ERICKSON,
  });
  const rms = d.step({
    quantity: 'RMS diode current (trapezoid over the off time)', symbol: 'IF(RMS)', formula: 'IF(RMS) = √((1 − Dmin)·(Iout² + ΔIL²/12))',
    substituted: `√((1 − ${dMin.toPrecision(4)})·(${q(c.iout, 'current')}² + ${q(ripple, 'current')}²/12))`,
    value: Math.sqrt((1 - dMin) * (c.iout ** 2 + ripple ** 2 / 12)), unit: 'current', source: 'RMS of a trapezoidal pulse',
  });
  const vr = d.step({
    quantity: 'reverse voltage while the switch conducts', symbol: 'VR', formula: 'VR = Vin,max', substituted: q(c.vin_max, 'voltage'),
    value: c.vin_max, unit: 'voltage', source: ERICKSON,
  });
  const vrPeak = withAllowance(d, vr, c.ringing_allowance, 'common practice: VRRM ≥ 1.2–1.5 × VR');
  const operatingPoint: OperatingPoint = {
    ...ambientFields(c),
    reversePeakV: vrPeak,
    reverseWorkingV: vr,
    reverseDuty: dMin,
    forwardAvgA: ifAv,
    forwardRmsA: rms,
    forwardPeakA: peak,
    forwardRepetitivePeakA: peak,
    forwardDuty: 1 - dMin,
    switchingFrequencyHz: c.frequency,
    switchingVoltageV: vr,
  };
  const limits = rectifyingLimits(d, operatingPoint, policy);
  const suitableKinds = switchingKinds(limits[0]?.bound ?? vrPeak);
  const cautions: Caution[] = [
    ...safetyCautions({ dcV: c.vin_max }),
    allowanceNote(c.ringing_allowance, 'ringing'),
    switchingLossNote(vr, c.frequency),
    ...schottkyLeakageNote(suitableKinds, c.ambient_max),
  ];
  if (c.inductance === undefined) {
    cautions.push({ level: 'note', text: `No inductance given: the ripple is taken as ${q(c.ripple_fraction, 'ratio')} of Iout; give inductance for the real peak current.` });
  }
  return {
    ok: true,
    position: {
      role: 'buck-freewheel', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions,
      figures: { duty_min: dMin, duty_max: dMax, ripple_current_a: ripple, peak_current_a: peak },
      suitableKinds,
    },
  };
}

export const buckFreewheelRole: RoleDefinition<ReturnType<typeof buckFreewheelSchema>> = {
  id: 'buck-freewheel',
  title: 'Buck converter freewheel (catch) diode',
  summary: 'The diode of a non-synchronous buck converter in continuous conduction: reverse voltage at the highest input, average, peak and RMS current, switching loss terms.',
  inputs: [
    { name: 'vin_min', label: 'Lowest input voltage', quantity: 'voltage', help: 'lowest input at which the converter must regulate' },
    { name: 'vin_max', label: 'Highest input voltage', quantity: 'voltage', help: 'highest continuous input; the diode blocks it' },
    { name: 'vout', label: 'Output voltage', quantity: 'voltage', help: 'regulated output, below vin_min' },
    { name: 'iout', label: 'Output current', quantity: 'current', help: 'highest load current' },
    { name: 'frequency', label: 'Switching frequency', quantity: 'frequency', help: 'converter switching frequency' },
    { name: 'inductance', label: 'Inductance', quantity: 'inductance', help: 'output inductor; without it ripple_fraction is used' },
    { name: 'ripple_fraction', label: 'Ripple fraction', quantity: 'ratio', default: '30 %', help: 'inductor ripple as a fraction of iout, used when no inductance is given' },
    { name: 'ringing_allowance', label: 'Ringing allowance', quantity: 'ratio', default: '20 %', help: 'added to vin_max for switch-node ringing and overshoot' },
    ...AMBIENT_INPUTS,
  ],
  get schema() {
    return buckFreewheelSchema();
  },
  solve: solveBuck,
};
