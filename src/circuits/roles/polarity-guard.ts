import { z } from 'zod';
import { formatQuantity } from '../../units/index.js';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleDefinition, RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, checkMinMax, requireTogether, requiredQuantity } from './common-limits.js';
import { solvePolarityGuard } from './polarity-guard-solve.js';
import { lazySchema } from './lazy-schema.js';

const voltage = () => quantitySchema('voltage', { positive: true });
const current = () => quantitySchema('current', { positive: true });

export const polarityGuardSchema = lazySchema(() =>
  z
    .object({
      mode: z.enum(['series', 'oring']).default('series'),
      supply_max: requiredQuantity('voltage', { positive: true }),
      reverse_max: voltage().optional(),
      other_source_max: voltage().optional(),
      load_max: requiredQuantity('current', { positive: true }),
      load_peak: current().optional(),
      peak_duration: quantitySchema('time', { positive: true }).optional(),
      drop_max: voltage().optional(),
      dissipation_max: quantitySchema('power', { positive: true }).optional(),
      leakage_max: current().optional(),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      const fail = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      if (c.load_peak !== undefined && c.load_peak < c.load_max) {
        fail('load_peak', `load_peak ${formatQuantity(c.load_peak, 'current')} is below load_max ${formatQuantity(c.load_max, 'current')}`);
      }
      requireTogether(ctx, c, 'load_peak', 'peak_duration');
      if (c.mode === 'oring' && c.other_source_max === undefined) fail('other_source_max', 'other_source_max is required for mode: oring');
      if (c.mode === 'series' && c.other_source_max !== undefined) fail('other_source_max', 'other_source_max applies only to mode: oring');
    }),
);

export type PolarityGuardConditions = z.output<ReturnType<typeof polarityGuardSchema>>;

const inputs: readonly RoleInput[] = [
  { name: 'mode', label: 'Mode', choices: ['series', 'oring'], default: 'series', help: 'series: reverse-polarity guard in the supply feed; oring: one diode of a diode-OR of two sources' },
  { name: 'supply_max', label: 'Supply, maximum', quantity: 'voltage', help: 'highest continuous supply voltage at this input' },
  { name: 'reverse_max', label: 'Reverse voltage when connected backwards', quantity: 'voltage', default: 'supply_max (series); none (oring)', help: 'magnitude of the voltage when the supply is connected reversed (a reversed surge clamped by a TVS, if that is worse); in oring mode it adds to other_source_max' },
  { name: 'other_source_max', label: 'Other source, maximum', quantity: 'voltage', help: 'oring only: highest voltage of the other source on the common bus' },
  { name: 'load_max', label: 'Load current, maximum', quantity: 'current', help: 'continuous load current through the diode' },
  { name: 'load_peak', label: 'Load current, peak', quantity: 'current', help: 'non-repetitive peak (power-up inrush, stall); give peak_duration with it' },
  { name: 'peak_duration', label: 'Peak duration', quantity: 'time', help: 'how long load_peak lasts, e.g. "5 ms"' },
  { name: 'drop_max', label: 'Forward-drop budget', quantity: 'voltage', help: 'largest VF allowed at load_max over the temperature range' },
  { name: 'dissipation_max', label: 'Dissipation budget', quantity: 'power', help: 'largest loss the board may take in this diode' },
  { name: 'leakage_max', label: 'Leakage budget', quantity: 'current', help: 'largest reverse leakage at the hot junction (oring: current back-fed into the other source)' },
  ...AMBIENT_INPUTS,
];

export const polarityGuardRole: RoleDefinition<ReturnType<typeof polarityGuardSchema>> = {
  id: 'polarity-guard',
  title: 'Reverse-polarity guard or OR-ing diode',
  summary: 'A diode in series with a supply: blocks a reversed supply, or ORs two sources onto one bus.',
  inputs,
  get schema() {
    return polarityGuardSchema();
  },
  solve: solvePolarityGuard,
};
