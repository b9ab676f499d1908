import {
  APPROVAL_STATES,
  PART_KINDS,
  type ApprovalState,
  type Part,
  type PartKind,
} from '../../parts/index.js';
import { listParts } from '../../catalog/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';

export interface ListCommandOptions extends CatalogOptions {
  readonly kind?: string;
  readonly approval?: string;
  readonly maker?: string;
}

export function runCatalogList(options: ListCommandOptions): { catalogPath: string; parts: Part[] } {
  if (options.kind && !(PART_KINDS as readonly string[]).includes(options.kind)) {
    throw new UsageError(`unknown kind "${options.kind}"`, `use one of ${PART_KINDS.join(', ')}`);
  }
  if (options.approval && !(APPROVAL_STATES as readonly string[]).includes(options.approval)) {
    throw new UsageError(`unknown approval state "${options.approval}"`, `use one of ${APPROVAL_STATES.join(', ')}`);
  }
  return withCatalog(options, (catalog) => ({
    catalogPath: catalog.path,
    parts: listParts(catalog, {
      ...(options.kind ? { kind: options.kind as PartKind } : {}),
      ...(options.approval ? { approval: options.approval as ApprovalState } : {}),
      ...(options.maker ? { manufacturer: options.maker } : {}),
    }),
  }));
}
