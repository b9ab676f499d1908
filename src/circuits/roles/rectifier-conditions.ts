import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, checkMinMax, requiredQuantity } from './common-limits.js';
import { lazySchema } from './lazy-schema.js';

export const RECTIFIER_CONFIGURATIONS = ['half-wave', 'centre-tap', 'bridge'] as const;

const configurationText = RECTIFIER_CONFIGURATIONS.join(', ');

export const rectifierSchema = lazySchema(() =>
  z
    .object({
      configuration: z.enum(RECTIFIER_CONFIGURATIONS, {
        error: (issue) => (issue.input === undefined ? `required condition is missing: one of ${configurationText}` : `expected one of ${configurationText}`),
      }),
      v_secondary_rms: requiredQuantity('voltage', { positive: true }),
      line_tolerance: quantitySchema('ratio', { min: 0, max: 0.5 }).default(0.1),
      frequency: quantitySchema('frequency', { positive: true }).default(50),
      load_current: requiredQuantity('current', { positive: true }),
      capacitance: quantitySchema('capacitance', { positive: true }).optional(),
      ripple_max: quantitySchema('voltage', { positive: true }).optional(),
      diode_drop: quantitySchema('voltage', { nonNegative: true, max: 5 }).default(1),
      source_resistance: quantitySchema('resistance', { nonNegative: true }).default(0.5),
      capacitor_esr: quantitySchema('resistance', { nonNegative: true }).default(0.05),
      inrush_limiter: quantitySchema('resistance', { nonNegative: true }).default(0),
      line_surge_peak: quantitySchema('voltage', { positive: true }).optional(),
      is_mains_connected: z.boolean({ error: 'expected true or false' }).default(false),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      if (c.capacitance === undefined && c.ripple_max === undefined) {
        ctx.addIssue({ code: 'custom', path: ['capacitance'], message: 'give capacitance (the filter capacitor) or ripple_max (the ripple you accept); neither is set' });
      }
      if (c.source_resistance + c.capacitor_esr + c.inrush_limiter <= 0) {
        ctx.addIssue({
          code: 'custom',
          path: ['source_resistance'],
          message: 'source_resistance, capacitor_esr and inrush_limiter add up to 0 Ω, so nothing limits the switch-on inrush; give the winding and line resistance',
        });
      }
    }),
);

export type RectifierConditions = z.output<ReturnType<typeof rectifierSchema>>;

export const RECTIFIER_INPUTS: readonly RoleInput[] = [
  { name: 'configuration', label: 'Configuration', choices: RECTIFIER_CONFIGURATIONS, help: 'half-wave (one diode), centre-tap (two diodes, centre-tapped winding) or bridge (four diodes)' },
  { name: 'v_secondary_rms', label: 'Source voltage (rms)', quantity: 'voltage', help: 'nominal rms voltage feeding the rectifier: the secondary, per half-winding for centre-tap, or the mains itself for a bridge on the line' },
  { name: 'line_tolerance', label: 'High-line tolerance', quantity: 'ratio', default: '10 %', help: 'how far the source rises above nominal; every result uses the high line' },
  { name: 'frequency', label: 'Line frequency', quantity: 'frequency', default: '50 Hz', help: 'frequency of the AC source' },
  { name: 'load_current', label: 'Load current', quantity: 'current', help: 'highest DC current drawn from the filter capacitor' },
  { name: 'capacitance', label: 'Filter capacitor', quantity: 'capacitance', help: 'the reservoir capacitor; give this or ripple_max (with both, the ripple is checked against ripple_max)' },
  { name: 'ripple_max', label: 'Ripple target', quantity: 'voltage', help: 'peak-to-peak ripple you accept; without capacitance the smallest capacitor for it is computed' },
  { name: 'diode_drop', label: 'Forward drop per diode', quantity: 'voltage', default: '1 V', help: 'assumed VF of each conducting diode at its peak current' },
  { name: 'source_resistance', label: 'Source resistance', quantity: 'resistance', default: '0.5 Ω', help: 'winding plus wiring resistance, limits the switch-on inrush' },
  { name: 'capacitor_esr', label: 'Capacitor ESR', quantity: 'resistance', default: '0.05 Ω', help: 'equivalent series resistance of the filter capacitor' },
  { name: 'inrush_limiter', label: 'Inrush limiter', quantity: 'resistance', default: '0 Ω', help: 'cold resistance of an NTC or series resistor, if fitted' },
  { name: 'line_surge_peak', label: 'Line surge peak', quantity: 'voltage', help: 'highest instantaneous source voltage during a surge (e.g. the MOV clamp voltage), per half-winding for centre-tap; raises the worst reverse voltage' },
  { name: 'is_mains_connected', label: 'On the mains', choices: ['true', 'false'], default: 'false', help: 'true when the rectifier sits directly on the mains (no transformer)' },
  ...AMBIENT_INPUTS,
];
