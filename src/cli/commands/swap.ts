import { findPart, replacementCandidates } from '../../catalog/index.js';
import type { Part } from '../../parts/index.js';
import { checkSubstitution, rankReplacements, type RankedReplacement, type SubstitutionCheck } from '../../selection/substitution/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { runSolve } from './solve.js';
import { findPolicy } from '../../circuits/derating.js';
import { teamPolicies } from './team-policies.js';

export interface SwapOptions extends CatalogOptions {
  readonly design?: string;
  readonly ref?: string;
  readonly find?: boolean;
  readonly top?: string;
}

/** The circuit to judge parts in, when --design and --ref are given. */
function circuitFor(options: SwapOptions) {
  if (!options.design && !options.ref) return undefined;
  if (!options.design || !options.ref) throw new UsageError('--design and --ref go together', 'give both, e.g. --design board.yaml --ref D3');
  const solved = runSolve(options.design, options.ref, options);
  if (!solved.result.ok) throw new UsageError(`${options.ref} has no feasible design: ${solved.result.infeasible.reason}`, `run headroom solve ${options.design} --ref ${options.ref}`);
  const policy = findPolicy(solved.policy, teamPolicies(options))!;
  return { position: solved.result.position, policy, ref: solved.ref, design: solved.design };
}

export type SwapOutcome =
  | { readonly mode: 'check'; readonly design?: string; readonly ref?: string; readonly check: SubstitutionCheck }
  | { readonly mode: 'find'; readonly design?: string; readonly ref?: string; readonly original: Part; readonly replacements: readonly RankedReplacement[]; readonly considered: number };

export function runSwap(originalRef: string, alternateRef: string | undefined, options: SwapOptions): SwapOutcome {
  if (options.find && alternateRef) throw new UsageError('give an alternate part or --find, not both', 'headroom swap ORIGINAL ALTERNATE, or headroom swap ORIGINAL --find');
  if (!options.find && !alternateRef) throw new UsageError('which alternate?', 'headroom swap ORIGINAL ALTERNATE, or --find to list possible replacements');
  const circuit = circuitFor(options);
  const where = circuit ? { design: circuit.design, ref: circuit.ref } : {};
  return withCatalog(options, (catalog) => {
    const original = findPart(catalog, originalRef);
    if (alternateRef) {
      const alternate = findPart(catalog, alternateRef);
      if (alternate.manufacturer.toLowerCase() === original.manufacturer.toLowerCase() && alternate.partNumber.toLowerCase() === original.partNumber.toLowerCase()) {
        throw new UsageError('the original and the alternate are the same part', 'name a different alternate, or use --find');
      }
      return { mode: 'check', ...where, check: checkSubstitution(original, alternate, circuit) };
    }
    const candidates = replacementCandidates(catalog, original);
    const top = Math.max(1, Number(options.top ?? 10) || 10);
    return { mode: 'find', ...where, original, replacements: rankReplacements(original, candidates, circuit).slice(0, top), considered: candidates.length };
  });
}
