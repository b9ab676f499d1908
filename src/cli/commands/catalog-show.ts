import { findPart } from '../../catalog/index.js';
import type { Part } from '../../parts/index.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';

export function runCatalogShow(reference: string, options: CatalogOptions): Part {
  return withCatalog(options, (catalog) => findPart(catalog, reference));
}
