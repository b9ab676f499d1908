import { findPolicy, type DeratingPolicy } from '../../src/circuits/derating.js';
import type { Limit, OperatingPoint } from '../../src/circuits/limits.js';
import { findRole } from '../../src/circuits/registry.js';
import type { SolvedPosition } from '../../src/circuits/role.js';
import { junctionTemperatureLimit } from '../../src/circuits/roles/common-limits.js';

export const commercial: DeratingPolicy = findPolicy('commercial')!;
export const C = (celsius: number) => celsius + 273.15;

/** A position solved by a real role, for cases that should read like a design file. */
export function solveRole(role: string, conditions: Record<string, unknown>, policy: DeratingPolicy = commercial): SolvedPosition {
  const definition = findRole(role)!;
  const result = definition.solve(definition.schema.parse(conditions), policy);
  if (!result.ok) throw new Error(`expected a design, got: ${result.infeasible.reason}`);
  return result.position;
}

/** A hand-built position: exactly the operating point and limits a test states, nothing derived. */
export function aPosition(op: Partial<OperatingPoint>, limits: readonly Limit[], suitableKinds: readonly string[] = ['schottky', 'rectifier']): SolvedPosition {
  return {
    role: 'polarity-guard',
    policyId: commercial.id,
    operatingPoint: { ambientMinK: C(-20), ambientMaxK: C(50), ...op },
    limits,
    steps: [],
    cautions: [],
    figures: {},
    suitableKinds,
  };
}

export const tjLimit = (policy: DeratingPolicy = commercial) => junctionTemperatureLimit(policy);

/** A limit with no derating: bound = stress. */
export function plainLimit(id: string, label: string, check: Limit['check'], bound: number, quantity: Limit['quantity'], isHard = true): Limit {
  return { id, label, check, bound, stress: bound, quantity, reason: `${label} test limit`, isHard };
}
