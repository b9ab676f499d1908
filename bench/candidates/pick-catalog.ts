/**
 * Synthetic catalogs for the pick benchmark, built straight from the search helper's generator
 * (bench/synthetic-parts.ts) into bench/out/pick-catalog-SIZE.sqlite, with every migration applied.
 * Kept apart from catalog-SIZE.sqlite so the two benchmarks never write each other's files.
 */
import { existsSync, renameSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { openCatalog, writeParts } from '../../src/catalog/index.js';
import type { Part } from '../../src/parts/index.js';
import { outDirectory, seededRandom, sizeOf } from '../bench-paths.js';
import { syntheticParts } from '../synthetic-parts.js';

const CHUNK = 50_000;
const SEED = 42;

export function pickCatalogPath(size: string): string {
  return join(outDirectory(), `pick-catalog-${size}.sqlite`);
}

/** The catalog of `size` parts, built once (into a temporary file renamed into place). */
export function ensurePickCatalog(size: string, log: (line: string) => void = () => {}): string {
  const target = pickCatalogPath(size);
  if (existsSync(target)) return target;
  const temp = `${target}.building`;
  for (const suffix of ['', '-wal', '-shm']) rmSync(temp + suffix, { force: true });
  const started = performance.now();
  const catalog = openCatalog(temp);
  try {
    let chunk: Part[] = [];
    let written = 0;
    const flush = () => {
      writeParts(catalog, chunk, { by: 'bench', reason: 'pick benchmark', at: '2026-01-01T00:00:00.000Z' });
      written += chunk.length;
      chunk = [];
      log(`  ${written} parts written (${((performance.now() - started) / 1000).toFixed(0)} s)`);
    };
    for (const part of syntheticParts(sizeOf(size), seededRandom(SEED))) {
      chunk.push(part);
      if (chunk.length === CHUNK) flush();
    }
    if (chunk.length > 0) flush();
    catalog.db.pragma('optimize');
    catalog.db.pragma('journal_mode = DELETE');
  } finally {
    catalog.close();
  }
  renameSync(temp, target);
  return target;
}
