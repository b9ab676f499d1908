import { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, checkMinMax, requiredQuantity } from './common-limits.js';
import { lazySchema } from './lazy-schema.js';

export const coilFreewheelSchema = lazySchema(() =>
  z
    .object({
      supply_max: requiredQuantity('voltage', { positive: true }),
      coil_resistance: requiredQuantity('resistance', { positive: true }),
      coil_inductance: requiredQuantity('inductance', { positive: true }),
      coil_current: quantitySchema('current', { positive: true }).optional(),
      zener_clamp: quantitySchema('voltage', { nonNegative: true }).default(0),
      diode_drop: quantitySchema('voltage', { positive: true, max: 5 }).default(0.7),
      pwm_frequency: quantitySchema('frequency', { positive: true }).optional(),
      duty_min: quantitySchema('ratio', { min: 0, max: 1 }).optional(),
      duty_max: quantitySchema('ratio', { min: 0, max: 1 }).optional(),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      checkMinMax(ctx, c, 'duty_min', 'duty_max', 'ratio');
      for (const key of ['duty_min', 'duty_max'] as const) {
        if (c[key] !== undefined && c.pwm_frequency === undefined) {
          ctx.addIssue({ code: 'custom', path: [key], message: `${key} needs pwm_frequency: duty only applies to a PWM-driven coil` });
        }
      }
    }),
);

export type CoilFreewheelConditions = z.output<ReturnType<typeof coilFreewheelSchema>>;

export const COIL_FREEWHEEL_INPUTS: readonly RoleInput[] = [
  { name: 'supply_max', label: 'Highest supply voltage', quantity: 'voltage', help: 'highest voltage across the coil when it is on; the diode blocks it' },
  { name: 'coil_resistance', label: 'Coil resistance', quantity: 'resistance', help: 'DC resistance of the coil (lowest, i.e. cold, for the highest current)' },
  { name: 'coil_inductance', label: 'Coil inductance', quantity: 'inductance', help: 'inductance of the coil (relay, solenoid, valve or motor winding)' },
  { name: 'coil_current', label: 'Coil current', quantity: 'current', default: 'supply_max / coil_resistance', help: 'current when energised, if set otherwise: a motor at its current limit, a current-regulated coil' },
  { name: 'zener_clamp', label: 'Series Zener voltage', quantity: 'voltage', default: '0 V', help: 'Zener in series with the diode for a faster release; 0 for a plain diode' },
  { name: 'diode_drop', label: 'Diode forward drop', quantity: 'voltage', default: '0.7 V', help: 'assumed VF during the decay' },
  { name: 'pwm_frequency', label: 'PWM frequency', quantity: 'frequency', help: 'for a PWM-driven coil or motor; leave out for on/off switching' },
  { name: 'duty_min', label: 'Lowest PWM duty', quantity: 'ratio', default: '0 %', help: 'lowest duty cycle in use, with pwm_frequency' },
  { name: 'duty_max', label: 'Highest PWM duty', quantity: 'ratio', default: '100 %', help: 'highest duty cycle in use, with pwm_frequency' },
  ...AMBIENT_INPUTS,
];
