import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape } from './common-limits.js';
import { checkConverterRanges, checkVoutMax, converterShape } from './converter-conditions.js';
import { lazySchema } from './lazy-schema.js';

export const FLYBACK_MODES = ['ccm', 'dcm'] as const;

const turns = (what: string) =>
  z.number({ error: `expected ${what} as a plain number` }).positive({ error: `expected a positive number for ${what}` }).optional();

export const flybackOutputSchema = lazySchema(() =>
  z
    .object({
      ...converterShape(),
      turns_ratio_ns_np: turns('the turns ratio Ns/Np'),
      ns: turns('the secondary turns ns'),
      np: turns('the primary turns np'),
      mode: z.enum(FLYBACK_MODES, { error: 'expected ccm or dcm' }).default('ccm'),
      primary_inductance: quantitySchema('inductance', { positive: true }).optional(),
      ripple_fraction: quantitySchema('ratio', { min: 0.01, max: 1.5 }).default(0.3),
      diode_drop: quantitySchema('voltage', { nonNegative: true, max: 5 }).default(0.7),
      spike_allowance: quantitySchema('ratio', { min: 0, max: 2 }).default(0.3),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkConverterRanges(ctx, c);
      checkVoutMax(ctx, c);
      const hasPair = c.ns !== undefined || c.np !== undefined;
      if (c.turns_ratio_ns_np === undefined && !hasPair) {
        ctx.addIssue({ code: 'custom', path: ['turns_ratio_ns_np'], message: 'required condition is missing: give turns_ratio_ns_np (e.g. 0.25), or ns and np' });
      } else if (c.turns_ratio_ns_np !== undefined && hasPair) {
        ctx.addIssue({ code: 'custom', path: ['turns_ratio_ns_np'], message: 'give turns_ratio_ns_np or ns and np, not both' });
      } else if (hasPair && (c.ns === undefined || c.np === undefined)) {
        ctx.addIssue({ code: 'custom', path: [c.ns === undefined ? 'ns' : 'np'], message: 'ns and np go together: give both turn counts' });
      }
      if (c.mode === 'dcm' && c.primary_inductance === undefined) {
        ctx.addIssue({ code: 'custom', path: ['primary_inductance'], message: 'mode dcm needs primary_inductance: the peak current follows from the energy stored each cycle' });
      }
    }),
);

export type FlybackOutputConditions = z.output<ReturnType<typeof flybackOutputSchema>>;

export const FLYBACK_OUTPUT_INPUTS: readonly RoleInput[] = [
  { name: 'vin_min', label: 'Lowest input voltage', quantity: 'voltage', help: 'lowest DC input (bus valley) at full load' },
  { name: 'vin_max', label: 'Highest input voltage', quantity: 'voltage', help: 'highest DC input, e.g. 375 V for 265 V AC rectified' },
  { name: 'vout', label: 'Output voltage', quantity: 'voltage', help: 'regulated output' },
  { name: 'vout_max', label: 'Highest output voltage', quantity: 'voltage', default: 'vout', help: 'over-voltage protection level; the diode blocks it plus the reflected input' },
  { name: 'iout', label: 'Output current', quantity: 'current', help: 'highest load current of this output' },
  { name: 'frequency', label: 'Switching frequency', quantity: 'frequency', help: 'converter switching frequency' },
  { name: 'turns_ratio_ns_np', label: 'Turns ratio Ns/Np', help: 'secondary over primary turns as a plain number, e.g. 0.25 for 1:4; or give ns and np' },
  { name: 'ns', label: 'Secondary turns', help: 'with np, instead of turns_ratio_ns_np' },
  { name: 'np', label: 'Primary turns', help: 'with ns, instead of turns_ratio_ns_np' },
  { name: 'mode', label: 'Conduction mode', choices: FLYBACK_MODES, default: 'ccm', help: 'ccm (continuous) or dcm (discontinuous; needs primary_inductance)' },
  { name: 'primary_inductance', label: 'Primary (magnetising) inductance', quantity: 'inductance', help: 'sets the ripple in ccm and the peak in dcm' },
  { name: 'ripple_fraction', label: 'Ripple fraction', quantity: 'ratio', default: '30 %', help: 'secondary ripple as a fraction of its average during conduction, ccm without primary_inductance' },
  { name: 'diode_drop', label: 'Diode forward drop', quantity: 'voltage', default: '0.7 V', help: 'assumed VF, added to the output in the duty cycle and the power' },
  { name: 'spike_allowance', label: 'Spike allowance', quantity: 'ratio', default: '30 %', help: 'added to the reverse voltage for the leakage-inductance spike and ringing' },
  ...AMBIENT_INPUTS,
];
