import type { DeratingPolicy } from '../../circuits/derating.js';
import { findPosition, type Design, type DesignPosition } from '../../circuits/design-file.js';
import type { SolveResult } from '../../circuits/role.js';
import { solvePosition } from '../../circuits/solve-position.js';
import { UsageError } from '../cli-error.js';
import type { CatalogOptions } from '../catalog-session.js';
import { designError, loadDesign } from './design-file.js';
import { teamPolicies } from './team-policies.js';

export interface SolveOutcome {
  readonly design: string;
  readonly ref: string;
  readonly role: string;
  readonly policy: string;
  readonly result: SolveResult;
}

/** Solves one position of a design file. An infeasible design is a result (exit 1), not an error. */
export function runSolve(file: string, ref: string | undefined, options: CatalogOptions = {}): SolveOutcome {
  const design = loadDesign(file);
  return solveDesignPosition(file, design, designPosition(file, design, ref), teamPolicies(options));
}

/** The position a --ref names in a loaded design; a missing or unknown ref is a usage error. */
export function designPosition(file: string, design: Design, ref: string | undefined): DesignPosition {
  if (!ref) {
    throw new UsageError('which position? name it with --ref', `positions in ${file}: ${design.positions.map((p) => p.ref).join(', ')}`);
  }
  const position = findPosition(design, ref);
  if (!position) {
    throw new UsageError(`no position ${ref} in ${file}`, `use one of ${design.positions.map((p) => p.ref).join(', ')}`);
  }
  return position;
}

/** Solves a position of a loaded design with the team policies given. */
export function solveDesignPosition(file: string, design: Design, position: DesignPosition, policies: readonly DeratingPolicy[]): SolveOutcome {
  const outcome = solvePosition(design, position, policies);
  if (!outcome.ok) throw designError(file, outcome.issues);
  return { design: file, ref: position.ref, role: position.role, policy: outcome.policy.id, result: outcome.result };
}
