import type { z } from 'zod';
import { quantitySchema } from '../../units/quantity-schema.js';
import { q } from '../derivation.js';
import { checkMinMax, requiredQuantity } from './common-limits.js';

/** The input, output and frequency every switching-converter role asks for (built with the role's schema). */
export const converterShape = () => ({
  vin_min: requiredQuantity('voltage', { positive: true }),
  vin_max: requiredQuantity('voltage', { positive: true }),
  vout: requiredQuantity('voltage', { positive: true }),
  vout_max: quantitySchema('voltage', { positive: true }).optional(),
  iout: requiredQuantity('current', { positive: true }),
  frequency: requiredQuantity('frequency', { positive: true }),
});

interface ConverterRanges {
  readonly vin_min: number;
  readonly vin_max: number;
  readonly vout: number;
  readonly vout_max?: number | undefined;
  readonly ambient_min: number;
  readonly ambient_max: number;
}

/** A minimum above its maximum, for the input and the ambient of any converter role. */
export function checkConverterRanges(ctx: z.RefinementCtx, c: ConverterRanges & Record<string, unknown>): void {
  checkMinMax(ctx, c, 'vin_min', 'vin_max', 'voltage');
  checkMinMax(ctx, c, 'ambient_min', 'ambient_max', 'temperature');
}

/** An over-voltage level below the regulated output is a typing error. */
export function checkVoutMax(ctx: z.RefinementCtx, c: ConverterRanges): void {
  if (c.vout_max !== undefined && c.vout_max < c.vout) {
    ctx.addIssue({ code: 'custom', path: ['vout_max'], message: `vout_max ${q(c.vout_max, 'voltage')} is below vout ${q(c.vout, 'voltage')}` });
  }
}
