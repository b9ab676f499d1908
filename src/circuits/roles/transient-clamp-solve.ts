import { doubleExponentialPulseEnergy, scalePeakPulsePower } from '../../physics/index.js';
import { formatWaveform } from '../../units/index.js';
import { safetyCautions, type Caution } from '../caution.js';
import type { DeratingPolicy } from '../derating.js';
import { Derivation, q } from '../derivation.js';
import type { Limit, OperatingPoint } from '../limits.js';
import type { SolveResult } from '../role.js';
import { ambientFields, infeasible } from './common-limits.js';
import type { TransientClampConditions } from './transient-clamp.js';
import { resolveSurge } from './transient-clamp-surge.js';

const MIL = 'MIL-HDBK-419A vol. 2 §1.3.3.7.7: stand-off 5 % above the maximum working voltage [published]';
const WUNSCH_BELL = 'Wunsch & Bell, IEEE Trans. Nucl. Sci. NS-15, 1968 [from memory]; ±30 %, datasheet curves rule';
/** Rated pulse of most TVS datasheets, for the orientation step. */
const RATED_10_1000 = { riseS: 10e-6, decayS: 1000e-6 };
/** Typical clamp at rated IPP: 1.4–1.8 × VRWM [common practice]. */
const TYPICAL_CLAMP_RATIO = 1.4;
/** Beyond this the pulse is no longer adiabatic: heat reaches the package and the √t rule fails. */
const ADIABATIC_UP_TO_S = 10e-3;

export function solveTransientClamp(c: TransientClampConditions, policy: DeratingPolicy): SolveResult {
  const d = new Derivation();
  const v = (x: number) => q(x, 'voltage');
  const cautions: Caution[] = [...safetyCautions({ isSurgeProtection: true })];

  // The stand-off rating already sits below breakdown; the policy's VRRM factor is not applied on top,
  // because it would push the clamp voltage up by the same 1/k (25 % at k = 0.8) and eat the withstand margin.
  const vrwmMin = d.step({
    quantity: 'least stand-off voltage', symbol: 'VRWM,min', formula: 'VRWM ≥ Vworking,max·(1 + margin)',
    substituted: `${v(c.working_max)} × (1 + ${q(c.standoff_margin, 'ratio')})`, value: c.working_max * (1 + c.standoff_margin), unit: 'voltage', source: MIL,
  });
  if (c.withstand <= vrwmMin) {
    return infeasible(
      d,
      `no feasible design because the withstand ${v(c.withstand)} leaves no room for a clamp above the stand-off ${v(vrwmMin)} ` +
        `(working ${v(c.working_max)} + ${q(c.standoff_margin, 'ratio')})`,
    );
  }
  if (c.withstand < TYPICAL_CLAMP_RATIO * vrwmMin) {
    cautions.push({
      level: 'design',
      text: `Withstand ${v(c.withstand)} is less than ${TYPICAL_CLAMP_RATIO} × VRWM ${v(vrwmMin)}: TVS diodes clamp at 1.4–1.8 × VRWM at rated current [common practice], so few parts will pass; add series impedance or a second stage.`,
    });
  }

  const surge = resolveSurge(d, c);
  if (surge.note) cautions.push({ level: 'note', text: surge.note });
  const { vocV, zsOhm, waveform } = surge;

  const limits: Limit[] = [
    {
      id: 'vrwm', label: 'VRWM', check: { kind: 'rating', rating: 'vrwmV', relation: 'at-least' }, bound: vrwmMin, quantity: 'voltage', stress: c.working_max,
      reason: `working voltage ${v(c.working_max)} × (1 + ${q(c.standoff_margin, 'ratio')}) (MIL-HDBK-419A vol. 2 §1.3.3.7.7); the ${policy.id} VRRM factor is not applied to a stand-off rating`, isHard: true,
    },
    {
      id: 'vc', label: 'VC', check: { kind: 'computed', what: 'clamp-voltage', relation: 'at-most' }, bound: c.withstand, quantity: 'voltage', stress: c.withstand,
      reason: `VC = VBR,max + IPP·Rdyn at the circuit's IPP = (Voc ${v(vocV)} − VBR,max)/(Zs ${q(zsOhm, 'resistance')} + Rdyn) ≤ withstand ${v(c.withstand)} [common practice]`, isHard: true,
    },
  ];
  const figures: Record<string, number> = { vrwmMinV: vrwmMin, openCircuitV: vocV, sourceOhm: zsOhm, shortCircuitA: surge.shortCircuitA };

  if (vocV <= c.withstand) {
    cautions.push({
      level: 'design',
      text: `The surge's open-circuit voltage ${v(vocV)} does not exceed the withstand ${v(c.withstand)}: the circuit survives it without a clamp, so only the stand-off matters.`,
    });
  } else {
    const ippW = d.step({
      quantity: 'least surge current the clamp must carry while holding the withstand voltage', symbol: 'IPP,w', formula: 'IPP,w = (Voc − Vwithstand)/Zs',
      substituted: `(${v(vocV)} − ${v(c.withstand)})/${q(zsOhm, 'resistance')}`, value: (vocV - c.withstand) / zsOhm, unit: 'current', source: 'circuit analysis (Thevenin source into a clamp)',
    });
    figures.ippAtWithstandA = ippW;
    if (surge.family === 'esd') {
      cautions.push({ level: 'note', text: 'Nanosecond ESD pulses lie outside the pulse-width scaling rule: no pulse-power limit is set; check the part\'s IEC 61000-4-2 level.' });
    } else {
      limits.push(pulsePowerLimit(d, c, policy, vrwmMin, vocV, zsOhm, waveform.decayS, figures));
      if (waveform.decayS > ADIABATIC_UP_TO_S) {
        cautions.push({
          level: 'design',
          text: `A ${formatWaveform(waveform)} pulse is far longer than the adiabatic range of the √t rule: use the part's own rating for this pulse (load-dump energy or its power-versus-time curve).`,
        });
      }
    }
  }
  if (c.polarity === 'bi') cautions.push({ level: 'note', text: 'Bidirectional: working_max is the peak of the AC or bipolar signal, not its rms value.' });

  const operatingPoint: OperatingPoint = {
    ...ambientFields(c), reversePeakV: c.working_max, reverseWorkingV: c.working_max, reverseDuty: 1,
    surge: { openCircuitV: vocV, sourceOhm: zsOhm, waveform, withstandV: c.withstand, workingV: c.working_max },
  };
  const suitableKinds = c.polarity === 'bi' ? ['tvs-bi'] : ['tvs-uni', 'tvs-bi'];
  return { ok: true, position: { role: 'transient-clamp', policyId: policy.id, operatingPoint, limits, steps: d.steps, cautions, figures, suitableKinds } };
}

