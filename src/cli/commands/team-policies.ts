import { existsSync } from 'node:fs';
import type { DeratingPolicy } from '../../circuits/derating.js';
import { openCatalog } from '../../catalog/open-catalog.js';
import { listTeamPolicies } from '../../catalog/policy-repository.js';
import { catalogPathFor, type CatalogOptions } from '../catalog-session.js';

// Apart from policies.ts, whose policy saving loads the validation schema: solving a position
// only reads policies.

/** Team policies from the catalog when there is one; a missing catalog just means none. */
export function teamPolicies(options: CatalogOptions): DeratingPolicy[] {
  const path = catalogPathFor(options);
  if (!existsSync(path)) return [];
  const catalog = openCatalog(path, { create: false });
  try {
    return listTeamPolicies(catalog);
  } finally {
    catalog.close();
  }
}
