import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import { q } from '../derivation.js';
import type { RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape } from './common-limits.js';
import { checkConverterRanges, checkVoutMax, converterShape } from './converter-conditions.js';
import { lazySchema } from './lazy-schema.js';

export const boostOutputSchema = lazySchema(() =>
  z
    .object({
      ...converterShape(),
      inductance: quantitySchema('inductance', { positive: true }).optional(),
      ripple_fraction: quantitySchema('ratio', { min: 0.01, max: 1.5 }).default(0.3),
      ringing_allowance: quantitySchema('ratio', { min: 0, max: 2 }).default(0.2),
      output_capacitance: quantitySchema('capacitance', { positive: true }).optional(),
      source_resistance: quantitySchema('resistance', { positive: true }).optional(),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkConverterRanges(ctx, c);
      if (c.vin_max > c.vout) {
        ctx.addIssue({ code: 'custom', path: ['vin_max'], message: `vin_max ${q(c.vin_max, 'voltage')} is above vout ${q(c.vout, 'voltage')}: a boost converter cannot regulate below its input` });
      }
      checkVoutMax(ctx, c);
      if (c.output_capacitance !== undefined && c.inductance === undefined && c.source_resistance === undefined) {
        ctx.addIssue({ code: 'custom', path: ['output_capacitance'], message: 'output_capacitance needs inductance or source_resistance to bound the start-up inrush' });
      }
    }),
);

export type BoostOutputConditions = z.output<ReturnType<typeof boostOutputSchema>>;

export const BOOST_OUTPUT_INPUTS: readonly RoleInput[] = [
  { name: 'vin_min', label: 'Lowest input voltage', quantity: 'voltage', help: 'lowest input at which the converter must deliver full load' },
  { name: 'vin_max', label: 'Highest input voltage', quantity: 'voltage', help: 'highest continuous input, not above vout' },
  { name: 'vout', label: 'Output voltage', quantity: 'voltage', help: 'regulated output' },
  { name: 'vout_max', label: 'Highest output voltage', quantity: 'voltage', default: 'vout', help: 'over-voltage protection level or highest output; the diode blocks it' },
  { name: 'iout', label: 'Output current', quantity: 'current', help: 'highest load current' },
  { name: 'frequency', label: 'Switching frequency', quantity: 'frequency', help: 'converter switching frequency' },
  { name: 'inductance', label: 'Inductance', quantity: 'inductance', help: 'boost inductor; without it ripple_fraction is used' },
  { name: 'ripple_fraction', label: 'Ripple fraction', quantity: 'ratio', default: '30 %', help: 'inductor ripple as a fraction of the inductor current, used when no inductance is given' },
  { name: 'ringing_allowance', label: 'Ringing allowance', quantity: 'ratio', default: '20 %', help: 'added to vout_max for ringing and overshoot' },
  { name: 'output_capacitance', label: 'Output capacitor', quantity: 'capacitance', help: 'for the start-up inrush through the diode; needs inductance or source_resistance' },
  { name: 'source_resistance', label: 'Source resistance', quantity: 'resistance', help: 'input source, wiring and inductor resistance, bounds the start-up inrush' },
  ...AMBIENT_INPUTS,
];
