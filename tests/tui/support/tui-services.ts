import { writeParts, openCatalog, type Catalog } from '../../../src/catalog/index.js';
import type { Part } from '../../../src/parts/index.js';
import { catalogService } from '../../../src/tui/io/catalog-service.js';
import { designService } from '../../../src/tui/io/design-service.js';
import type { TuiServices } from '../../../src/tui/services.js';

/** A fresh in-memory catalog holding the parts, with every migration applied. */
export function memoryCatalog(parts: readonly Part[] = []): Catalog {
  const catalog = openCatalog(':memory:');
  if (parts.length > 0) writeParts(catalog, parts, { by: 'test', reason: 'fixture', at: '2026-01-01T00:00:00.000Z' });
  return catalog;
}

/** Services over an in-memory catalog and a folder for design files. */
export function testServices(parts: readonly Part[], options: { cwd?: string; memoryLimit?: number; hasCatalog?: boolean } = {}): TuiServices & { catalogDb: Catalog } {
  const catalog = memoryCatalog(parts);
  const service = catalogService(catalog, 'test', { user: 'tester', ...(options.memoryLimit !== undefined ? { memoryLimit: options.memoryLimit } : {}) });
  return {
    catalog: options.hasCatalog === false ? null : service,
    openDemo: () => service,
    designs: designService(options.cwd ?? process.cwd()),
    user: 'tester',
    catalogDb: catalog,
  };
}
