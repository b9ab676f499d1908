import type { Part } from '../parts/index.js';
import { CatalogError } from './catalog-error.js';
import type { Catalog } from './open-catalog.js';
import { findPart } from './part-repository.js';
import { ROW_COLUMNS, comparePartIdentity, rowToPart, type PartRow } from './part-rows.js';
import { IDENTITY_WHERE, identityParams } from './identity-sql.js';

export interface SecondSourceGroup {
  readonly name: string;
  readonly members: readonly Part[];
}

const identity = (p: Pick<Part, 'manufacturer' | 'partNumber'>) => `${p.manufacturer}\u0000${p.partNumber}`.toLowerCase();

export function listGroups(catalog: Catalog): SecondSourceGroup[] {
  const byName = new Map<string, Part[]>();
  // The partial index on second_source_group keeps this cheap in a large catalog.
  const rows = catalog.db.prepare(`SELECT ${ROW_COLUMNS.join(', ')} FROM part WHERE second_source_group IS NOT NULL`).all() as PartRow[];
  for (const part of rows.map(rowToPart).sort(comparePartIdentity)) {
    if (!part.secondSourceGroup) continue;
    byName.set(part.secondSourceGroup, [...(byName.get(part.secondSourceGroup) ?? []), part]);
  }
  return [...byName.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([name, members]) => ({ name, members }));
}

export function findGroup(catalog: Catalog, name: string): SecondSourceGroup {
  const group = listGroups(catalog).find((g) => g.name.toLowerCase() === name.trim().toLowerCase());
  if (!group) throw new CatalogError('unknown-group', `no second-source group "${name}"`, 'list the groups with `headroom catalog groups`');
  return group;
}

/**
 * Declares parts interchangeable under one group name, in one transaction. A group needs two or
 * more different parts; a part can be in one group only, so naming it here moves it.
 */
export function declareGroup(catalog: Catalog, name: string, references: readonly string[]): { group: SecondSourceGroup; moved: Part[] } {
  const groupName = name.trim();
  if (!/^[\p{L}\p{N}][\p{L}\p{N} ._\-/]{0,79}$/u.test(groupName)) {
    throw new CatalogError('invalid-change', `"${name}" is not a usable group name`, 'use letters, digits, spaces, dots, hyphens or slashes, e.g. SK3A40-SMA');
  }
  const parts = references.map((r) => findPart(catalog, r));
  const seen = new Map<string, string>();
  parts.forEach((p, i) => {
    const earlier = seen.get(identity(p));
    if (earlier !== undefined) {
      throw new CatalogError('invalid-change', `"${references[i]}" and "${earlier}" are the same part`, 'name each part once');
    }
    seen.set(identity(p), references[i]!);
  });
  if (parts.length < 2) {
    throw new CatalogError('invalid-change', 'a second-source group needs at least two parts; a group of one declares nothing', 'name two or more interchangeable parts');
  }
  const moved = parts.filter((p) => p.secondSourceGroup && p.secondSourceGroup !== groupName);
  const update = catalog.db.prepare(
    `UPDATE part SET second_source_group = ?, updated_at = ? WHERE ${IDENTITY_WHERE}`,
  );
  const at = new Date().toISOString();
  catalog.db.transaction(() => {
    for (const p of parts) update.run(groupName, at, ...identityParams(p.manufacturer, p.partNumber));
  }).immediate();
  return { group: findGroup(catalog, groupName), moved };
}

/** Takes a part out of its group; a group left with one member is dissolved, since one part is no group. */
export function leaveGroup(catalog: Catalog, reference: string): { part: Part; dissolved?: string } {
  const part = findPart(catalog, reference);
  if (!part.secondSourceGroup) throw new CatalogError('invalid-change', `${part.partNumber} is in no second-source group`, 'see `headroom catalog groups`');
  const name = part.secondSourceGroup;
  const clear = catalog.db.prepare(`UPDATE part SET second_source_group = NULL, updated_at = ? WHERE ${IDENTITY_WHERE}`);
  const at = new Date().toISOString();
  let dissolved: string | undefined;
  catalog.db.transaction(() => {
    clear.run(at, ...identityParams(part.manufacturer, part.partNumber));
    const rest = catalog.db.prepare('SELECT manufacturer, part_number FROM part WHERE second_source_group = ?').all(name) as { manufacturer: string; part_number: string }[];
    if (rest.length === 1) {
      clear.run(at, ...identityParams(rest[0]!.manufacturer, rest[0]!.part_number));
      dissolved = name;
    }
  }).immediate();
  const { secondSourceGroup: _gone, ...rest } = part;
  return { part: rest as Part, ...(dissolved ? { dissolved } : {}) };
}

export function sortMembers(parts: readonly Part[]): Part[] {
  return [...parts].sort(comparePartIdentity);
}
