import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import {
  CatalogError,
  ensureDemoCatalog,
  openCatalog,
  resolveCatalogPath,
  type Catalog,
} from '../catalog/index.js';

export interface CatalogOptions {
  readonly catalog?: string;
  readonly demo?: boolean;
}

/** Which catalog file a command works on: the demo, --catalog, HEADROOM_CATALOG or the default. */
export function catalogPathFor(options: CatalogOptions): string {
  return options.demo ? ensureDemoCatalog() : resolveCatalogPath(options.catalog);
}

/** Opens the catalog for a command, creating it only for commands that write. */
export function withCatalog<T>(options: CatalogOptions & { create?: boolean }, use: (catalog: Catalog) => T): T {
  const path = catalogPathFor(options);
  if (options.create) mkdirSync(dirname(path), { recursive: true });
  const catalog = openCatalog(path, { create: options.create ?? false });
  try {
    return use(catalog);
  } finally {
    catalog.close();
  }
}

export { CatalogError };
