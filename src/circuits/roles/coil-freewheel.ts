import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { OperatingPoint } from '../limits.js';
import type { RoleDefinition, SolveResult } from '../role.js';
import { schottkyLeakageNote, switchingLossNote } from './common-cautions.js';
import { ambientFields, rectifyingLimits, switchingKinds } from './common-limits.js';
import { COIL_FREEWHEEL_INPUTS, coilFreewheelSchema, type CoilFreewheelConditions } from './coil-freewheel-conditions.js';

const RL = 'published physics: RL circuit decaying into a constant clamp voltage (diode-formulas §3)';
/** Below this a small-signal diode is the natural choice for a relay coil. */
const SIGNAL_DIODE_MAX_A = 0.2;

const clamp = (x: number, low: number, high: number) => Math.min(high, Math.max(low, x));
const decayTime = (tauS: number, i0: number, r: number, vcl: number) => tauS * Math.log((i0 * r + vcl) / vcl);

function solveCoil(c: CoilFreewheelConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const r = c.coil_resistance;
  const i0 = c.coil_current === undefined
    ? d.step({ quantity: 'coil current when on', symbol: 'I0', formula: 'I0 = Vsupply,max/Rcoil', substituted: `${q(c.supply_max, 'voltage')}/${q(r, 'resistance')}`, value: c.supply_max / r, unit: 'current', source: "Ohm's law" })
    : d.step({ quantity: 'coil current when on (given)', symbol: 'I0', formula: 'I0 = coil_current', substituted: q(c.coil_current, 'current'), value: c.coil_current, unit: 'current' });
  const tau = d.step({
    quantity: 'coil time constant', symbol: 'τ', formula: 'τ = L/R', substituted: `${q(c.coil_inductance, 'inductance')}/${q(r, 'resistance')}`,
    value: c.coil_inductance / r, unit: 'time', source: RL,
  });
  const energy = d.step({
    quantity: 'energy stored in the coil', symbol: 'E', formula: 'E = ½·L·I0²', substituted: `½·${q(c.coil_inductance, 'inductance')}·${q(i0, 'current')}²`,
    value: 0.5 * c.coil_inductance * i0 ** 2, unit: 'energy', source: RL,
  });
  const vcl = d.step({
    quantity: 'clamp voltage during the decay', symbol: 'Vcl', formula: 'Vcl = VF + VZ', substituted: `${q(c.diode_drop, 'voltage')} + ${q(c.zener_clamp, 'voltage')}`,
    value: c.diode_drop + c.zener_clamp, unit: 'voltage', source: 'VF assumed constant',
  });
  const decay = d.step({
    quantity: 'time for the coil current to reach zero', symbol: 'tdecay', formula: 'tdecay = τ·ln((I0·R + Vcl)/Vcl)',
    substituted: `${q(tau, 'time')}·ln((${q(i0, 'current')}·${q(r, 'resistance')} + ${q(vcl, 'voltage')})/${q(vcl, 'voltage')})`,
    value: decayTime(tau, i0, r, vcl), unit: 'time', source: RL,
  });
  const vsw = d.step({
    quantity: 'switch voltage during the release', symbol: 'Vsw', formula: 'Vsw = Vsupply,max + VF + VZ', substituted: `${q(c.supply_max, 'voltage')} + ${q(vcl, 'voltage')}`,
    value: c.supply_max + vcl, unit: 'voltage', source: 'Kirchhoff: supply plus the clamp across the coil',
  });
  const vr = d.step({
    quantity: 'reverse voltage while the coil is on', symbol: 'VR', formula: 'VR = Vsupply,max', substituted: q(c.supply_max, 'voltage'),
    value: c.supply_max, unit: 'voltage', source: 'the diode sits across the energised coil',
  });
  const isPwm = c.pwm_frequency !== undefined;
  let drive: Partial<OperatingPoint>;
  if (c.pwm_frequency === undefined) {
    // One release per switch-off: a single decaying pulse, compared with IFSM rather than IF(AV).
    const pulse = d.step({
      quantity: 'release pulse width', symbol: 'tsurge', formula: 'tsurge = min(τ, tdecay)', substituted: `min(${q(tau, 'time')}, ${q(decay, 'time')})`,
      value: Math.min(tau, decay), unit: 'time', source: 'an exponential decay carries most of its I²t within one time constant',
    });
    drive = { forwardPeakA: i0, surgeA: i0, surgePulseS: pulse, reverseDuty: 1 };
  } else {
    const dMin = c.duty_min ?? 0;
    const dMax = c.duty_max ?? 1;
    drive = { ...pwmCurrents(d, c, i0, dMin, dMax), forwardPeakA: i0, forwardRepetitivePeakA: i0, forwardDuty: 1 - dMin, reverseDuty: dMax, switchingFrequencyHz: c.pwm_frequency, switchingVoltageV: vr };
  }
  const operatingPoint: OperatingPoint = { ...ambientFields(c), reversePeakV: vr, reverseWorkingV: vr, ...drive };
  const limits = rectifyingLimits(d, operatingPoint, policy, { reverse: 'supply voltage', surge: 'coil current at release' });
  const vrrmBound = limits[0]?.bound ?? vr;
  const suitableKinds = isPwm ? switchingKinds(vrrmBound) : i0 <= SIGNAL_DIODE_MAX_A ? ['signal', 'rectifier'] : ['rectifier', 'fast-recovery'];
  return {
    ok: true,
    position: {
      role: 'coil-freewheel', policyId: policy.id, operatingPoint, limits, steps: d.steps,
      cautions: coilCautions(c, { i0, tau, decay, vsw, vcl, ifAv: operatingPoint.forwardAvgA, suitableKinds }),
      figures: { coil_current_a: i0, time_constant_s: tau, energy_j: energy, decay_time_s: decay, switch_voltage_v: vsw },
      suitableKinds,
    },
  };
}

