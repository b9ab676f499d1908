import { declareGroup, findGroup, leaveGroup, listGroups, type SecondSourceGroup } from '../../catalog/index.js';
import { partDifferences, type FieldDifference, type Part } from '../../parts/index.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';

export interface GroupView {
  readonly name: string;
  readonly members: readonly Part[];
  /** What differs between the members, field by field. */
  readonly differences: readonly FieldDifference[];
}

const view = (g: SecondSourceGroup): GroupView => ({ name: g.name, members: g.members, differences: partDifferences(g.members) });

export function runGroupList(options: CatalogOptions): GroupView[] {
  return withCatalog(options, (catalog) => listGroups(catalog).map(view));
}

export function runGroupShow(name: string, options: CatalogOptions): GroupView {
  return withCatalog(options, (catalog) => view(findGroup(catalog, name)));
}

export function runGroupDeclare(name: string, references: readonly string[], options: CatalogOptions): { group: GroupView; moved: Part[] } {
  return withCatalog(options, (catalog) => {
    const { group, moved } = declareGroup(catalog, name, references);
    return { group: view(group), moved };
  });
}

export function runGroupLeave(reference: string, options: CatalogOptions): { part: Part; dissolved?: string } {
  return withCatalog(options, (catalog) => leaveGroup(catalog, reference));
}
