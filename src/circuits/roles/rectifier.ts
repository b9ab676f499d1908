import { SAFETY_CAUTION, safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { OperatingPoint } from '../limits.js';
import type { RoleDefinition, SolveResult } from '../role.js';
import { ambientFields, infeasible, rectifyingLimits, switchingKinds } from './common-limits.js';
import { RECTIFIER_INPUTS, rectifierSchema, type RectifierConditions } from './rectifier-conditions.js';
import { SEDRA_SMITH, deriveRectifierCurrents, type RectifierCurrents } from './rectifier-currents.js';

/** Above this the small-ripple formulas drift from the exact waveform by more than a few per cent. */
const RIPPLE_RATIO_CAUTION = 0.2;
/** Up to here recovery does not matter and a standard rectifier is the natural choice. */
const LINE_FREQUENCY_MAX_HZ = 1000;

function solveRectifier(c: RectifierConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const isBridge = c.configuration === 'bridge';
  const vsPk = d.step({
    quantity: 'peak source voltage at high line', symbol: 'Vs,pk', formula: 'Vs,pk = √2·Vs,rms·(1 + tol)',
    substituted: `√2·${q(c.v_secondary_rms, 'voltage')}·(1 + ${q(c.line_tolerance, 'ratio')})`,
    value: Math.SQRT2 * c.v_secondary_rms * (1 + c.line_tolerance), unit: 'voltage',
    source: 'sine: peak = √2·rms; size for the highest line (common practice)',
  });
  const vp = d.step({
    quantity: 'peak voltage on the filter capacitor', symbol: 'Vp', formula: isBridge ? 'Vp = Vs,pk − 2·VD' : 'Vp = Vs,pk − VD',
    substituted: `${q(vsPk, 'voltage')} − ${isBridge ? '2·' : ''}${q(c.diode_drop, 'voltage')}`,
    value: vsPk - (isBridge ? 2 : 1) * c.diode_drop, unit: 'voltage', source: SEDRA_SMITH,
  });
  if (vp <= 0) return infeasible(d, `the diode drops take the whole ${q(vsPk, 'voltage')} peak: there is no DC output`);
  const currents = deriveRectifierCurrents(d, {
    isFullWave: c.configuration !== 'half-wave', vpV: vp, frequencyHz: c.frequency, loadA: c.load_current,
    capacitanceF: c.capacitance, rippleMaxV: c.ripple_max,
  });
  if (!currents.ok) return infeasible(d, currents.reason);
  const x = currents.value;

  // A non-conducting diode of a half-wave or centre-tap circuit sees the capacitor's +Vp on its
  // cathode while its winding swings to −Vs,pk; in a bridge the conducting pair clamps it to Vs,pk − VD.
  const pivFormula = isBridge ? 'PIV = Vs,pk − VD' : 'PIV = Vs,pk + Vp (= 2·Vs,pk − VD)';
  const piv = d.step({
    quantity: 'peak inverse voltage per diode', symbol: 'PIV', formula: pivFormula,
    substituted: isBridge ? `${q(vsPk, 'voltage')} − ${q(c.diode_drop, 'voltage')}` : `${q(vsPk, 'voltage')} + ${q(vp, 'voltage')}`,
    value: isBridge ? vsPk - c.diode_drop : vsPk + vp, unit: 'voltage', source: SEDRA_SMITH,
  });
  let reversePeakV = piv;
  if (c.line_surge_peak !== undefined && c.line_surge_peak > vsPk) {
    reversePeakV = d.step({
      quantity: 'reverse voltage during a line surge', symbol: 'VR,surge', formula: isBridge ? 'VR,surge = Vsurge − VD' : 'VR,surge = Vsurge + Vp',
      substituted: isBridge ? `${q(c.line_surge_peak, 'voltage')} − ${q(c.diode_drop, 'voltage')}` : `${q(c.line_surge_peak, 'voltage')} + ${q(vp, 'voltage')}`,
      value: isBridge ? c.line_surge_peak - c.diode_drop : c.line_surge_peak + vp, unit: 'voltage', source: `${SEDRA_SMITH}, with the surge peak in place of Vs,pk`,
    });
  }

  const inrush = deriveInrush(d, c, vsPk, x);
  const operatingPoint: OperatingPoint = {
    ...ambientFields(c),
    reversePeakV,
    // Conservative: the PIV is taken as held for the whole blocking interval.
    reverseWorkingV: piv,
    reverseDuty: 1 - x.duty,
    forwardAvgA: x.ifAvA,
    forwardRmsA: x.irmsA,
    forwardPeakA: x.idMaxA,
    forwardRepetitivePeakA: x.idMaxA,
    surgeA: inrush.peakA,
    surgePulseS: inrush.pulseS,
    forwardDuty: x.duty,
    switchingFrequencyHz: c.frequency,
    // The diode turns off softly near the crest; PIV is an upper bound for the voltage it recovers against.
    switchingVoltageV: piv,
  };
  const limits = rectifyingLimits(d, operatingPoint, policy, {
    reverse: reversePeakV > piv ? 'reverse voltage during the line surge' : 'peak inverse voltage',
    average: 'average current per diode',
    surge: 'switch-on inrush',
  });
  const vrrmBound = limits.find((l) => l.id === 'vrrm')?.bound ?? reversePeakV;
  const suitableKinds =
    c.frequency <= LINE_FREQUENCY_MAX_HZ ? ['rectifier', 'fast-recovery', ...(vrrmBound <= 100 ? ['schottky'] : [])] : switchingKinds(vrrmBound);
  return {
    ok: true,
    position: {
      role: 'rectifier', policyId: policy.id, operatingPoint, limits, steps: d.steps,
      cautions: rectifierCautions(c, vsPk, vp, x, inrush),
      figures: {
        peak_v: vp, ripple_v: x.rippleV, capacitance_f: x.capacitanceF, conduction_angle_rad: x.angleRad,
        conduction_time_s: x.conductionS, diode_current_avg_conduction_a: x.idAvConductionA, inrush_a: inrush.peakA, inrush_pulse_s: inrush.pulseS,
      },
      suitableKinds,
    },
  };
}

interface Inrush {
  readonly peakA: number;
  readonly pulseS: number;
}

/** The discharged capacitor is a short at switch-on: only the series resistances limit the first peak. */
function deriveInrush(d: Derivation, c: RectifierConditions, vsPk: number, x: RectifierCurrents): Inrush {
  const r = d.step({
    quantity: 'resistance in the inrush path', symbol: 'Rin', formula: 'Rin = Rsource + ESR + Rlimiter',
    substituted: `${q(c.source_resistance, 'resistance')} + ${q(c.capacitor_esr, 'resistance')} + ${q(c.inrush_limiter, 'resistance')}`,
    value: c.source_resistance + c.capacitor_esr + c.inrush_limiter, unit: 'resistance',
  });
  const peakA = d.step({
    quantity: 'switch-on inrush peak, worst case at the crest of high line', symbol: 'Isurge', formula: 'Isurge = Vs,pk/Rin',
    substituted: `${q(vsPk, 'voltage')}/${q(r, 'resistance')}`, value: vsPk / r, unit: 'current',
    source: 'published physics: discharged capacitor as a short (diode-formulas §1)',
  });
  const tau = d.step({
    quantity: 'inrush time constant', symbol: 'τin', formula: 'τin = Rin·C', substituted: `${q(r, 'resistance')}·${q(x.capacitanceF, 'capacitance')}`,
    value: r * x.capacitanceF, unit: 'time', source: 'RC charging',
  });
  const pulseS = d.step({
    quantity: 'inrush pulse width', symbol: 'tsurge', formula: 'tsurge = min(3·τin, 1/(2f))',
    substituted: `min(3·${q(tau, 'time')}, 1/(2·${q(c.frequency, 'frequency')}))`, value: Math.min(3 * tau, 1 / (2 * c.frequency)), unit: 'time',
    source: 'assumption: 95 % charged after 3τ, and the source reverses after half a cycle',
  });
  return { peakA, pulseS };
}

function rectifierCautions(c: RectifierConditions, vsPk: number, vp: number, x: RectifierCurrents, inrush: Inrush): Caution[] {
  const acRmsV = c.v_secondary_rms * (1 + c.line_tolerance);
  const cautions: Caution[] = c.is_mains_connected ? [SAFETY_CAUTION] : safetyCautions({ acRmsV, dcV: vp });
  cautions.push({
    level: 'note',
    text: `Each conducting diode is taken to drop ${q(c.diode_drop, 'voltage')} (an assumption); a part's real VF at ${q(x.idMaxA, 'current')} shifts Vp and the currents a little.`,
  });
  cautions.push({
    level: 'design',
    text:
      `Switch-on inrush: about ${q(inrush.peakA, 'current')} for ${q(inrush.pulseS, 'time')}. IFSM is rated for one 8.3 ms or 10 ms half-sine; ` +
      'a shorter pulse of the same peak is milder, but frequent power cycling needs more margin or an inrush limiter.' +
      (c.capacitance === undefined ? ' The inrush uses the smallest capacitor for the ripple target; a larger one lengthens the pulse.' : ''),
  });
  if (x.rippleV > RIPPLE_RATIO_CAUTION * vp) {
    cautions.push({
      level: 'design',
      text: `The ripple is ${q(x.rippleV / vp, 'ratio')} of Vp: the small-ripple formulas lose accuracy (exact conduction angle ${x.angleExactRad.toPrecision(3)} rad against ${x.angleRad.toPrecision(3)} rad). Consider a larger capacitor.`,
    });
  }
  if (c.line_surge_peak === undefined && (c.is_mains_connected || vsPk > 100)) {
    cautions.push({
      level: 'design',
      text: 'Line surges are not in the reverse-voltage limit: give line_surge_peak (the clamp voltage of the MOV or TVS ahead of the rectifier). On 230 V mains a VRRM of 800–1000 V is usual (common practice).',
    });
  }
  return cautions;
}

export const rectifierRole: RoleDefinition<ReturnType<typeof rectifierSchema>> = {
  id: 'rectifier',
  title: 'Rectifier with capacitor-input filter',
  summary: 'Mains or transformer rectifier (half-wave, centre-tap or bridge) feeding a reservoir capacitor: PIV at high line, peak and average diode currents, switch-on inrush.',
  inputs: RECTIFIER_INPUTS,
  get schema() {
    return rectifierSchema();
  },
  solve: solveRectifier,
};
