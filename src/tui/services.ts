import type { CandidateSearch } from '../catalog/candidates.js';
import type { ApprovalEvent } from '../catalog/approval-repository.js';
import type { DeratingPolicy } from '../circuits/derating.js';
import type { Design } from '../circuits/design-file.js';
import type { SolvedPosition } from '../circuits/role.js';
import type { ApprovalState, Part } from '../parts/index.js';
import type { NewPosition } from './design/edit-design.js';
import type { PartSearch } from './hooks/use-part-search.js';

/*
 * What the screens need from the outside world, as one interface: start-tui wires the real
 * catalog and files (io/), tests wire in-memory catalogs and temporary folders.
 */

export type Outcome<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly message: string };

/** One screenful of parts and how many match in all. */
export interface PartPage {
  readonly parts: readonly Part[];
  readonly total: number;
  /** True when `total` stopped counting (there are at least that many). */
  readonly isTotalCapped: boolean;
}

/** Pages through the catalog for a search text; large catalogs answer from SQLite, page by page. */
export type PartPager = (query: string, offset: number, limit: number) => PartPage;

export interface ApprovalRequest {
  readonly state: ApprovalState;
  readonly condition?: string;
  readonly reason: string;
}

/** What an edit did. */
export interface PartEdit {
  readonly part: Part;
  /** False when every value was as stored: nothing was written. */
  readonly isChanged: boolean;
  readonly isApprovalChanged: boolean;
}

export interface CatalogService {
  /** "demo" or the catalog's path. */
  readonly label: string;
  count(): number;
  /** The pager of the moment (a new one after parts were added). */
  pager(): PartPager;
  /** Candidate parts for a solved position, ranked, read from the catalog once per position. */
  candidates(position: SolvedPosition, policy: DeratingPolicy): Promise<CandidateSearch>;
  teamPolicies(): readonly DeratingPolicy[];
  addPart(part: Part): Outcome<Part>;
  /**
   * Rewrites a stored part with edited values (same row, in one transaction); refused when the new
   * maker and part number belong to another part. `value` is the part as stored after the edit.
   */
  updatePart(original: Part, edited: Part): Outcome<PartEdit>;
  changeApproval(part: Part, request: ApprovalRequest): Outcome<Part>;
  history(part: Part): readonly ApprovalEvent[];
  /** The part as stored now (after an approval change or an edit, renames followed), or null if it is gone. */
  find(part: Pick<Part, 'manufacturer' | 'partNumber'>): Part | null;
  /** A part from what a design file or a person writes ("MAKER:PART" or "PART"), or null. */
  lookup(reference: string): Part | null;
  /** Parts that could sit on the original's footprint doing its job (same package, compatible kind). */
  replacements(original: Part): readonly Part[];
}

export interface DesignService {
  /** Absolute path for what was typed (~ and relative paths resolved). */
  resolve(path: string): string;
  exists(path: string): boolean;
  /** Completions of a typed path: folders (ending in /) and design files (.yaml, .yml, .json). */
  complete(path: string): string[];
  /** Reads a design file; the message lists each problem with its line. */
  read(path: string): Outcome<Design>;
  /** Writes `part:` into a position and saves the file, keeping its comments. */
  assignPart(path: string, ref: string, partRef: string): Outcome<string>;
  /** Appends a position to a design file, or creates the file with it. */
  savePosition(path: string, position: NewPosition, designName: string): Outcome<'created' | 'appended'>;
}

export interface TuiServices {
  /** The open catalog, or null when there is none yet (the welcome screen offers the demo). */
  readonly catalog: CatalogService | null;
  openDemo(): CatalogService;
  readonly designs: DesignService;
  /** Who approval changes and added parts are recorded as. */
  readonly user: string;
  /** How in-memory lists are searched; the fuzzy search and its filter syntax plug in here. */
  readonly search?: PartSearch;
  /** Problems of a typed search query (an unknown field …), shown under the search text. */
  readonly queryProblems?: (text: string) => readonly string[];
}
