import type { RoleDefinition, RoleId } from './role.js';
import { rectifierRole } from './roles/rectifier.js';
import { buckFreewheelRole } from './roles/buck-freewheel.js';
import { boostOutputRole } from './roles/boost-output.js';
import { flybackOutputRole } from './roles/flyback-output.js';
import { coilFreewheelRole } from './roles/coil-freewheel.js';
import { polarityGuardRole } from './roles/polarity-guard.js';
import { zenerRegulatorRole } from './roles/zener-regulator.js';
import { transientClampRole } from './roles/transient-clamp.js';
import { signalClampRole } from './roles/signal-clamp.js';

export const ROLES: readonly RoleDefinition[] = [
  rectifierRole,
  buckFreewheelRole,
  boostOutputRole,
  flybackOutputRole,
  coilFreewheelRole,
  polarityGuardRole,
  zenerRegulatorRole,
  transientClampRole,
  signalClampRole,
] as readonly RoleDefinition[];

export function findRole(id: string): RoleDefinition | undefined {
  return ROLES.find((r) => r.id === (id as RoleId));
}
