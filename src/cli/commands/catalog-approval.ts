import { approvalHistory, changeApproval, findPart, isApprovalState, type ApprovalEvent } from '../../catalog/index.js';
import { APPROVAL_STATES, type Part } from '../../parts/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { changeAuthor } from '../user-name.js';

export interface ApprovalCommandOptions extends CatalogOptions {
  readonly reason?: string;
  readonly condition?: string;
  readonly by?: string;
}

export function runCatalogApproval(reference: string, state: string, options: ApprovalCommandOptions): { part: Part; event: ApprovalEvent } {
  if (!isApprovalState(state)) throw new UsageError(`unknown approval state "${state}"`, `use one of ${APPROVAL_STATES.join(', ')}`);
  if (!options.reason?.trim()) throw new UsageError('every approval change needs its reason', 'add --reason "…", e.g. --reason "qualified on FC-M24 build 7"');
  return withCatalog(options, (catalog) =>
    changeApproval(catalog, reference, {
      state,
      reason: options.reason!,
      by: changeAuthor(options.by),
      ...(options.condition ? { condition: options.condition } : {}),
    }),
  );
}

export function runCatalogHistory(reference: string, options: CatalogOptions): { part: Part; events: ApprovalEvent[] } {
  return withCatalog(options, (catalog) => {
    const part = findPart(catalog, reference);
    return { part, events: approvalHistory(catalog, part) };
  });
}