/**
 * PWM: a coil whose current follows the duty (Icoil = D·I0, τ long against the PWM period) hands the
 * diode D·(1 − D)·I0, largest at D = ½; a coil held at I0 by its drive (a motor at current limit)
 * hands it I0·(1 − D), largest at the lowest duty.
 */
function pwmCurrents(d: Derivation, c: CoilFreewheelConditions, i0: number, dMin: number, dMax: number): Partial<OperatingPoint> {
  if (c.coil_current !== undefined) {
    const ifAv = d.step({ quantity: 'average diode current at the lowest duty', symbol: 'IF(AV)', formula: 'IF(AV) = I0·(1 − Dmin)', substituted: `${q(i0, 'current')}·(1 − ${q(dMin, 'ratio')})`, value: i0 * (1 - dMin), unit: 'current', source: 'charge balance over one PWM period' });
    const rms = d.step({ quantity: 'RMS diode current', symbol: 'IF(RMS)', formula: 'IF(RMS) = I0·√(1 − Dmin)', substituted: `${q(i0, 'current')}·√(1 − ${q(dMin, 'ratio')})`, value: i0 * Math.sqrt(1 - dMin), unit: 'current', source: 'RMS of a rectangular pulse' });
    return { forwardAvgA: ifAv, forwardRmsA: rms };
  }
  const dAv = clamp(0.5, dMin, dMax);
  const ifAv = d.step({
    quantity: 'average diode current, worst duty in range (D = ½ if allowed)', symbol: 'IF(AV)', formula: 'IF(AV) = D·(1 − D)·I0',
    substituted: `${q(dAv, 'ratio')}·(1 − ${q(dAv, 'ratio')})·${q(i0, 'current')}`, value: dAv * (1 - dAv) * i0, unit: 'current', source: 'coil current D·I0 flowing through the diode for 1 − D',
  });
  // RMS D·√(1 − D)·I0 peaks at D = 2/3.
  const dRms = clamp(2 / 3, dMin, dMax);
  const rms = d.step({
    quantity: 'RMS diode current, worst duty in range (D = ⅔ if allowed)', symbol: 'IF(RMS)', formula: 'IF(RMS) = D·√(1 − D)·I0',
    substituted: `${q(dRms, 'ratio')}·√(1 − ${q(dRms, 'ratio')})·${q(i0, 'current')}`, value: dRms * Math.sqrt(1 - dRms) * i0, unit: 'current', source: 'RMS of a rectangular pulse',
  });
  return { forwardAvgA: ifAv, forwardRmsA: rms };
}

interface CoilFigures {
  readonly i0: number;
  readonly tau: number;
  readonly decay: number;
  readonly vsw: number;
  readonly vcl: number;
  readonly ifAv: number | undefined;
  readonly suitableKinds: readonly string[];
}

function coilCautions(c: CoilFreewheelConditions, f: CoilFigures): Caution[] {
  const cautions: Caution[] = [...safetyCautions({ dcV: f.vsw })];
  if (c.pwm_frequency !== undefined) {
    cautions.push(switchingLossNote(c.supply_max, c.pwm_frequency), ...schottkyLeakageNote(f.suitableKinds, c.ambient_max));
    if (c.zener_clamp > 0 && f.ifAv !== undefined) {
      cautions.push({ level: 'design', text: `A series Zener in a PWM freewheel path dissipates about VZ·IF(AV) = ${q(c.zener_clamp * f.ifAv, 'power')} and makes the current ripple worse; a plain diode is usual here.` });
    }
  } else if (c.zener_clamp === 0) {
    const withZener = decayTime(f.tau, f.i0, c.coil_resistance, c.diode_drop + c.supply_max);
    cautions.push({
      level: 'design',
      text:
        `A plain diode keeps the coil current flowing for about ${q(f.decay, 'time')} after switch-off, which slows a relay's release. ` +
        `A Zener of ${q(c.supply_max, 'voltage')} in series would end it in ${q(withZener, 'time')}, at a switch voltage of ${q(2 * c.supply_max + c.diode_drop, 'voltage')} (common practice).`,
    });
  }
  if (c.zener_clamp > 0) {
    cautions.push({ level: 'design', text: `During the release the switch must block Vsupply + VF + VZ = ${q(f.vsw, 'voltage')}; the Zener takes most of the coil's energy.` });
  } else {
    cautions.push({ level: 'note', text: `The decay takes VF as a constant ${q(c.diode_drop, 'voltage')}; at small currents VF falls, so the tail lasts a little longer.` });
  }
  return cautions;
}

export const coilFreewheelRole: RoleDefinition<ReturnType<typeof coilFreewheelSchema>> = {
  id: 'coil-freewheel',
  title: 'Freewheel diode across a coil',
  summary: 'The diode across a relay, solenoid, valve or motor coil: reverse voltage, the release current pulse or the PWM freewheel current, decay time and the switch voltage with an optional series Zener.',
  inputs: COIL_FREEWHEEL_INPUTS,
  get schema() {
    return coilFreewheelSchema();
  },
  solve: solveCoil,
};
