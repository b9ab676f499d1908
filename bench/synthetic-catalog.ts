/**
 * Synthetic catalogs as the benchmarks build them: the generator's parts written as CSV, then
 * imported into a new catalog file the way `headroom catalog import` does (the quickest way to a
 * catalog, bench/README.md). Shared by generate-catalog.ts and candidates/pick-catalog.ts.
 */
import { closeSync, openSync, rmSync, writeSync } from 'node:fs';
import { writeCsv } from '../src/catalog/csv-format.js';
import { importPartsFile, openCatalog, type Catalog } from '../src/catalog/index.js';
import type { Part } from '../src/parts/index.js';
import { seededRandom } from './bench-paths.js';
import { syntheticParts } from './synthetic-parts.js';

const CHUNK = 10_000;

/** `count` parts from the generator seeded with `seed`, as canonical CSV; the same seed, the same file. */
export function writeSyntheticCsv(path: string, count: number, seed: number): void {
  const fd = openSync(path, 'w');
  let chunk: Part[] = [];
  let isFirst = true;
  // Chunks keep memory flat; only the first keeps its header row.
  const flush = () => {
    const text = writeCsv(chunk);
    writeSync(fd, isFirst ? text : text.slice(text.indexOf('\n') + 1));
    isFirst = false;
    chunk = [];
  };
  for (const part of syntheticParts(count, seededRandom(seed))) {
    chunk.push(part);
    if (chunk.length === CHUNK) flush();
  }
  if (chunk.length > 0) flush();
  closeSync(fd);
}

/**
 * A new catalog at `target` (any old one removed) holding the parts of `csv`, with a fixed author
 * and time so each build is the same. `finish` runs on the catalog before it is closed.
 */
export function importCatalog(csv: string, target: string, finish?: (catalog: Catalog, added: number) => void): void {
  for (const suffix of ['', '-wal', '-shm']) rmSync(target + suffix, { force: true });
  const catalog = openCatalog(target);
  try {
    const result = importPartsFile(catalog, csv, 'csv', { by: 'bench', at: '2026-01-01T00:00:00.000Z' });
    if (!result.ok) throw new Error(`import of ${csv} into ${target} failed`);
    finish?.(catalog, result.written.added);
  } finally {
    catalog.close();
  }
}
