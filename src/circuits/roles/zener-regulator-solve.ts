import { SILICON_BANDGAP_EV, breakdownMechanism, zenerWindow } from '../../physics/index.js';
import { formatQuantity } from '../../units/index.js';
import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import { E24_SOURCE, e24AtOrAbove, e24AtOrBelow, isE24, nearestE24 } from '../e24.js';
import type { Limit, OperatingPoint } from '../limits.js';
import type { SolveResult } from '../role.js';
import { ambientFields, infeasible, junctionTemperatureLimit } from './common-limits.js';
import type { ZenerRegulatorConditions } from './zener-regulator.js';
import { regulation, seriesResistor } from './zener-regulator-resistor.js';

const WINDOW_SOURCE = 'tolerance band and linear tempco VZ(T) = VZ,25·(1 + αVZ·(T − 25 °C)) (diode-formulas §4)';

export function solveZenerRegulator(c: ZenerRegulatorConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const v = (x: number) => q(x, 'voltage');
  const cautions: Caution[] = [];

  const mechanism = breakdownMechanism(c.vz);
  d.step({
    quantity: `breakdown mechanism at ${v(c.vz)}: ${mechanism.mechanism}, tempco ${mechanism.tempcoSign}`, symbol: 'VZ/(Eg/q)',
    formula: 'tunnelling below 4·Eg/q, avalanche above 6·Eg/q, mixed between', substituted: `${v(c.vz)}/${SILICON_BANDGAP_EV} V`,
    value: c.vz / SILICON_BANDGAP_EV, unit: 'dimensionless', source: mechanism.method,
  });
  if (!isE24(c.vz)) {
    cautions.push({
      level: 'design',
      text: `VZ ${v(c.vz)} is not an E24 value (IEC 60063), so few parts exist: nearest ${v(nearestE24(c.vz))} (neighbours ${v(e24AtOrBelow(c.vz))} and ${v(e24AtOrAbove(c.vz))}).`,
    });
  }
  // Without a datasheet tempco only the sign is known: drift stays out of the window, and we say so.
  const alphaPerK = c.tempco ?? 0;
  if (c.tempco === undefined) {
    cautions.push({
      level: 'design',
      text: `No tempco given: VZ drift over temperature is left out of the window. Expected sign only: ${mechanism.tempcoSign} (${mechanism.mechanism} breakdown); give tempco from the datasheet to include it.`,
    });
  }
  const isSignSurprising = c.tempco !== undefined && ((mechanism.tempcoSign === 'negative' && c.tempco > 0) || (mechanism.tempcoSign === 'positive' && c.tempco < 0));
  if (isSignSurprising) {
    cautions.push({ level: 'design', text: `tempco ${q(c.tempco!, 'tempco')} has the opposite sign to ${mechanism.mechanism} breakdown at ${v(c.vz)}: check the datasheet value and its unit.` });
  }
  const window = zenerWindow({ vzNominalV: c.vz, tolerance: c.tolerance, alphaPerK, tMinK: c.ambient_min, tMaxK: c.ambient_max });
  const at = (tK: number) => (alphaPerK === 0 ? '' : `; at ${formatQuantity(tK, 'temperature')}`);
  const windowMin = d.step({
    quantity: 'lowest VZ over tolerance and ambient', symbol: 'VZ,min', formula: 'VZ·(1 − tol)·(1 + α·(T − 25 °C))',
    substituted: `${window.method}${at(window.minAtK)}`, value: window.minV, unit: 'voltage', source: WINDOW_SOURCE,
  });
  const windowMax = d.step({
    quantity: 'highest VZ over tolerance and ambient', symbol: 'VZ,max', formula: 'VZ·(1 + tol)·(1 + α·(T − 25 °C))',
    substituted: `${window.method}${at(window.maxAtK)}`, value: window.maxV, unit: 'voltage', source: WINDOW_SOURCE,
  });

  // With an allowed output window, any part inside it must work: size the resistor for its edges.
  const hasWindow = c.vout_min !== undefined && c.vout_max !== undefined;
  const allowed = (edge: 'min' | 'max', value: number) =>
    d.step({
      quantity: `VZ,${edge} for sizing: the allowed window edge (any part that passes)`, symbol: `VZ,${edge},allowed`, formula: `VZ,${edge},allowed = vout_${edge}`,
      substituted: v(value), value, unit: 'voltage', source: 'design input',
    });
  const vzMinV = hasWindow ? allowed('min', c.vout_min!) : windowMin;
  const vzMaxV = hasWindow ? allowed('max', c.vout_max!) : windowMax;
  if (hasWindow && (windowMin < vzMinV || windowMax > vzMaxV)) {
    cautions.push({
      level: 'design',
      text: `A ${q(c.tolerance, 'ratio')} part at ${v(c.vz)} spans ${v(windowMin)} … ${v(windowMax)}, wider than the allowed ${v(vzMinV)} … ${v(vzMaxV)}: only tighter parts pass.`,
    });
  }
  d.step({
    quantity: 'minimum Zener current for regulation (iz_min; default 1 mA, about 10 % of IZT for a small-signal Zener)', symbol: 'IZ,min', formula: 'IZ,min = iz_min',
    substituted: q(c.iz_min, 'current'), value: c.iz_min, unit: 'current', source: 'design input; 10 % of IZT [common practice]',
  });

  const sized = seriesResistor(d, {
    vinMinV: c.vin_min, vinMaxV: c.vin_max, vzMinV, vzMaxV, loadMinA: c.load_min, loadMaxA: c.load_max,
    izMinA: c.iz_min, resistorTolerance: c.resistor_tolerance, givenOhm: c.resistor,
  });
  if (!sized.ok) return infeasible(d, sized.reason);
  const r = sized.design;
  const reg = c.zzt === undefined ? undefined : regulation(d, r.rOhm, c.zzt);

  const f = policy.factors.pd;
  const pzBound = d.step({
    quantity: `least Zener power rating under the ${policy.id} policy`, symbol: 'PD,min', formula: 'PD ≥ PZ ÷ k(PD)',
    substituted: `${q(r.pzW, 'power')} ÷ ${f.value.toFixed(2)}`, value: r.pzW / f.value, unit: 'power', source: f.source,
  });
  const limits: Limit[] = [
    ...voltageLimits(c, hasWindow, windowMin, windowMax),
    {
      id: 'pz', label: 'PZ', check: { kind: 'computed', what: 'zener-power', relation: 'at-least' }, bound: pzBound, quantity: 'power', stress: r.pzW,
      derating: { policyId: policy.id, factor: 'pd', value: f.value, source: f.source },
      reason: `Zener dissipation ${q(r.pzW, 'power')} (VZ,max × IZ,max at Vin,max, lightest load) ÷ ${f.value.toFixed(2)} (${policy.id} PD factor), ` +
        'against PD derated to the solved temperature',
      isHard: true,
    },
    junctionTemperatureLimit(policy),
  ];

  cautions.push({ level: 'note', text: `The series resistor dissipates up to ${q(r.prW, 'power')}: choose one rated at least twice that [common practice].` });
  cautions.push({ level: 'note', text: 'The VZ window is at ambient; self-heating (PZ·RθJA) moves the junction and VZ further.' });
  cautions.push(...safetyCautions({ dcV: c.vin_max }));

  const operatingPoint: OperatingPoint = { ...ambientFields(c), zenerCurrentMinA: r.izLowA, zenerCurrentMaxA: r.izHighA };
  const figures: Record<string, number> = {
    rOhm: r.rOhm, rMaxOhm: r.rMaxOhm, izMinA: r.izLowA, izMaxA: r.izHighA, pzW: r.pzW, prW: r.prW, vzMinV: windowMin, vzMaxV: windowMax,
    ...(reg ? { lineRegulation: reg.line, loadRegulationOhm: reg.loadOhm } : {}),
  };
  return {
    ok: true,
    position: { role: 'zener-regulator', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions, figures, suitableKinds: ['zener'] },
  };
}

