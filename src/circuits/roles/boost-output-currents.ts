import { q, type Derivation } from '../derivation.js';
import { ERICKSON } from './common-cautions.js';
import type { BoostOutputConditions } from './boost-output-conditions.js';

export interface BoostCurrents {
  readonly dMax: number;
  readonly inductorA: number;
  readonly rippleA: number;
  readonly peakA: number;
  readonly rmsA: number;
}

export type BoostCurrentsResult = { ok: true; value: BoostCurrents } | { ok: false; reason: string };

const VALLEY_SAMPLES = 200;

/**
 * Inductor and diode currents at the lowest input, where the duty cycle and the inductor current are
 * highest. In continuous conduction the peak Iout·Vout/Vin + ΔIL/2 falls monotonically with Vin, so
 * Vin,min is the worst case; continuity itself is checked over the whole input range.
 */
export function deriveBoostCurrents(d: Derivation, c: BoostOutputConditions): BoostCurrentsResult {
  const dMax = d.step({
    quantity: 'duty cycle at the lowest input', symbol: 'Dmax', formula: 'Dmax = 1 − Vin,min/Vout',
    substituted: `1 − ${q(c.vin_min, 'voltage')}/${q(c.vout, 'voltage')}`, value: 1 - c.vin_min / c.vout, unit: 'ratio', source: `${ERICKSON}, boost CCM`,
  });
  const inductorA = d.step({
    quantity: 'average inductor current at the lowest input', symbol: 'IL', formula: 'IL = Iout/(1 − Dmax)',
    substituted: `${q(c.iout, 'current')}/(1 − ${dMax.toPrecision(4)})`, value: c.iout / (1 - dMax), unit: 'current', source: ERICKSON,
  });
  const inductance = c.inductance;
  const rippleA = inductance === undefined
    ? d.step({
        quantity: 'inductor ripple current (assumed fraction of IL)', symbol: 'ΔIL', formula: 'ΔIL = r·IL',
        substituted: `${q(c.ripple_fraction, 'ratio')}·${q(inductorA, 'current')}`, value: c.ripple_fraction * inductorA, unit: 'current', source: 'common practice: 20–40 % ripple',
      })
    : d.step({
        quantity: 'inductor ripple current at the lowest input', symbol: 'ΔIL', formula: 'ΔIL = Vin,min·Dmax/(L·fs)',
        substituted: `${q(c.vin_min, 'voltage')}·${dMax.toPrecision(4)}/(${q(inductance, 'inductance')}·${q(c.frequency, 'frequency')})`,
        value: (c.vin_min * dMax) / (inductance * c.frequency), unit: 'current', source: ERICKSON,
      });
  if (inductance !== undefined) {
    // Valley Iout·Vout/Vin − Vin·(1 − Vin/Vout)/(2·L·fs) is convex in Vin: sample the range for its minimum.
    const valleyAt = (vin: number) => (c.iout * c.vout) / vin - (vin * (1 - vin / c.vout)) / (2 * inductance * c.frequency);
    let worstVin = c.vin_min;
    for (let i = 0; i <= VALLEY_SAMPLES; i++) {
      const vin = c.vin_min + ((c.vin_max - c.vin_min) * i) / VALLEY_SAMPLES;
      if (valleyAt(vin) < valleyAt(worstVin)) worstVin = vin;
    }
    const valley = d.step({
      quantity: 'lowest valley of the inductor current over the input range', symbol: 'IL,valley', formula: 'min over Vin of Iout·Vout/Vin − Vin·(1 − Vin/Vout)/(2·L·fs)',
      substituted: `at Vin = ${q(worstVin, 'voltage')}`, value: valleyAt(worstVin), unit: 'current', source: ERICKSON,
    });
    if (valley <= 0) {
      return { ok: false, reason: `at Vin ${q(worstVin, 'voltage')} the inductor current falls to zero each cycle: the converter runs discontinuous at full load, which this role does not model; use a larger inductance` };
    }
  }
  const peakA = d.step({
    quantity: 'peak diode current', symbol: 'IF,pk', formula: 'IF,pk = IL + ΔIL/2',
    substituted: `${q(inductorA, 'current')} + ${q(rippleA, 'current')}/2`, value: inductorA + rippleA / 2, unit: 'current', source: ERICKSON,
  });
  const rmsA = d.step({
    quantity: 'RMS diode current (trapezoid over the off time)', symbol: 'IF(RMS)', formula: 'IF(RMS) = √((1 − Dmax)·(IL² + ΔIL²/12))',
    substituted: `√((1 − ${dMax.toPrecision(4)})·(${q(inductorA, 'current')}² + ${q(rippleA, 'current')}²/12))`,
    value: Math.sqrt((1 - dMax) * (inductorA ** 2 + rippleA ** 2 / 12)), unit: 'current', source: 'RMS of a trapezoidal pulse',
  });
  return { ok: true, value: { dMax, inductorA, rippleA, peakA, rmsA } };
}

export interface StartupSurge {
  readonly peakA: number;
  readonly pulseS: number;
}

/**
 * At power-up the discharged output capacitor charges from the input through the inductor and the
 * diode before the converter switches. Without damping the series LC rings to Vin·√(C/L) for half a
 * period π·√(LC); a series resistance R bounds the current by Vin/R (at the peak the inductor
 * voltage is zero, so i = (Vin − vC)/R ≤ Vin/R) and, when it dominates, stretches the pulse to ~3RC.
 */
export function deriveStartupSurge(d: Derivation, c: BoostOutputConditions): StartupSurge | undefined {
  const cap = c.output_capacitance;
  if (cap === undefined) return undefined;
  const bounds: { formula: string; text: string; value: number; width: number; widthText: string }[] = [];
  if (c.inductance !== undefined) {
    bounds.push({
      formula: 'Vin,max·√(C/L)', text: `${q(c.vin_max, 'voltage')}·√(${q(cap, 'capacitance')}/${q(c.inductance, 'inductance')})`,
      value: c.vin_max * Math.sqrt(cap / c.inductance), width: Math.PI * Math.sqrt(c.inductance * cap), widthText: 'π·√(L·C)',
    });
  }
  if (c.source_resistance !== undefined) {
    bounds.push({
      formula: 'Vin,max/R', text: `${q(c.vin_max, 'voltage')}/${q(c.source_resistance, 'resistance')}`,
      value: c.vin_max / c.source_resistance, width: 3 * c.source_resistance * cap, widthText: '3·R·C',
    });
  }
  const peakA = d.step({
    quantity: 'start-up inrush through the diode', symbol: 'Isurge', formula: `Isurge = min(${bounds.map((b) => b.formula).join(', ')})`,
    substituted: `min(${bounds.map((b) => b.text).join(', ')})`, value: Math.min(...bounds.map((b) => b.value)), unit: 'current',
    source: 'published physics: series RLC step response, undamped and resistive bounds',
  });
  const pulseS = d.step({
    quantity: 'inrush pulse width', symbol: 'tsurge', formula: `tsurge = max(${bounds.map((b) => b.widthText).join(', ')})`,
    substituted: `max(${bounds.map((b) => q(b.width, 'time')).join(', ')})`, value: Math.max(...bounds.map((b) => b.width)), unit: 'time',
    source: 'half an LC period, or 95 % charged after 3RC',
  });
  return { peakA, pulseS };
}
