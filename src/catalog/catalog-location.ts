import { join } from 'node:path';
import envPaths from 'env-paths';

export const CATALOG_ENV = 'HEADROOM_CATALOG';

/** Per-user data folder: ~/.local/share/headroom on Linux, the platform's own elsewhere. */
export function dataDirectory(): string {
  return envPaths('headroom', { suffix: '' }).data;
}

/** --catalog wins, then HEADROOM_CATALOG, then the per-user data folder. */
export function resolveCatalogPath(flag: string | undefined, env: NodeJS.ProcessEnv = process.env): string {
  if (flag) return flag;
  const fromEnv = env[CATALOG_ENV];
  if (fromEnv) return fromEnv;
  return join(dataDirectory(), 'catalog.sqlite');
}

export function demoCatalogPath(): string {
  return join(dataDirectory(), 'demo.sqlite');
}
