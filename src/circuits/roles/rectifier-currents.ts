import { q, type Derivation } from '../derivation.js';

/** Where the peak-rectifier formulas come from (diode-formulas.md §1). */
export const SEDRA_SMITH = 'Sedra & Smith, Microelectronic Circuits, "the peak rectifier" (§4.5.4 in later editions; section from memory)';

export interface RectifierCurrentsInput {
  readonly isFullWave: boolean;
  /** Peak voltage on the capacitor, drops deducted. */
  readonly vpV: number;
  readonly frequencyHz: number;
  readonly loadA: number;
  readonly capacitanceF?: number | undefined;
  readonly rippleMaxV?: number | undefined;
}

export interface RectifierCurrents {
  readonly rippleV: number;
  /** The filter capacitor given, or the smallest that meets ripple_max. */
  readonly capacitanceF: number;
  readonly capacitanceNeededF?: number;
  readonly angleRad: number;
  readonly angleExactRad: number;
  readonly conductionS: number;
  readonly idAvConductionA: number;
  readonly idMaxA: number;
  /** Per diode, averaged over the line cycle. */
  readonly ifAvA: number;
  readonly irmsA: number;
  /** Fraction of the line period one diode conducts. */
  readonly duty: number;
}

export type RectifierCurrentsResult = { ok: true; value: RectifierCurrents } | { ok: false; reason: string };

/**
 * Ripple, conduction angle and diode currents of a capacitor-input rectifier in the small-ripple
 * approximation of Sedra & Smith. Each diode (or diode pair) conducts once per line cycle; the
 * capacitor is recharged once per cycle (half-wave) or twice (full-wave).
 */
