import { existsSync } from 'node:fs';
import { findPolicy } from '../../circuits/derating.js';
import type { SolveResult } from '../../circuits/role.js';
import { CatalogError } from '../../catalog/catalog-error.js';
import { findCandidates, type CandidateSearch, type PinnedPlace } from '../../catalog/candidates.js';
import { findPart } from '../../catalog/part-repository.js';
import { listTeamPolicies } from '../../catalog/policy-repository.js';
import type { Part } from '../../parts/index.js';
import { UsageError } from '../cli-error.js';
import { catalogPathFor, openCatalogFor, type CatalogOptions } from '../catalog-session.js';
import { loadDesign } from './design-file.js';
import { designPosition, solveDesignPosition } from './solve.js';

export interface PickOptions extends CatalogOptions {
  readonly top?: string;
  readonly includeBanned?: boolean;
  readonly includeObsolete?: boolean;
  /** Preferred packages, best first, comma-separated: "SOD-123,SMA". */
  readonly package?: string;
  readonly unknownIsFailure?: boolean;
}

/** The part a design assigns to the position, and where it stands. */
export interface AssignedPart {
  readonly reference: string;
  /** Null when the catalog has no such part (or more than one). */
  readonly place: PinnedPlace | null;
  readonly problem?: string;
}

export interface PickOutcome {
  readonly design: string;
  readonly ref: string;
  readonly role: string;
  readonly policy: string;
  readonly top: number;
  readonly result: SolveResult;
  /** Absent when the position has no feasible design. */
  readonly search?: Omit<CandidateSearch, 'pinned'>;
  readonly assigned?: AssignedPart;
}

const MAX_TOP = 200;
/** SQLite page-cache pages (16 KiB each) for the one search a command runs. */
const ONE_SHOT_CACHE_PAGES = 16;

function parseTop(text: string | undefined): number {
  if (text === undefined) return 10;
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > MAX_TOP) throw new UsageError(`--top must be a whole number from 1 to ${MAX_TOP}, got "${text}"`, 'e.g. --top 5');
  return n;
}

function parsePackages(text: string | undefined): string[] {
  return (text ?? '').split(',').map((p) => p.trim()).filter((p) => p.length > 0);
}

function lookUp(catalog: Parameters<typeof findPart>[0], reference: string): { part?: Part; problem?: string } {
  try {
    return { part: findPart(catalog, reference) };
  } catch (error) {
    if (error instanceof CatalogError) return { problem: error.message };
    throw error;
  }
}

/**
 * Solves one position of a design and ranks the catalog's parts for it. No feasible design, or
 * no passing part, is a result (exit 1), not an error.
 */
export function runPick(file: string, ref: string | undefined, options: PickOptions = {}): PickOutcome {
  const top = parseTop(options.top);
  const packagePreference = parsePackages(options.package);
  const design = loadDesign(file);
  const designed = designPosition(file, design, ref);
  // One connection serves the team policies and the search. Without a catalog the position is
  // still solved, so an infeasible design is reported rather than the missing catalog.
  let catalog = existsSync(catalogPathFor(options)) ? openCatalogFor(options) : undefined;
  try {
    const solved = solveDesignPosition(file, design, designed, catalog ? listTeamPolicies(catalog) : []);
    const base = { design: solved.design, ref: solved.ref, role: solved.role, policy: solved.policy, top, result: solved.result };
    if (!solved.result.ok) return base;
    catalog ??= openCatalogFor(options);
    // A command reads each page about once: a small page cache reuses its memory instead of
    // touching fresh memory for every page read, which costs more than the read (bench/README.md).
    catalog.db.pragma(`cache_size = ${ONE_SHOT_CACHE_PAGES}`);
    const policy = findPolicy(solved.policy, listTeamPolicies(catalog))!;
    const assigned = designed.part ? lookUp(catalog, designed.part) : undefined;
    const { pinned, ...search } = findCandidates(catalog, solved.result.position, policy, {
      wanted: top,
      includeBanned: Boolean(options.includeBanned),
      includeObsolete: Boolean(options.includeObsolete),
      unknownIsFailure: Boolean(options.unknownIsFailure),
      packagePreference,
      pinned: assigned?.part ? [assigned.part] : [],
    });
    if (!designed.part) return { ...base, search };
    return { ...base, search, assigned: { reference: designed.part, place: pinned[0] ?? null, ...(assigned?.problem ? { problem: assigned.problem } : {}) } };
  } finally {
    catalog?.close();
  }
}
