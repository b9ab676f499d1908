import { q, type Derivation } from '../derivation.js';
import { ERICKSON } from './common-cautions.js';
import type { FlybackOutputConditions } from './flyback-output-conditions.js';

export interface FlybackCurrents {
  readonly peakA: number;
  readonly rmsA: number;
  /** Fraction of the period the diode conducts (worst case). */
  readonly forwardDuty: number;
  readonly rippleA?: number;
}

export type FlybackCurrentsResult = { ok: true; value: FlybackCurrents } | { ok: false; reason: string };

const r4 = (x: number) => x.toPrecision(4);

/** Duty cycle from volt-second balance on the magnetising inductance: Vin·D = (Vout + VF)/n·(1 − D). */
function duty(d: Derivation, c: FlybackOutputConditions, n: number, vin: number, label: 'min' | 'max'): number {
  const vo = c.vout + c.diode_drop;
  return d.step({
    quantity: `duty cycle at the ${label === 'max' ? 'lowest' : 'highest'} input`, symbol: `D${label}`,
    formula: `D${label} = (Vout + VF)/(Vout + VF + n·Vin,${label === 'max' ? 'min' : 'max'})`,
    substituted: `${q(vo, 'voltage')}/(${q(vo, 'voltage')} + ${r4(n)}·${q(vin, 'voltage')})`,
    value: vo / (vo + n * vin), unit: 'ratio', source: `${ERICKSON}, flyback CCM`,
  });
}

/**
 * Continuous conduction: the secondary current is a trapezoid during (1 − D). Its average during
 * conduction is highest at Vin,min while the ripple is highest at Vin,max; the peak adds the two
 * worst cases, which is conservative. The valley falls with Vin, so continuity is checked at Vin,max.
 */
export function deriveFlybackCcm(d: Derivation, c: FlybackOutputConditions, n: number): FlybackCurrentsResult {
  const dMax = duty(d, c, n, c.vin_min, 'max');
  const avg = d.step({
    quantity: 'secondary current during conduction, at the lowest input', symbol: 'Is', formula: 'Is = Iout/(1 − Dmax)',
    substituted: `${q(c.iout, 'current')}/(1 − ${r4(dMax)})`, value: c.iout / (1 - dMax), unit: 'current', source: ERICKSON,
  });
  let ripple: number;
  const lm = c.primary_inductance;
  if (lm === undefined) {
    ripple = d.step({
      quantity: 'secondary ripple current (assumed fraction of Is)', symbol: 'ΔIs', formula: 'ΔIs = r·Is',
      substituted: `${q(c.ripple_fraction, 'ratio')}·${q(avg, 'current')}`, value: c.ripple_fraction * avg, unit: 'current', source: 'common practice: 20–40 % ripple',
    });
  } else {
    const dMin = duty(d, c, n, c.vin_max, 'min');
    ripple = d.step({
      quantity: 'secondary ripple current at the highest input (primary ripple × Np/Ns)', symbol: 'ΔIs', formula: 'ΔIs = Vin,max·Dmin/(Lm·fs·n)',
      substituted: `${q(c.vin_max, 'voltage')}·${r4(dMin)}/(${q(lm, 'inductance')}·${q(c.frequency, 'frequency')}·${r4(n)})`,
      value: (c.vin_max * dMin) / (lm * c.frequency * n), unit: 'current', source: ERICKSON,
    });
    const valley = d.step({
      quantity: 'valley of the secondary current at the highest input', symbol: 'Is,valley', formula: 'Is,valley = Iout/(1 − Dmin) − ΔIs/2',
      substituted: `${q(c.iout, 'current')}/(1 − ${r4(dMin)}) − ${q(ripple, 'current')}/2`, value: c.iout / (1 - dMin) - ripple / 2, unit: 'current', source: ERICKSON,
    });
    if (valley <= 0) {
      return { ok: false, reason: `at vin_max ${q(c.vin_max, 'voltage')} the secondary current falls to zero each cycle: the flyback runs discontinuous at full load; set mode: dcm` };
    }
  }
  const peakA = d.step({
    quantity: 'peak diode current', symbol: 'IF,pk', formula: 'IF,pk = Is + ΔIs/2',
    substituted: `${q(avg, 'current')} + ${q(ripple, 'current')}/2`, value: avg + ripple / 2, unit: 'current', source: `${ERICKSON}; worst average and worst ripple added`,
  });
  const rmsA = d.step({
    quantity: 'RMS diode current (trapezoid over 1 − D)', symbol: 'IF(RMS)', formula: 'IF(RMS) = √((1 − Dmax)·(Is² + ΔIs²/12))',
    substituted: `√((1 − ${r4(dMax)})·(${q(avg, 'current')}² + ${q(ripple, 'current')}²/12))`,
    value: Math.sqrt((1 - dMax) * (avg ** 2 + ripple ** 2 / 12)), unit: 'current', source: 'RMS of a trapezoidal pulse',
  });
  return { ok: true, value: { peakA, rmsA, forwardDuty: 1 - dMax, rippleA: ripple } };
}

