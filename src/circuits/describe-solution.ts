import { formatQuantity, formatWaveform, type QuantityKind } from '../units/index.js';
import type { Limit, OperatingPoint } from './limits.js';

/** Labels and quantities of operating-point fields, in the order people read them. */
const OPERATING_FIELDS: readonly [keyof OperatingPoint, string, QuantityKind][] = [
  ['reversePeakV', 'Reverse voltage, peak', 'voltage'],
  ['reverseWorkingV', 'Reverse voltage, working', 'voltage'],
  ['reverseDuty', 'Reverse duty', 'ratio'],
  ['forwardAvgA', 'Forward current, average', 'current'],
  ['forwardRmsA', 'Forward current, RMS', 'current'],
  ['forwardPeakA', 'Forward current, peak', 'current'],
  ['forwardRepetitivePeakA', 'Forward current, repetitive peak', 'current'],
  ['surgeA', 'Surge current', 'current'],
  ['surgePulseS', 'Surge duration', 'time'],
  ['forwardDuty', 'Forward duty', 'ratio'],
  ['switchingFrequencyHz', 'Switching frequency', 'frequency'],
  ['switchingVoltageV', 'Voltage at turn-off', 'voltage'],
  ['zenerCurrentMinA', 'Zener current, minimum', 'current'],
  ['zenerCurrentMaxA', 'Zener current, maximum', 'current'],
  ['rthJaOverrideKPerW', 'Board RθJA (given)', 'thermal-resistance'],
];

export interface DescribedValue {
  readonly label: string;
  readonly value: string;
}

/** The operating point as label/value rows for any printer or screen. */
export function describeOperatingPoint(op: OperatingPoint): DescribedValue[] {
  const rows: DescribedValue[] = [
    { label: 'Ambient', value: `${formatQuantity(op.ambientMinK, 'temperature')} … ${formatQuantity(op.ambientMaxK, 'temperature')}` },
  ];
  for (const [key, label, kind] of OPERATING_FIELDS) {
    const value = op[key];
    if (typeof value === 'number') rows.push({ label, value: formatQuantity(value, kind) });
  }
  if (op.surge) {
    const s = op.surge;
    rows.push(
      { label: 'Surge source', value: `${formatQuantity(s.openCircuitV, 'voltage')} open circuit behind ${formatQuantity(s.sourceOhm, 'resistance')}` },
      { label: 'Surge waveform', value: formatWaveform(s.waveform) },
      { label: 'Protected circuit withstands', value: formatQuantity(s.withstandV, 'voltage') },
      { label: 'Working voltage', value: formatQuantity(s.workingV, 'voltage') },
    );
  }
  return rows;
}

/** "VRRM ≥ 40.0 V" or, for a margin below the part's own Tj max, "Tj ≤ Tj max − 25.0 K". */
export function describeBound(limit: Limit): string {
  const relation = limit.check.relation === 'at-least' ? '≥' : '≤';
  const bound = formatQuantity(limit.bound, limit.quantity);
  if (limit.check.kind === 'computed' && limit.check.what === 'junction-temperature' && limit.quantity === 'temperature-difference') {
    return `${limit.label} ≤ Tj max − ${bound}`;
  }
  return `${limit.label} ${relation} ${bound}`;
}
