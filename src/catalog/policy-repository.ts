import type { DeratingPolicy } from '../circuits/derating.js';
import type { Catalog } from './open-catalog.js';

/**
 * The team's own policies stored in the catalog, in id order. Stored bodies were validated when
 * saved (save-team-policy.ts), as parts are on import, so reading does not validate again.
 */
export function listTeamPolicies(catalog: Catalog): DeratingPolicy[] {
  const rows = catalog.db.prepare('SELECT body FROM derating_policy ORDER BY id').all() as { body: string }[];
  return rows.map((r) => JSON.parse(r.body) as DeratingPolicy);
}
