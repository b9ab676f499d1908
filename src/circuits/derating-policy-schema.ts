import { z } from 'zod';
import type { DeratingPolicy } from './derating.js';

// Apart from derating.ts so that reading policies (every ranking) never loads the validation
// library; only saving a team's policy validates it.

const factorSchema = z.object({
  value: z.number().gt(0).max(1),
  source: z.string().trim().min(1),
});

/** Schema for a team's own policy, as stored in the catalog or written in a design file. */
export const deratingPolicySchema = z.object({
  id: z.string().regex(/^[a-z0-9][a-z0-9-]*$/, 'lower-case letters, digits and hyphens, e.g. "our-automotive"'),
  name: z.string().trim().min(1),
  description: z.string().default(''),
  factors: z.object({ vrrm: factorSchema, ifAv: factorSchema, ifsm: factorSchema, pd: factorSchema, pppm: factorSchema }),
  tj: z.object({
    ceilingK: z.number().min(273.15).max(773.15).optional(),
    marginBelowMaxK: z.number().min(0).max(200),
    source: z.string().trim().min(1),
  }),
});

// Compile-time only: the schema's output must be a DeratingPolicy, so the two stay one shape.
const sameShape: (p: z.output<typeof deratingPolicySchema>) => DeratingPolicy = (p) => p;
void sameShape;
