import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { RoleDefinition, SolvedPosition, SolveResult } from '../../src/circuits/role.js';

/** Solve, read steps and list schema issues of one role, the way every role test needs them. */
export function roleHarness(role: RoleDefinition) {
  const solve = (input: Record<string, unknown>, policyId = 'commercial'): SolveResult => {
    const parsed = role.schema.safeParse(input);
    if (!parsed.success) throw new Error(parsed.error.message);
    return role.solve(parsed.data, findPolicy(policyId) as DeratingPolicy);
  };
  const solved = (input: Record<string, unknown>, policyId?: string): SolvedPosition => {
    const result = solve(input, policyId);
    if (!result.ok) throw new Error(result.infeasible.reason);
    return result.position;
  };
  const step = (p: SolvedPosition, symbol: string) => p.steps.find((s) => s.symbol === symbol)?.value ?? Number.NaN;
  const issues = (input: Record<string, unknown>) => {
    const r = role.schema.safeParse(input);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };
  return { solve, solved, step, issues };
}
