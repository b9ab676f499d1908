/**
 * Synthetic catalogs for the pick benchmark, from the search helper's generator
 * (bench/synthetic-parts.ts) into bench/out/pick-catalog-SIZE.sqlite, with every migration applied.
 * Kept apart from catalog-SIZE.sqlite so the two benchmarks never write each other's files.
 * Built by importing the generator's CSV (bench/out/parts-SIZE.csv, written here when missing),
 * the quickest way to a catalog (bench/README.md, import).
 */
import { closeSync, existsSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { writeCsv } from '../../src/catalog/csv-format.js';
import { importPartsFile, openCatalog } from '../../src/catalog/index.js';
import type { Part } from '../../src/parts/index.js';
import { csvPath, outDirectory, seededRandom, sizeOf } from '../bench-paths.js';
import { syntheticParts } from '../synthetic-parts.js';

const CHUNK = 10_000;
const SEED = 42;

export function pickCatalogPath(size: string): string {
  return join(outDirectory(), `pick-catalog-${size}.sqlite`);
}

/** The generator's parts as CSV, as generate-catalog.js writes them (same seed, same parts). */
function ensureCsv(size: string): string {
  const path = csvPath(size);
  if (existsSync(path)) return path;
  const temp = `${path}.writing`;
  const fd = openSync(temp, 'w');
  let chunk: Part[] = [];
  let isFirst = true;
  const flush = () => {
    const text = writeCsv(chunk);
    writeSync(fd, isFirst ? text : text.slice(text.indexOf('\n') + 1));
    isFirst = false;
    chunk = [];
  };
  for (const part of syntheticParts(sizeOf(size), seededRandom(SEED))) {
    chunk.push(part);
    if (chunk.length === CHUNK) flush();
  }
  if (chunk.length > 0) flush();
  closeSync(fd);
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
  for (const suffix of ['', '-wal', '-shm']) rmSync(temp + suffix, { force: true });
  const started = performance.now();
  const csv = ensureCsv(size);
  const catalog = openCatalog(temp);
  try {
    const result = importPartsFile(catalog, csv, 'csv', { by: 'bench', at: '2026-01-01T00:00:00.000Z' });
    if (!result.ok) throw new Error(`pick catalog: import of ${csv} failed`);
    log(`  ${result.written.added} parts imported (${((performance.now() - started) / 1000).toFixed(0)} s)`);
    catalog.db.pragma('optimize');
    catalog.db.pragma('journal_mode = DELETE');
  } finally {
    catalog.close();
  }
  renameSync(temp, target);
  return target;
}
