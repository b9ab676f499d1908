import { existsSync, readFileSync } from 'node:fs';
import { parse as parseYaml } from 'yaml';
import { BUILT_IN_POLICIES, type DeratingPolicy } from '../../circuits/derating.js';
import { saveTeamPolicy } from '../../catalog/save-team-policy.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { changeAuthor } from '../user-name.js';
import { teamPolicies } from './team-policies.js';

export interface PolicyListing {
  readonly policy: DeratingPolicy;
  readonly isBuiltIn: boolean;
}

export function runPolicyList(options: CatalogOptions): PolicyListing[] {
  return [
    ...BUILT_IN_POLICIES.map((policy) => ({ policy, isBuiltIn: true })),
    ...teamPolicies(options).map((policy) => ({ policy, isBuiltIn: false })),
  ];
}

/** Adds or replaces a team policy from a YAML or JSON file. */
export function runPolicyAdd(file: string, options: CatalogOptions & { by?: string }): { policy: DeratingPolicy; isNew: boolean } {
  if (!existsSync(file)) throw new UsageError(`no policy file ${file}`, 'check the path');
  let body: unknown;
  try {
    body = parseYaml(readFileSync(file, 'utf8'));
  } catch (error) {
    throw new UsageError(`${file} is not readable as YAML or JSON: ${(error as Error).message.split('\n')[0]}`, 'see docs/design-format.md, "Derating policies"');
  }
  return withCatalog({ ...options, create: true }, (catalog) => {
    const r = saveTeamPolicy(catalog, body, changeAuthor(options.by));
    if (!r.ok) throw new UsageError(`${file}: the policy was not saved`, 'correct the fields named above', r.issues.map((i) => `${file}: ${i}`));
    return { policy: r.policy, isNew: r.isNew };
  });
}
