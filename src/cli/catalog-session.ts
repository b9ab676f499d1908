import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { CatalogError } from '../catalog/catalog-error.js';
import { resolveCatalogPath } from '../catalog/catalog-location.js';
import { openCatalog, type Catalog } from '../catalog/open-catalog.js';

export interface CatalogOptions {
  readonly catalog?: string;
  readonly demo?: boolean;
}

let demoPath: string | undefined;

/**
 * Builds (or finds) the demo catalog once, before any command runs. Kept out of the synchronous
 * path so commands on a user's own catalog never load the demo builder and its CSV reader.
 */
export async function prepareDemoCatalog(): Promise<string> {
  const { ensureDemoCatalog } = await import('../catalog/demo-catalog.js');
  demoPath = ensureDemoCatalog();
  return demoPath;
}

/** Which catalog file a command works on: the demo, --catalog, HEADROOM_CATALOG or the default. */
export function catalogPathFor(options: CatalogOptions): string {
  if (options.demo) {
    if (!demoPath) throw new Error('prepareDemoCatalog() must run before a --demo command');
    return demoPath;
  }
  return resolveCatalogPath(options.catalog);
}

/** Opens the catalog for a command, creating it only for commands that write; the caller closes it. */
export function openCatalogFor(options: CatalogOptions & { create?: boolean }): Catalog {
  const path = catalogPathFor(options);
  if (options.create) mkdirSync(dirname(path), { recursive: true });
  const catalog = openCatalog(path, { create: options.create ?? false });
  if (catalog.backupPath) {
    process.stderr.write(`Upgraded ${path} to catalog schema ${catalog.migrated.at(-1)}; the previous file was copied to ${catalog.backupPath}.\n`);
  }
  return catalog;
}

/** Opens the catalog for a command, creating it only for commands that write. */
export function withCatalog<T>(options: CatalogOptions & { create?: boolean }, use: (catalog: Catalog) => T): T {
  const catalog = openCatalogFor(options);
  try {
    return use(catalog);
  } finally {
    catalog.close();
  }
}

export { CatalogError };