export function deriveRectifierCurrents(d: Derivation, x: RectifierCurrentsInput): RectifierCurrentsResult {
  const pulses = x.isFullWave ? 2 : 1;
  const pf = x.isFullWave ? '2f' : 'f';
  const pulseHz = pulses * x.frequencyHz;
  let rippleV: number;
  let capacitanceF: number;
  let capacitanceNeededF: number | undefined;
  if (x.capacitanceF !== undefined) {
    capacitanceF = x.capacitanceF;
    rippleV = d.step({
      quantity: 'peak-to-peak ripple on the capacitor', symbol: 'Vr', formula: `Vr = IL/(${pf}·C)`,
      substituted: `${q(x.loadA, 'current')}/(${pulses === 2 ? '2·' : ''}${q(x.frequencyHz, 'frequency')}·${q(capacitanceF, 'capacitance')})`,
      value: x.loadA / (pulseHz * capacitanceF), unit: 'voltage', source: SEDRA_SMITH,
    });
    if (x.rippleMaxV !== undefined && rippleV > x.rippleMaxV) {
      const needed = x.loadA / (pulseHz * x.rippleMaxV);
      return { ok: false, reason: `${q(capacitanceF, 'capacitance')} gives ${q(rippleV, 'voltage')} ripple, above ripple_max ${q(x.rippleMaxV, 'voltage')}: it needs at least ${q(needed, 'capacitance')}` };
    }
  } else {
    // The schema guarantees one of the two.
    rippleV = x.rippleMaxV as number;
    capacitanceNeededF = capacitanceF = d.step({
      quantity: 'smallest filter capacitor for the ripple target', symbol: 'C', formula: `C = IL/(${pf}·Vr)`,
      substituted: `${q(x.loadA, 'current')}/(${pulses === 2 ? '2·' : ''}${q(x.frequencyHz, 'frequency')}·${q(rippleV, 'voltage')})`,
      value: x.loadA / (pulseHz * rippleV), unit: 'capacitance', source: SEDRA_SMITH,
    });
  }
  if (rippleV >= x.vpV) {
    return { ok: false, reason: `the ripple ${q(rippleV, 'voltage')} is not below the peak ${q(x.vpV, 'voltage')}: the capacitor empties every cycle, so this is no longer a peak rectifier; use a larger capacitor` };
  }
  const ratio = `${q(rippleV, 'voltage')}/${q(x.vpV, 'voltage')}`;
  const angleRad = d.step({
    quantity: 'conduction angle', symbol: 'ωΔt', formula: 'ωΔt = √(2·Vr/Vp)', substituted: `√(2·${ratio})`,
    value: Math.sqrt((2 * rippleV) / x.vpV), unit: 'dimensionless', source: SEDRA_SMITH,
  });
  const angleExactRad = d.step({
    quantity: 'conduction angle, exact form (check)', symbol: 'ωΔt,exact', formula: 'ωΔt = arccos(1 − Vr/Vp)', substituted: `arccos(1 − ${ratio})`,
    value: Math.acos(1 - rippleV / x.vpV), unit: 'dimensionless', source: SEDRA_SMITH,
  });
  const conductionS = d.step({
    quantity: 'conduction time per cycle', symbol: 'Δt', formula: 'Δt = ωΔt/(2π·f)', substituted: `${angleRad.toPrecision(3)}/(2π·${q(x.frequencyHz, 'frequency')})`,
    value: angleRad / (2 * Math.PI * x.frequencyHz), unit: 'time',
  });
  // Full-wave: each diode delivers half the charge, so the square root halves (Vp/2Vr instead of 2Vp/Vr).
  const root = x.isFullWave ? Math.sqrt(x.vpV / (2 * rippleV)) : Math.sqrt((2 * x.vpV) / rippleV);
  const rootText = x.isFullWave ? '√(Vp/(2·Vr))' : '√(2·Vp/Vr)';
  const rootSub = x.isFullWave ? `√(${q(x.vpV, 'voltage')}/(2·${q(rippleV, 'voltage')}))` : `√(2·${q(x.vpV, 'voltage')}/${q(rippleV, 'voltage')})`;
  const idAvConductionA = d.step({
    quantity: 'diode current averaged over the conduction interval', symbol: 'iD,av', formula: `iD,av = IL·(1 + π·${rootText})`,
    substituted: `${q(x.loadA, 'current')}·(1 + π·${rootSub})`, value: x.loadA * (1 + Math.PI * root), unit: 'current', source: SEDRA_SMITH,
  });
  const idMaxA = d.step({
    quantity: 'peak diode current (repetitive)', symbol: 'iD,max', formula: `iD,max = IL·(1 + 2π·${rootText})`,
    substituted: `${q(x.loadA, 'current')}·(1 + 2π·${rootSub})`, value: x.loadA * (1 + 2 * Math.PI * root), unit: 'current', source: SEDRA_SMITH,
  });
  const ifAvA = d.step({
    quantity: 'average current per diode over the line cycle', symbol: 'IF(AV)', formula: x.isFullWave ? 'IF(AV) = IL/2' : 'IF(AV) = IL',
    substituted: x.isFullWave ? `${q(x.loadA, 'current')}/2` : q(x.loadA, 'current'), value: x.loadA / pulses, unit: 'current',
    source: 'charge balance: the diodes deliver the load current',
  });
  d.step({
    quantity: 'charge-balance check (≈ IF(AV), slightly above in this approximation)', symbol: 'iD,av·Δt·f', formula: 'iD,av·Δt·f',
    substituted: `${q(idAvConductionA, 'current')}·${q(conductionS, 'time')}·${q(x.frequencyHz, 'frequency')}`,
    value: idAvConductionA * conductionS * x.frequencyHz, unit: 'current', source: SEDRA_SMITH,
  });
  const duty = d.step({
    quantity: 'conduction duty per diode', symbol: 'δ', formula: 'δ = Δt·f', substituted: `${q(conductionS, 'time')}·${q(x.frequencyHz, 'frequency')}`,
    value: conductionS * x.frequencyHz, unit: 'ratio',
  });
  const irmsA = d.step({
    quantity: 'RMS current per diode', symbol: 'IF(RMS)', formula: 'IF(RMS) = iD,max·√(δ/3)',
    substituted: `${q(idMaxA, 'current')}·√(${duty.toPrecision(3)}/3)`, value: idMaxA * Math.sqrt(duty / 3), unit: 'current',
    source: 'approximation: a triangular pulse falling from iD,max to zero over Δt (the shape implied by iD,max ≈ 2·iD,av)',
  });
  return {
    ok: true,
    value: { rippleV, capacitanceF, ...(capacitanceNeededF === undefined ? {} : { capacitanceNeededF }), angleRad, angleExactRad, conductionS, idAvConductionA, idMaxA, ifAvA, irmsA, duty },
  };
}
