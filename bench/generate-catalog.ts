/**
 * Writes synthetic catalogs as CSV files in bench/out/ (never committed):
 *   node dist/bench/generate-catalog.js 10k 100k 1m [--seed 42]
 * With --sqlite it also imports each into bench/out/catalog-SIZE.sqlite (importPartsFile, as
 * `headroom catalog import` does), the catalog the search benchmark reads.
 */
import { closeSync, openSync, rmSync, writeSync } from 'node:fs';
import { writeCsv } from '../src/catalog/csv-format.js';
import { importPartsFile, openCatalog } from '../src/catalog/index.js';
import type { Part } from '../src/parts/index.js';
import { catalogPath, csvPath, readArgs, seededRandom, sizeOf } from './bench-paths.js';
import { syntheticParts } from './synthetic-parts.js';

const CHUNK = 10_000;

function writeCatalog(size: string, seed: number, isSqlite: boolean): void {
  const count = sizeOf(size);
  const path = csvPath(size);
  const started = performance.now();
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
  let also = '';
  if (isSqlite) {
    const target = catalogPath(size);
    for (const suffix of ['', '-wal', '-shm']) rmSync(target + suffix, { force: true });
    const catalog = openCatalog(target);
    const result = importPartsFile(catalog, path, 'csv', { by: 'bench', at: '2026-01-01T00:00:00.000Z' });
    catalog.close();
    if (!result.ok) throw new Error(`import of ${path} failed`);
    also = ` and ${target}`;
  }
  console.log(`${path}${also}: ${count} parts in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

const { words, flags } = readArgs(process.argv.slice(2));
const seed = Number(flags.get('seed') ?? 42);
for (const size of words.length > 0 ? words : ['10k']) writeCatalog(size, seed, flags.has('sqlite'));