/**
 * The allowed VZ. With vout_min/vout_max: the part's own window (its tolerance and tempco over the
 * ambient) must sit inside them. Without: the part's nominal VZ must equal the requested vz, and
 * its window inside the one the resistor was sized for is a preference (a wider part shifts IZ).
 */
function voltageLimits(c: ZenerRegulatorConditions, hasWindow: boolean, windowMin: number, windowMax: number): Limit[] {
  const v = (x: number) => q(x, 'voltage');
  const computed = (relation: 'at-least' | 'at-most') => ({ kind: 'computed', what: 'zener-voltage', relation }) as const;
  const rated = (relation: 'at-least' | 'at-most') => ({ kind: 'rating', rating: 'vzV', relation }) as const;
  const base = { quantity: 'voltage', isHard: true } as const;
  if (hasWindow) {
    const [low, high] = [c.vout_min!, c.vout_max!];
    return [
      { ...base, id: 'vz-min', label: 'VZ,min', check: computed('at-least'), bound: low, stress: low, reason: `part's lowest VZ over tolerance and ambient ≥ vout_min ${v(low)}` },
      { ...base, id: 'vz-max', label: 'VZ,max', check: computed('at-most'), bound: high, stress: high, reason: `part's highest VZ over tolerance and ambient ≤ vout_max ${v(high)}` },
    ];
  }
  const nominal = `nominal VZ = ${v(c.vz)} as requested (${isE24(c.vz) ? 'an E24 value' : 'not an E24 value'}, ${E24_SOURCE})`;
  const sizedFor = `the resistor was sized for VZ in ${v(windowMin)} … ${v(windowMax)} (±${q(c.tolerance, 'ratio')})`;
  return [
    { ...base, id: 'vz-min', label: 'VZ', check: rated('at-least'), bound: c.vz, stress: c.vz, reason: nominal },
    { ...base, id: 'vz-max', label: 'VZ', check: rated('at-most'), bound: c.vz, stress: c.vz, reason: nominal },
    { ...base, id: 'vz-window-min', label: 'VZ,min', check: computed('at-least'), bound: windowMin, stress: windowMin, reason: `${sizedFor}; a part reaching lower passes more Zener current`, isHard: false },
    { ...base, id: 'vz-window-max', label: 'VZ,max', check: computed('at-most'), bound: windowMax, stress: windowMax, reason: `${sizedFor}; a part reaching higher may drop out of regulation at Vin,min`, isHard: false },
  ];
}
