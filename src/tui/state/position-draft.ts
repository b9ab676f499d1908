import { BUILT_IN_POLICIES, DEFAULT_POLICY_ID, findPolicy, type DeratingPolicy } from '../../circuits/derating.js';
import type { Design, DesignPosition } from '../../circuits/design-file.js';
import { findRole } from '../../circuits/registry.js';
import type { RoleDefinition, RoleId, SolveResult } from '../../circuits/role.js';

/** Where a position came from when it was opened from a design file. */
export interface DesignOrigin {
  readonly path: string;
  readonly ref: string;
  readonly designName: string;
  /** The part the file names for the position now, if any. */
  readonly part?: string;
  readonly notes?: string;
}

/** What the position form edits: the role, the conditions as typed, the policy. */
export interface PositionDraft {
  readonly roleId: RoleId;
  readonly values: Readonly<Record<string, string>>;
  readonly policyId: string;
  readonly origin: DesignOrigin | null;
}

/** A draft solved: what every screen of the position shows. */
export interface PositionSession {
  readonly draft: PositionDraft;
  readonly role: RoleDefinition;
  readonly policy: DeratingPolicy;
  readonly result: SolveResult;
}

export function emptyDraft(roleId: RoleId): PositionDraft {
  return { roleId, values: {}, policyId: DEFAULT_POLICY_ID, origin: null };
}

/** A condition value from a design file as people would type it (numbers there are SI). */
function conditionText(role: RoleDefinition, name: string, value: unknown): string {
  if (typeof value === 'string') return value;
  if (typeof value === 'number') {
    const input = role.inputs.find((i) => i.name === name);
    return input?.quantity === 'temperature' ? `${value} K` : String(value);
  }
  if (typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/** The form's starting point for a position of a design file; undefined for an unknown role. */
export function draftFromPosition(design: Design, position: DesignPosition): PositionDraft | undefined {
  const role = findRole(position.role);
  if (!role) return undefined;
  const values: Record<string, string> = {};
  for (const [name, value] of Object.entries(position.conditions)) values[name] = conditionText(role, name, value);
  if (position.rthJa !== undefined) values.rth_ja = typeof position.rthJa === 'number' ? `${position.rthJa} K/W` : position.rthJa;
  return {
    roleId: role.id,
    values,
    policyId: position.policy ?? design.policy ?? DEFAULT_POLICY_ID,
    origin: {
      path: design.file,
      ref: position.ref,
      designName: design.name,
      ...(position.part ? { part: position.part } : {}),
      ...(position.notes ? { notes: position.notes } : {}),
    },
  };
}

/** Built-in policies first, then the team's own from the catalog. */
export function policyChoices(teamPolicies: readonly DeratingPolicy[]): DeratingPolicy[] {
  return [...BUILT_IN_POLICIES, ...teamPolicies.filter((t) => !BUILT_IN_POLICIES.some((b) => b.id === t.id))];
}

export function policyById(id: string, teamPolicies: readonly DeratingPolicy[]): DeratingPolicy | undefined {
  return findPolicy(id, teamPolicies);
}

/** "D3 · Coil freewheel" or "new position · Coil freewheel". */
export function sessionTitle(session: Pick<PositionSession, 'draft' | 'role'>): string {
  const where = session.draft.origin ? session.draft.origin.ref : 'new position';
  return `${where} · ${session.role.title}`;
}
