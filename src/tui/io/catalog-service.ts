import { changeApproval, approvalHistory } from '../../catalog/approval-repository.js';
import { CatalogError } from '../../catalog/catalog-error.js';
import type { Catalog } from '../../catalog/open-catalog.js';
import { listTeamPolicies } from '../../catalog/policy-repository.js';
import { countParts, findPart, listParts, writeParts } from '../../catalog/part-repository.js';
import { replacementCandidates } from '../../catalog/replacements.js';
import { updatePart } from '../../catalog/update-part.js';
import type { Part } from '../../parts/index.js';
import type { PartSearch } from '../hooks/use-part-search.js';
import type { CatalogService, PartPager } from '../services.js';
import { memoryPager, sqlPager } from './part-pager.js';

export interface CatalogServiceOptions {
  readonly user: string;
  readonly search?: PartSearch;
  /** Catalogs up to this size are browsed in memory. @default 2000 */
  readonly memoryLimit?: number;
  /** The catalog search for large catalogs, once it is loaded; undefined: SQL paging with substring search. */
  readonly searchPager?: (catalog: Catalog, browse: PartPager) => PartPager | undefined;
}

/** Parts ranked per position: enough passing parts to choose from, bounded so ranking stays near a second. */
const CANDIDATE_OPTIONS = { wanted: 50, maxEvaluated: 2000 } as const;

const message = (error: unknown) => (error instanceof CatalogError || error instanceof Error ? error.message : String(error));

/** The interface's view of an open catalog. */
export function catalogService(catalog: Catalog, label: string, options: CatalogServiceOptions): CatalogService {
  let count: number | undefined;
  let pager: PartPager | undefined;
  let isSearchBacked = false;
  const invalidate = () => {
    count = undefined;
    pager = undefined;
    isSearchBacked = false;
  };
  const refOf = (part: Pick<Part, 'manufacturer' | 'partNumber'>) => `${part.manufacturer}:${part.partNumber}`;
  // Screens hold parts by identity; after a rename here they still find the part under its new one.
  const renamed = new Map<string, string>();
  const keyOf = (part: Pick<Part, 'manufacturer' | 'partNumber'>) => refOf(part).toLowerCase();
  const latestRef = (part: Pick<Part, 'manufacturer' | 'partNumber'>) => {
    let reference = refOf(part);
    for (let hops = 0; renamed.has(reference.toLowerCase()) && hops < 100; hops++) reference = renamed.get(reference.toLowerCase())!;
    return reference;
  };
  const service: CatalogService = {
    label,
    count: () => (count ??= countParts(catalog)),
    pager: () => {
      if (pager && (isSearchBacked || service.count() <= (options.memoryLimit ?? 2000))) return pager;
      if (service.count() <= (options.memoryLimit ?? 2000)) return (pager = memoryPager(listParts(catalog), options.search));
      const browse = sqlPager(catalog.db);
      const searched = options.searchPager?.(catalog, browse);
      isSearchBacked = searched !== undefined;
      return (pager = searched ?? pager ?? browse);
    },
    // Loaded on first use: the ranking pulls in the selection models, which the first screen does not need.
    candidates: async (position, policy) => (await import('../../catalog/candidates.js')).findCandidates(catalog, position, policy, CANDIDATE_OPTIONS),
    teamPolicies: () => listTeamPolicies(catalog),
    addPart: (part) => {
      try {
        findPart(catalog, refOf(part));
        return { ok: false, message: `${refOf(part)} is already in the catalog; this form only adds new parts` };
      } catch (error) {
        if (!(error instanceof CatalogError) || error.code !== 'unknown-part') return { ok: false, message: message(error) };
      }
      try {
        writeParts(catalog, [part], { by: options.user, reason: 'added in the terminal interface' });
        invalidate();
        return { ok: true, value: findPart(catalog, refOf(part)) };
      } catch (error) {
        return { ok: false, message: message(error) };
      }
    },
    changeApproval: (part, request) => {
      try {
        const r = changeApproval(catalog, refOf(part), { ...request, by: options.user });
        invalidate();
        return { ok: true, value: r.part };
      } catch (error) {
        return { ok: false, message: message(error) };
      }
    },
    updatePart: (original, edited) => {
      try {
        const r = updatePart(catalog, original, edited, { by: options.user, reason: 'edited in the terminal interface' });
        if (!r.ok) return { ok: false, message: r.message };
        if (r.isChanged) invalidate();
        if (keyOf(original) !== keyOf(r.part)) {
          renamed.set(keyOf(original), refOf(r.part));
          renamed.delete(keyOf(r.part));
        }
        return { ok: true, value: { part: r.part, isChanged: r.isChanged, isApprovalChanged: r.isApprovalChanged } };
      } catch (error) {
        return { ok: false, message: message(error) };
      }
    },
    history: (part) => approvalHistory(catalog, part),
    find: (part) => service.lookup(latestRef(part)),
    lookup: (reference) => {
      try {
        return findPart(catalog, reference);
      } catch {
        return null;
      }
    },
    replacements: (original) => replacementCandidates(catalog, original),
  };
  return service;
}
