/**
 * Writes synthetic catalogs as CSV files in bench/out/ (never committed):
 *   node dist/bench/generate-catalog.js 10k 100k 1m [--seed 42]
 * With --sqlite it also writes bench/out/catalog-SIZE.sqlite straight through writeParts
 * (no CSV parse or validation), the quick way to a catalog for the search benchmark.
 */
import { closeSync, openSync, writeSync } from 'node:fs';
import { rmSync } from 'node:fs';
import { writeCsv } from '../src/catalog/csv-format.js';
import { openCatalog, writeParts } from '../src/catalog/index.js';
import type { Part } from '../src/parts/index.js';
import { catalogPath, csvPath, readArgs, seededRandom, sizeOf } from './bench-paths.js';
import { syntheticParts } from './synthetic-parts.js';

const CHUNK = 10_000;

function writeCatalog(size: string, seed: number, isSqlite: boolean): void {
  const count = sizeOf(size);
  const path = csvPath(size);
  const started = performance.now();
  const fd = openSync(path, 'w');
  const target = catalogPath(size);
  if (isSqlite) for (const suffix of ['', '-wal', '-shm']) rmSync(target + suffix, { force: true });
  const catalog = isSqlite ? openCatalog(target) : undefined;
  let chunk: Part[] = [];
  let isFirst = true;
  // Chunks keep memory flat; only the first keeps its header row.
  const flush = () => {
    const text = writeCsv(chunk);
    writeSync(fd, isFirst ? text : text.slice(text.indexOf('\n') + 1));
    isFirst = false;
    if (catalog) writeParts(catalog, chunk, { by: 'bench', reason: 'generated', at: '2026-01-01T00:00:00.000Z' });
    chunk = [];
  };
  for (const part of syntheticParts(count, seededRandom(seed))) {
    chunk.push(part);
    if (chunk.length === CHUNK) flush();
  }
  if (chunk.length > 0) flush();
  closeSync(fd);
  catalog?.db.pragma('wal_checkpoint(TRUNCATE)');
  catalog?.close();
  const also = catalog ? ` and ${target}` : '';
  console.log(`${path}${also}: ${count} parts in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

const { words, flags } = readArgs(process.argv.slice(2));
const seed = Number(flags.get('seed') ?? 42);
for (const size of words.length > 0 ? words : ['10k']) writeCatalog(size, seed, flags.has('sqlite'));
