import { z } from 'zod';
import { formatQuantity } from '../../units/index.js';
import { quantitySchema } from '../../units/quantity-schema.js';
import type { RoleDefinition, RoleInput } from '../role.js';
import { AMBIENT_INPUTS, ambientShape, checkMinMax, requireTogether, requiredQuantity } from './common-limits.js';
import { solveZenerRegulator } from './zener-regulator-solve.js';
import { lazySchema } from './lazy-schema.js';

const positiveVoltage = { positive: true } as const;
/** Tolerances above 20 % are typos (5 written as 5 instead of 5 %); the series stop at 20 %. */
const tolerance = () => quantitySchema('ratio', { nonNegative: true, max: 0.2 });

export const zenerRegulatorSchema = lazySchema(() =>
  z
    .object({
      vin_min: requiredQuantity('voltage', positiveVoltage),
      vin_max: requiredQuantity('voltage', positiveVoltage),
      vz: requiredQuantity('voltage', positiveVoltage),
      tolerance: tolerance().default(0.05),
      // Zener tempcos stay within about ±0.1 %/K; ±0.2 %/K catches unit slips (mV/K typed as %/K).
      tempco: quantitySchema('tempco', { min: -2e-3, max: 2e-3 }).optional(),
      load_min: quantitySchema('current', { nonNegative: true }).default(0),
      load_max: requiredQuantity('current', { nonNegative: true }),
      iz_min: quantitySchema('current', { positive: true }).default(1e-3),
      resistor_tolerance: tolerance().default(0.05),
      resistor: quantitySchema('resistance', { positive: true }).optional(),
      zzt: quantitySchema('resistance', { nonNegative: true }).optional(),
      vout_min: quantitySchema('voltage', positiveVoltage).optional(),
      vout_max: quantitySchema('voltage', positiveVoltage).optional(),
      ...ambientShape(),
    })
    .strict()
    .superRefine((c, ctx) => {
      checkMinMax(ctx, c, 'vin_min', 'vin_max', 'voltage');
      checkMinMax(ctx, c, 'load_min', 'load_max', 'current');
      checkMinMax(ctx, c, 'vout_min', 'vout_max', 'voltage');
      checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
      requireTogether(ctx, c, 'vout_min', 'vout_max', 'give the allowed output window as both');
      if (c.vout_min !== undefined && c.vout_max !== undefined && (c.vz < c.vout_min || c.vz > c.vout_max)) {
        const v = (x: number) => formatQuantity(x, 'voltage');
        ctx.addIssue({ code: 'custom', path: ['vz'], message: `vz ${v(c.vz)} is outside the window vout_min ${v(c.vout_min)} … vout_max ${v(c.vout_max)}` });
      }
    }),
);

export type ZenerRegulatorConditions = z.output<ReturnType<typeof zenerRegulatorSchema>>;

const inputs: readonly RoleInput[] = [
  { name: 'vin_min', label: 'Input, minimum', quantity: 'voltage', help: 'lowest voltage feeding the series resistor' },
  { name: 'vin_max', label: 'Input, maximum', quantity: 'voltage', help: 'highest voltage feeding the series resistor' },
  { name: 'vz', label: 'Zener voltage, nominal', quantity: 'voltage', help: 'nominal VZ at 25 °C; Zener voltages follow the E24 series (IEC 60063)' },
  { name: 'tolerance', label: 'VZ tolerance', quantity: 'ratio', default: '5 %', help: 'the Zener tolerance band the design must work with' },
  { name: 'tempco', label: 'VZ tempco', quantity: 'tempco', help: "datasheet αVZ, e.g. \"0.06 %/K\"; without it only the sign is estimated and drift is left out of the window" },
  { name: 'load_min', label: 'Load current, minimum', quantity: 'current', default: '0 A', help: 'lightest load in parallel with the Zener (0 A: no load, the worst case for the Zener)' },
  { name: 'load_max', label: 'Load current, maximum', quantity: 'current', help: 'heaviest load in parallel with the Zener; 0 A for a reference feeding a high-impedance input' },
  { name: 'iz_min', label: 'Zener current, minimum', quantity: 'current', default: '1 mA', help: 'least current that keeps the Zener regulating; about 10 % of IZT once a part is known' },
  { name: 'resistor_tolerance', label: 'Resistor tolerance', quantity: 'ratio', default: '5 %', help: 'tolerance of the series resistor' },
  { name: 'resistor', label: 'Series resistor, given', quantity: 'resistance', help: 'analyse an existing design with this resistor instead of choosing one' },
  { name: 'zzt', label: 'Zener dynamic resistance', quantity: 'resistance', help: 'typical ZZT, for line and load regulation; left out when unknown' },
  { name: 'vout_min', label: 'Output, lowest allowed', quantity: 'voltage', help: 'with vout_max: the window every part must keep VZ inside over tolerance and temperature' },
  { name: 'vout_max', label: 'Output, highest allowed', quantity: 'voltage', help: 'with vout_min: the window every part must keep VZ inside over tolerance and temperature' },
  ...AMBIENT_INPUTS,
];

export const zenerRegulatorRole: RoleDefinition<ReturnType<typeof zenerRegulatorSchema>> = {
  id: 'zener-regulator',
  title: 'Zener shunt regulator or reference',
  summary: 'A Zener fed through a series resistor: sizes the resistor, the Zener current range and power, and the VZ window.',
  inputs,
  get schema() {
    return zenerRegulatorSchema();
  },
  solve: solveZenerRegulator,
};
