import { ROLES } from '../../circuits/registry.js';
import type { RoleInput } from '../../circuits/role.js';

export interface RoleListing {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly inputs: readonly (RoleInput & { readonly isRequired: boolean })[];
}

/** Every role with its inputs; an input is required when the schema refuses conditions without it. */
export function runRoles(): RoleListing[] {
  return ROLES.map((r) => {
    const empty = r.schema.safeParse({});
    const missing = new Set(empty.success ? [] : empty.error.issues.filter((i) => i.path.length === 1).map((i) => String(i.path[0])));
    return { id: r.id, title: r.title, summary: r.summary, inputs: r.inputs.map((i) => ({ ...i, isRequired: missing.has(i.name) })) };
  });
}
