import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readDesignText } from '../../src/circuits/design-file.js';
import type { RoleDefinition } from '../../src/circuits/role.js';
import { polarityGuardRole } from '../../src/circuits/roles/polarity-guard.js';
import { signalClampRole } from '../../src/circuits/roles/signal-clamp.js';
import { transientClampRole } from '../../src/circuits/roles/transient-clamp.js';
import { zenerRegulatorRole } from '../../src/circuits/roles/zener-regulator.js';
import { solvePosition } from '../../src/circuits/solve-position.js';

// The example designs of the four protection and small-signal roles; solvePosition reaches them through the registry.
const EXAMPLES = join(import.meta.dirname, '..', '..', 'catalog-demo', 'roles');

describe.each(['polarity-guard', 'zener-regulator', 'transient-clamp', 'signal-clamp'])('catalog-demo/roles/%s.yaml', (role) => {
  const file = `${role}.yaml`;
  const read = readDesignText(file, readFileSync(join(EXAMPLES, file), 'utf8'));

  it('reads as a design whose positions all use the role', () => {
    expect(read.ok ? [] : read.issues).toEqual([]);
    expect(read.ok && read.design.positions.map((p) => p.role).every((r) => r === role)).toBe(true);
  });

  it('solves every position to a feasible design with finite steps and limits', () => {
    if (!read.ok) throw new Error('unreadable example');
    for (const position of read.design.positions) {
      const outcome = solvePosition(read.design, position);
      expect(outcome.ok ? [] : outcome.issues).toEqual([]);
      if (!outcome.ok) continue;
      const { result } = outcome;
      expect(result.ok ? '' : result.infeasible.reason).toBe('');
      if (!result.ok) continue;
      expect(result.position.role).toBe(role);
      for (const step of result.position.steps) expect(Number.isFinite(step.value), step.quantity).toBe(true);
      for (const limit of result.position.limits) expect(Number.isFinite(limit.bound), limit.id).toBe(true);
    }
  });
});

describe.each([polarityGuardRole, zenerRegulatorRole, transientClampRole, signalClampRole] as RoleDefinition[])('$id inputs', (role) => {
  it('document every condition the schema takes, and nothing else', () => {
    const shape = (role.schema as unknown as { shape: Record<string, unknown> }).shape;
    expect(role.inputs.map((i) => i.name).sort()).toEqual(Object.keys(shape).sort());
    for (const input of role.inputs) expect(input.help, input.name).toBeTruthy();
  });
});
