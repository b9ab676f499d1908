/**
 * Synthetic catalogs for the pick benchmark, from the search helper's generator
 * (bench/synthetic-parts.ts) into bench/out/pick-catalog-SIZE.sqlite, with every migration applied.
 * Kept apart from catalog-SIZE.sqlite so the two benchmarks never write each other's files.
 * Built by importing the generator's CSV (bench/out/parts-SIZE.csv, written here when missing),
 * the quickest way to a catalog (bench/README.md, import).
 */
import { existsSync, renameSync } from 'node:fs';
import { join } from 'node:path';
import { openCatalog } from '../../src/catalog/index.js';
import { csvPath, outDirectory, sizeOf } from '../bench-paths.js';
import { importCatalog, writeSyntheticCsv } from '../synthetic-catalog.js';

const SEED = 42;

export function pickCatalogPath(size: string): string {
  return join(outDirectory(), `pick-catalog-${size}.sqlite`);
}

/** The generator's parts as CSV, as generate-catalog.js writes them (same seed, same parts). */
function ensureCsv(size: string): string {
  const path = csvPath(size);
  if (existsSync(path)) return path;
  const temp = `${path}.writing`;
  writeSyntheticCsv(temp, sizeOf(size), SEED);
  renameSync(temp, path);
  return path;
}

/** True when the catalog opens at this program's schema (opening upgrades it if it can). */
function isUsable(path: string): boolean {
  try {
    openCatalog(path).close();
    return true;
  } catch {
    return false;
  }
}

/** The catalog of `size` parts, built once (into a temporary file renamed into place). */
export function ensurePickCatalog(size: string, log: (line: string) => void = () => {}): string {
  const target = pickCatalogPath(size);
  if (existsSync(target) && isUsable(target)) return target;
  const temp = `${target}.building`;
  const started = performance.now();
  importCatalog(ensureCsv(size), temp, (catalog, added) => {
    log(`  ${added} parts imported (${((performance.now() - started) / 1000).toFixed(0)} s)`);
    catalog.db.pragma('optimize');
    catalog.db.pragma('journal_mode = DELETE');
  });
  renameSync(temp, target);
  return target;
}
