import { BUILT_IN_POLICIES, type DeratingPolicy } from '../circuits/derating.js';
import { deratingPolicySchema } from '../circuits/derating-policy-schema.js';
import type { Catalog } from './open-catalog.js';

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
