import { z } from 'zod';
import { parseWaveform, type Waveform } from '../../units/index.js';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleDefinition, RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, requiredQuantity, checkMinMax } from './common-limits.js';
import { SURGE_PRESET_IDS } from './transient-clamp-presets.js';
import { solveTransientClamp } from './transient-clamp-solve.js';
import { lazySchema } from './lazy-schema.js';

/** "8/20 µs" → {riseS, decayS}; the parser's own message names the accepted form. */
const waveformSchema = () => z.string({ error: 'expected a surge waveform as text such as "8/20 µs"' }).transform((text, ctx): Waveform => {
  const parsed = parseWaveform(text);
  if (!parsed.ok) {
    ctx.addIssue({ code: 'custom', message: parsed.issue.message, input: text });
    return z.NEVER;
  }
  return parsed.value;
});

const EXPLICIT = ['open_circuit_voltage', 'source_impedance', 'waveform'] as const;

export const transientClampSchema = lazySchema(() =>
  z
    .object({
      working_max: requiredQuantity('voltage', { positive: true }),
      withstand: requiredQuantity('voltage', { positive: true }),
      polarity: z.enum(['uni', 'bi']).default('uni'),
      surge: z.enum(SURGE_PRESET_IDS, { error: `unknown surge preset; one of ${SURGE_PRESET_IDS.join(', ')}` }).optional(),
      open_circuit_voltage: quantitySchema('voltage', { positive: true }).optional(),
      source_impedance: quantitySchema('resistance', { positive: true }).optional(),
      waveform: waveformSchema().optional(),
      standoff_margin: quantitySchema('ratio', { nonNegative: true, max: 0.5 }).default(0.05),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      const given = EXPLICIT.filter((key) => c[key] !== undefined);
      if (c.surge !== undefined && given.length > 0) {
        ctx.addIssue({ code: 'custom', path: [given[0]!], message: `give either surge (a preset) or ${EXPLICIT.join(', ')}, not both` });
      } else if (c.surge === undefined && given.length === 0) {
        ctx.addIssue({ code: 'custom', path: ['surge'], message: `a surge is required: a preset such as iec61000-4-5-1kv-line, or ${EXPLICIT.join(', ')}` });
      } else if (c.surge === undefined) {
        for (const key of EXPLICIT.filter((k) => c[k] === undefined)) {
          ctx.addIssue({ code: 'custom', path: [key], message: `${key} is required with ${given.join(', ')}` });
        }
      }
    }),
);

export type TransientClampConditions = z.output<ReturnType<typeof transientClampSchema>>;

const inputs: readonly RoleInput[] = [
  { name: 'working_max', label: 'Working voltage, maximum', quantity: 'voltage', help: 'highest continuous voltage across the clamp, tolerance and ripple peak included (peak, not rms, on AC lines)' },
  { name: 'withstand', label: 'Protected circuit withstand', quantity: 'voltage', help: 'highest voltage the protected circuit survives (its absolute maximum rating)' },
  { name: 'polarity', label: 'Polarity', choices: ['uni', 'bi'], default: 'uni', help: 'uni for a DC line of one polarity; bi for AC or bipolar signals' },
  { name: 'surge', label: 'Surge preset', choices: SURGE_PRESET_IDS, help: 'a standard surge (IEC 61000-4-5, IEC 61000-4-2, ISO 16750-2); or give open_circuit_voltage, source_impedance and waveform' },
  { name: 'open_circuit_voltage', label: 'Surge open-circuit voltage', quantity: 'voltage', help: 'peak voltage of the surge source unloaded' },
  { name: 'source_impedance', label: 'Surge source impedance', quantity: 'resistance', help: 'generator plus coupling impedance, e.g. "2 Ω"' },
  { name: 'waveform', label: 'Surge current waveform', help: 'rise/decay to half value, e.g. "8/20 µs" or "10/1000 µs"' },
  { name: 'standoff_margin', label: 'Stand-off margin', quantity: 'ratio', default: '5 %', help: 'VRWM above working_max; MIL-HDBK-419A asks 5 %' },
  ...AMBIENT_INPUTS,
];

export const transientClampRole: RoleDefinition<ReturnType<typeof transientClampSchema>> = {
  id: 'transient-clamp',
  title: 'Transient voltage suppressor (TVS)',
  summary: 'A TVS across a line: stand-off above the working voltage, clamp below the withstand at the surge current, pulse power to survive it.',
  inputs,
  get schema() {
    return transientClampSchema();
  },
  solve: solveTransientClamp,
};
