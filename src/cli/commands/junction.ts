import { estimateJunction, type JunctionEstimate } from '../../circuits/junction-estimate.js';
import { UsageError } from '../cli-error.js';

export interface JunctionOptions {
  readonly doping?: string;
  readonly gradient?: string;
  readonly bandgap?: string;
}

/** Breakdown voltage, critical field and depletion width from doping (Sze–Gibbons). */
export function runJunction(options: JunctionOptions): JunctionEstimate {
  const input: Record<string, unknown> = { profile: options.gradient ? 'graded' : 'abrupt' };
  if (options.doping) input.doping_cm3 = options.doping;
  if (options.gradient) input.gradient_cm4 = options.gradient;
  if (options.bandgap !== undefined) input.bandgap_ev = Number(options.bandgap);
  const r = estimateJunction(input);
  if (!r.ok) {
    throw new UsageError('cannot estimate the junction', 'give --doping 1e16 (cm⁻³, abrupt junction) or --gradient 1e20 (cm⁻⁴, graded)', r.issues.map((i) => `${i.field || 'input'}: ${i.message}`));
  }
  return r.estimate;
}