/**
 * Discontinuous conduction: all the energy ½·Lm·Ipri² stored each cycle goes to the secondary, which
 * delivers (Vout + VF)·Iout; the secondary current is a triangle from Ipri/n to zero, and its area
 * gives the conduction time. Exact for a lossless transformer; leakage energy never reaches the diode.
 */
export function deriveFlybackDcm(d: Derivation, c: FlybackOutputConditions, n: number, lm: number): FlybackCurrentsResult {
  const pSec = d.step({
    quantity: 'power through the output diode', symbol: 'Psec', formula: 'Psec = (Vout + VF)·Iout',
    substituted: `(${q(c.vout, 'voltage')} + ${q(c.diode_drop, 'voltage')})·${q(c.iout, 'current')}`, value: (c.vout + c.diode_drop) * c.iout, unit: 'power',
  });
  const ipri = d.step({
    quantity: 'peak primary current', symbol: 'Ipri,pk', formula: 'Ipri,pk = √(2·Psec/(Lm·fs))',
    substituted: `√(2·${q(pSec, 'power')}/(${q(lm, 'inductance')}·${q(c.frequency, 'frequency')}))`, value: Math.sqrt((2 * pSec) / (lm * c.frequency)), unit: 'current',
    source: `${ERICKSON}; energy per cycle ½·Lm·I²·fs`,
  });
  const peakA = d.step({
    quantity: 'peak diode current', symbol: 'IF,pk', formula: 'IF,pk = Ipri,pk/n', substituted: `${q(ipri, 'current')}/${r4(n)}`, value: ipri / n, unit: 'current',
    source: 'ampere-turns are conserved at the switching instant',
  });
  const delta2 = d.step({
    quantity: 'diode conduction duty (triangle area = Iout)', symbol: 'δ2', formula: 'δ2 = 2·Iout/IF,pk',
    substituted: `2·${q(c.iout, 'current')}/${q(peakA, 'current')}`, value: (2 * c.iout) / peakA, unit: 'ratio', source: 'area of a triangular pulse',
  });
  const dOn = d.step({
    quantity: 'switch on-time duty at the lowest input', symbol: 'Dmax', formula: 'Dmax = Ipri,pk·Lm·fs/Vin,min',
    substituted: `${q(ipri, 'current')}·${q(lm, 'inductance')}·${q(c.frequency, 'frequency')}/${q(c.vin_min, 'voltage')}`,
    value: (ipri * lm * c.frequency) / c.vin_min, unit: 'ratio', source: 'V = L·di/dt on the primary',
  });
  if (dOn + delta2 >= 1) {
    return { ok: false, reason: `at vin_min ${q(c.vin_min, 'voltage')} the on time (${q(dOn, 'ratio')}) and the diode's conduction (${q(delta2, 'ratio')}) fill the whole period: the flyback is not discontinuous at full load; set mode: ccm or lower primary_inductance` };
  }
  const rmsA = d.step({
    quantity: 'RMS diode current (triangle)', symbol: 'IF(RMS)', formula: 'IF(RMS) = IF,pk·√(δ2/3)',
    substituted: `${q(peakA, 'current')}·√(${r4(delta2)}/3)`, value: peakA * Math.sqrt(delta2 / 3), unit: 'current', source: 'RMS of a triangular pulse',
  });
  return { ok: true, value: { peakA, rmsA, forwardDuty: delta2 } };
}
