import type { Waveform } from '../../units/index.js';

/** A standard surge, as the circuit side of a TVS choice: generator voltage, impedance and waveform. */
export interface SurgePreset {
  readonly id: string;
  readonly label: string;
  readonly family: 'combination-wave' | 'esd' | 'load-dump';
  /** Open-circuit (charge or pulse) voltage, V. */
  readonly openCircuitV: number;
  /** Generator plus coupling impedance as the standard gives it, Ω. */
  readonly sourceOhm: number;
  /**
   * Impedance the clamp model uses, Ω. Equal to sourceOhm except for ESD, whose first peak
   * (3.75 A/kV) is larger than V/330 Ω: there it is Voc/first peak, so a short draws that peak.
   */
  readonly modelOhm: number;
  /** Current waveform through a clamp (rise/decay to half value). */
  readonly waveform: Waveform;
  /** Short-circuit peak current the model implies: Voc/modelOhm. */
  readonly shortCircuitA: number;
  readonly source: string;
  readonly note?: string;
  /** Load dump: the standard's ranges; the preset takes the worst corner (highest Us, lowest Ri, longest td). */
  readonly range?: {
    readonly usV: readonly [number, number];
    readonly riOhm: readonly [number, number];
    readonly tdS: readonly [number, number];
  };
}

const IEC_61000_4_5 = 'IEC 61000-4-5 combination wave: 1.2/50 µs open circuit, 8/20 µs short circuit, 2 Ω effective generator impedance [published]';
/** Coupling: generator alone line to line; +10 Ω line to earth; +40 Ω for unshielded signal lines. */
const COUPLINGS = [
  { suffix: 'line', ohm: 2, label: 'line to line, 2 Ω', source: IEC_61000_4_5 },
  { suffix: 'line-earth', ohm: 12, label: 'line to earth, 12 Ω with the coupling network', source: `${IEC_61000_4_5}; 12 Ω line-to-earth coupling [published; value from memory]` },
  { suffix: 'signal', ohm: 42, label: 'unshielded signal line, 42 Ω with the coupling network', source: `${IEC_61000_4_5}; 42 Ω signal-line coupling [published; value from memory]` },
] as const;
const COMBINATION_LEVELS = [
  { kv: '0.5kv', v: 500 },
  { kv: '1kv', v: 1000 },
  { kv: '2kv', v: 2000 },
  { kv: '4kv', v: 4000 },
] as const;

const combinationWave: SurgePreset[] = COMBINATION_LEVELS.flatMap((level) =>
  COUPLINGS.map((coupling) => ({
    id: `iec61000-4-5-${level.kv}-${coupling.suffix}`,
    label: `IEC 61000-4-5 surge ${level.v / 1000} kV, ${coupling.label}`,
    family: 'combination-wave' as const,
    openCircuitV: level.v,
    sourceOhm: coupling.ohm,
    modelOhm: coupling.ohm,
    waveform: { riseS: 8e-6, decayS: 20e-6 },
    shortCircuitA: level.v / coupling.ohm,
    source: coupling.source,
    ...(coupling.ohm > 2 ? { note: 'Through a coupling network the current is longer than 8/20 µs (towards 1.2/50 µs); 8/20 µs is the usual rating basis.' } : {}),
  })),
);

/** IEC 61000-4-2 contact discharge: 150 pF / 330 Ω, first peak 3.75 A per kV [published]. */
const ESD_FIRST_PEAK_A_PER_V = 3.75e-3;
const esd: SurgePreset[] = [2, 4, 6, 8].map((kv) => {
  const v = kv * 1000;
  const peakA = ESD_FIRST_PEAK_A_PER_V * v;
  return {
    id: `iec61000-4-2-${kv}kv-contact`,
    label: `IEC 61000-4-2 ESD ${kv} kV contact`,
    family: 'esd' as const,
    openCircuitV: v,
    sourceOhm: 330,
    modelOhm: v / peakA,
    // Rise 0.8 ns; 60 ns is where the standard's current falls to 1 A/kV. A record of the pulse's
    // length only: nanosecond pulses lie outside the pulse-power scaling rule, so no power check.
    waveform: { riseS: 0.8e-9, decayS: 60e-9 },
    shortCircuitA: peakA,
    source: 'IEC 61000-4-2: 150 pF / 330 Ω network, contact levels 2/4/6/8 kV, first peak 3.75 A/kV [published]',
    note: "ESD checks the first-peak current and the clamp voltage only; use the part's own IEC 61000-4-2 rating for survival.",
  };
});

const ISO_16750_2 = 'ISO 16750-2 load dump test A (no central suppression) [published]; rise time 10 ms and Us measured from 0 V [from memory]';

function loadDump(system: '12v' | '24v', usV: [number, number], riOhm: [number, number], tdS: [number, number]): SurgePreset {
  const [, us] = usV;
  const [ri] = riOhm;
  const [, td] = tdS;
  return {
    id: `iso16750-2-load-dump-${system}`,
    label: `ISO 16750-2 load dump, ${system.toUpperCase()} system (worst corner: Us ${us} V, Ri ${ri} Ω, td ${td * 1000} ms)`,
    family: 'load-dump',
    openCircuitV: us,
    sourceOhm: ri,
    modelOhm: ri,
    // td is taken as the decay to half value; the standard measures it longer (to 10 %), so the energy is overstated.
    waveform: { riseS: 10e-3, decayS: td },
    shortCircuitA: us / ri,
    source: ISO_16750_2,
    note: 'Worst corner of the standard ranges. Pulse-power scaling is not reliable at hundreds of milliseconds: use the part\'s load-dump rating.',
    range: { usV, riOhm, tdS },
  };
}

export const SURGE_PRESETS: readonly SurgePreset[] = [
  ...combinationWave,
  ...esd,
  loadDump('12v', [79, 101], [0.5, 4], [0.04, 0.4]),
  loadDump('24v', [151, 202], [1, 8], [0.1, 0.35]),
];

export const SURGE_PRESET_IDS = SURGE_PRESETS.map((p) => p.id) as [string, ...string[]];

export function findSurgePreset(id: string): SurgePreset | undefined {
  return SURGE_PRESETS.find((p) => p.id === id);
}
