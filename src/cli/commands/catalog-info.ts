import { countParts } from '../../catalog/index.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';

export function runCatalogInfo(options: CatalogOptions): { path: string; schemaVersion: number; parts: number } {
  return withCatalog(options, (catalog) => ({
    path: catalog.path,
    schemaVersion: catalog.db.pragma('user_version', { simple: true }) as number,
    parts: countParts(catalog),
  }));
}