/**
 * The power a clamp absorbs is VC·(Voc − VC)/Zs. Over the clamp voltages a passing part can have
 * (VRWM,min … withstand) it peaks at VC = Voc/2, or at the nearer end of that range.
 */
function pulsePowerLimit(
  d: Derivation, c: TransientClampConditions, policy: DeratingPolicy, vrwmMin: number, vocV: number, zsOhm: number, widthS: number, figures: Record<string, number>,
): Limit {
  const v = (x: number) => q(x, 'voltage');
  const vcWorst = Math.min(Math.max(vocV / 2, vrwmMin), c.withstand);
  const ipp = (vocV - vcWorst) / zsOhm;
  const pW = d.step({
    quantity: `peak pulse power at the worst clamp voltage ${v(vcWorst)} (P = VC·(Voc − VC)/Zs, largest for VC from ${v(vrwmMin)} to ${v(c.withstand)})`, symbol: 'PPP',
    formula: 'PPP = VC·(Voc − VC)/Zs', substituted: `${v(vcWorst)} × (${v(vocV)} − ${v(vcWorst)})/${q(zsOhm, 'resistance')}`,
    value: vcWorst * ipp, unit: 'power', source: 'circuit analysis (Thevenin source into a clamp)',
  });
  const f = policy.factors.pppm;
  const bound = d.step({
    quantity: `least peak pulse power at ${q(widthS, 'time')} under the ${policy.id} policy`, symbol: 'PPPM,min', formula: 'PPPM ≥ PPP ÷ k(PPPM)',
    substituted: `${q(pW, 'power')} ÷ ${f.value.toFixed(2)}`, value: pW / f.value, unit: 'power', source: f.source,
  });
  const at1ms = scalePeakPulsePower(bound, widthS, RATED_10_1000.decayS);
  const equivalent = d.step({
    quantity: 'the same requirement as a 10/1000 µs rating, for orientation', symbol: 'PPPM(1000 µs)', formula: 'P(t2) = P(t1)·(t1/t2)^0.5',
    substituted: `${q(bound, 'power')} × (${q(widthS, 'time')}/1 ms)^0.5`, value: at1ms.value, unit: 'power', source: WUNSCH_BELL,
  });
  const energy = d.step({
    quantity: 'pulse energy at the worst clamp voltage', symbol: 'E', formula: 'E ≈ VC·IPP·td/ln 2',
    substituted: `${v(vcWorst)} × ${q(ipp, 'current')} × ${q(widthS, 'time')}/ln 2`, value: doubleExponentialPulseEnergy(vcWorst, ipp, widthS),
    unit: 'energy', source: 'double-exponential pulse, decay part [published physics]',
  });
  Object.assign(figures, { pulsePowerW: pW, pulsePowerBoundW: bound, equivalent10x1000W: equivalent, pulseEnergyJ: energy });
  return {
    id: 'pppm', label: 'PPPM', check: { kind: 'computed', what: 'pulse-power', relation: 'at-least' }, bound, quantity: 'power', stress: pW,
    derating: { policyId: policy.id, factor: 'pppm', value: f.value, source: f.source },
    reason:
      `peak pulse power ${q(pW, 'power')} at ${v(vcWorst)} ÷ ${f.value.toFixed(2)} (${policy.id} PPPM factor); ` +
      `the part's PPPM is scaled from its rated pulse to ${q(widthS, 'time')} by P(t2) = P(t1)·(t1/t2)^0.5 (${WUNSCH_BELL})`,
    isHard: true,
  };
}
