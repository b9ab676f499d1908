import { formatWaveform, type Waveform } from '../../units/index.js';
import { type Derivation, q } from '../derivation.js';
import type { TransientClampConditions } from './transient-clamp.js';
import { findSurgePreset, type SurgePreset } from './transient-clamp-presets.js';

export interface ResolvedSurge {
  readonly family: SurgePreset['family'] | 'explicit';
  readonly vocV: number;
  /** Impedance of the clamp model (see SurgePreset.modelOhm). */
  readonly zsOhm: number;
  readonly waveform: Waveform;
  readonly shortCircuitA: number;
  readonly note?: string;
}

/** The surge from a preset or from explicit values, each number recorded as a step with its source. */
export function resolveSurge(d: Derivation, c: TransientClampConditions): ResolvedSurge {
  const preset = c.surge === undefined ? undefined : findSurgePreset(c.surge);
  // The schema admits either a known preset or all three explicit values.
  const source = preset ? `${preset.label}: ${preset.source}` : 'design input';
  const vocV = d.step({
    quantity: 'surge open-circuit voltage', symbol: 'Voc', formula: preset ? `preset ${preset.id}` : 'Voc = open_circuit_voltage',
    substituted: q(preset?.openCircuitV ?? c.open_circuit_voltage!, 'voltage'), value: preset?.openCircuitV ?? c.open_circuit_voltage!, unit: 'voltage', source,
  });
  const givenOhm = preset?.sourceOhm ?? c.source_impedance!;
  const zsGiven = d.step({
    quantity: 'surge source impedance (generator and coupling)', symbol: 'Zs', formula: preset ? `preset ${preset.id}` : 'Zs = source_impedance',
    substituted: q(givenOhm, 'resistance'), value: givenOhm, unit: 'resistance', source,
  });
  const waveform = preset?.waveform ?? c.waveform!;
  d.step({
    quantity: `surge current waveform ${formatWaveform(waveform)}: pulse width taken as the decay to half value`, symbol: 'td', formula: 'td = decay time of rise/decay',
    substituted: formatWaveform(waveform), value: waveform.decayS, unit: 'time', source,
  });
  if (preset?.family === 'esd') {
    const firstPeakA = d.step({
      quantity: 'ESD first-peak current (contact discharge)', symbol: 'Ipk', formula: 'Ipk = 3.75 A/kV × Vcharge',
      substituted: `3.75 A/kV × ${q(vocV, 'voltage')}`, value: preset.shortCircuitA, unit: 'current', source: preset.source,
    });
    // The first peak exceeds V/330 Ω (the discharge of the gun's own capacitance), so the model uses Voc/Ipk.
    const zsOhm = d.step({
      quantity: 'effective source impedance for the clamp model, so a short draws the first peak', symbol: 'Zs,eff', formula: 'Zs,eff = Voc/Ipk',
      substituted: `${q(vocV, 'voltage')}/${q(firstPeakA, 'current')}`, value: preset.modelOhm, unit: 'resistance', source: 'model choice: first peak is the worst current',
    });
    return { family: 'esd', vocV, zsOhm, waveform, shortCircuitA: firstPeakA, ...(preset.note ? { note: preset.note } : {}) };
  }
  const shortCircuitA = d.step({
    quantity: 'largest surge current: the source short-circuited (no clamp can draw more)', symbol: 'IPP,max', formula: 'IPP,max = Voc/Zs',
    substituted: `${q(vocV, 'voltage')}/${q(zsGiven, 'resistance')}`, value: vocV / zsGiven, unit: 'current', source: preset ? preset.source : 'circuit analysis (Thevenin source)',
  });
  return { family: preset?.family ?? 'explicit', vocV, zsOhm: zsGiven, waveform, shortCircuitA, ...(preset?.note ? { note: preset.note } : {}) };
}
