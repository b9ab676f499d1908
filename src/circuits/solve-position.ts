import { parseQuantity } from '../units/index.js';
import { DEFAULT_POLICY_ID, findPolicy, type DeratingPolicy } from './derating.js';
import type { Design, DesignIssue, DesignPosition } from './design-file.js';
import { ROLES, findRole } from './registry.js';
import type { SolveResult } from './role.js';

export type PositionOutcome =
  | { readonly ok: true; readonly result: SolveResult; readonly policy: DeratingPolicy }
  | { readonly ok: false; readonly issues: DesignIssue[] };

/**
 * Validates a position's conditions with its role's schema and solves it. Every bad condition is
 * reported with the design file's line and the field's path; infeasible designs come back as results.
 */
export function solvePosition(design: Design, position: DesignPosition, teamPolicies: readonly DeratingPolicy[] = []): PositionOutcome {
  const base = `positions[${position.index}]`;
  const issue = (line: number, field: string, message: string, expected: string): DesignIssue => ({ file: design.file, line, field, message, expected });
  const role = findRole(position.role);
  if (!role) {
    return { ok: false, issues: [issue(position.line, `${base}.role`, `unknown role "${position.role}"`, `one of ${ROLES.map((r) => r.id).join(', ')}`)] };
  }
  const policyId = position.policy ?? design.policy ?? DEFAULT_POLICY_ID;
  const policy = findPolicy(policyId, teamPolicies);
  if (!policy) {
    const known = [...teamPolicies, ...[]].map((p) => p.id);
    return { ok: false, issues: [issue(position.line, position.policy ? `${base}.policy` : 'policy', `unknown derating policy "${policyId}"`, `one of commercial, industrial, high-reliability${known.length ? ', ' + known.join(', ') : ''}`)] };
  }
  const conditions: Record<string, unknown> = { ...position.conditions };
  if (position.rthJa !== undefined) {
    const r = typeof position.rthJa === 'number' ? { ok: true as const, value: position.rthJa } : parseQuantity(position.rthJa, 'thermal-resistance');
    if (!r.ok || !(r.value > 0)) {
      return { ok: false, issues: [issue(position.line, `${base}.rth_ja`, r.ok ? 'must be positive' : r.issue.message, 'a thermal resistance such as "120 °C/W"')] };
    }
    conditions.rth_ja = r.value;
  }
  const parsed = role.schema.safeParse(conditions);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((zi) => {
      const key = String(zi.path[0] ?? '');
      const input = role.inputs.find((i) => i.name === key);
      const expected = input ? `${input.label}: ${input.help}${input.default ? ` (default ${input.default})` : ''}` : `conditions of ${role.id}: ${role.inputs.map((i) => i.name).join(', ')}`;
      const message = zi.code === 'invalid_type' && (zi as { input?: unknown }).input === undefined ? 'required condition is missing' : zi.message;
      return issue(position.conditionLines[key] ?? position.line, key ? `${base}.conditions.${key}` : `${base}.conditions`, message, expected);
    });
    return { ok: false, issues };
  }
  return { ok: true, result: role.solve(parsed.data, policy), policy };
}
