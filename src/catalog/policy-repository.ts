import { BUILT_IN_POLICIES, deratingPolicySchema, type DeratingPolicy } from '../circuits/derating.js';
import type { Catalog } from './open-catalog.js';

/** The team's own policies stored in the catalog, in id order. */
export function listTeamPolicies(catalog: Catalog): DeratingPolicy[] {
  const rows = catalog.db.prepare('SELECT body FROM derating_policy ORDER BY id').all() as { body: string }[];
  return rows.map((r) => deratingPolicySchema.parse(JSON.parse(r.body)));
}

export type PolicyWriteResult = { ok: true; policy: DeratingPolicy; isNew: boolean } | { ok: false; issues: string[] };

/** Stores a team policy after validating it; the built-in ids are reserved. */
export function saveTeamPolicy(catalog: Catalog, input: unknown, by: string): PolicyWriteResult {
  const parsed = deratingPolicySchema.safeParse(input);
  if (!parsed.success) {
    return { ok: false, issues: parsed.error.issues.map((i) => `${i.path.join('.') || '(policy)'}: ${i.message}`) };
  }
  const policy = parsed.data;
  if (BUILT_IN_POLICIES.some((p) => p.id === policy.id)) {
    return { ok: false, issues: [`id: "${policy.id}" is a built-in policy; choose another id`] };
  }
  const isNew = !catalog.db.prepare('SELECT 1 FROM derating_policy WHERE id = ?').get(policy.id);
  catalog.db
    .prepare(
      `INSERT INTO derating_policy (id, body, updated_at, updated_by) VALUES (?, ?, ?, ?)
       ON CONFLICT(id) DO UPDATE SET body = excluded.body, updated_at = excluded.updated_at, updated_by = excluded.updated_by`,
    )
    .run(policy.id, JSON.stringify(policy), new Date().toISOString(), by);
  return { ok: true, policy, isNew };
}
