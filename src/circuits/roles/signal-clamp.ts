import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleDefinition, RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, checkMinMax, requireTogether, requiredQuantity } from './common-limits.js';
import { solveSignalClamp } from './signal-clamp-solve.js';
import { lazySchema } from './lazy-schema.js';

const positive = { positive: true } as const;

export const signalClampSchema = lazySchema(() =>
  z
    .object({
      reverse_max: requiredQuantity('voltage', positive),
      forward_peak: requiredQuantity('current', positive),
      forward_avg: quantitySchema('current', positive).optional(),
      cj_max: quantitySchema('capacitance', positive).optional(),
      source_impedance: quantitySchema('resistance', positive).optional(),
      bandwidth: quantitySchema('frequency', positive).optional(),
      trr_max: quantitySchema('time', positive).optional(),
      signal_frequency: quantitySchema('frequency', positive).optional(),
      leakage_max: quantitySchema('current', positive).optional(),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'forward_avg', 'forward_peak', 'current');
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      requireTogether(ctx, c, 'source_impedance', 'bandwidth', 'together they bound Cj');
    }),
);

export type SignalClampConditions = z.output<ReturnType<typeof signalClampSchema>>;

const inputs: readonly RoleInput[] = [
  { name: 'reverse_max', label: 'Reverse voltage, maximum', quantity: 'voltage', help: 'highest reverse voltage across the diode' },
  { name: 'forward_peak', label: 'Forward current, peak', quantity: 'current', help: 'highest current the diode conducts (clamped fault or steered signal)' },
  { name: 'forward_avg', label: 'Forward current, average', quantity: 'current', default: 'forward_peak', help: 'average forward current; without it the peak is taken as continuous (conservative)' },
  { name: 'cj_max', label: 'Capacitance, maximum', quantity: 'capacitance', help: 'largest junction capacitance the signal tolerates' },
  { name: 'source_impedance', label: 'Signal source impedance', quantity: 'resistance', help: 'with bandwidth: Cj ≤ 1/(2π·R·f3dB)' },
  { name: 'bandwidth', label: 'Signal bandwidth', quantity: 'frequency', help: 'with source_impedance: the −3 dB frequency the clamp must not pull down' },
  { name: 'trr_max', label: 'Reverse recovery, maximum', quantity: 'time', help: 'largest trr the circuit tolerates' },
  { name: 'signal_frequency', label: 'Signal frequency', quantity: 'frequency', help: 'highest switching frequency: trr ≤ 1/(20·f) [common practice]' },
  { name: 'leakage_max', label: 'Leakage, maximum', quantity: 'current', help: 'largest reverse leakage at reverse_max and the hot junction' },
  ...AMBIENT_INPUTS,
];

export const signalClampRole: RoleDefinition<ReturnType<typeof signalClampSchema>> = {
  id: 'signal-clamp',
  title: 'Small-signal clamp or steering diode',
  summary: 'A small diode that clamps an input to a rail or steers a signal: reverse voltage, current, capacitance, recovery and leakage.',
  inputs,
  get schema() {
    return signalClampSchema();
  },
  solve: solveSignalClamp,
};
