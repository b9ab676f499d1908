/**
 * Writes synthetic catalogs as CSV files in bench/out/ (never committed):
 *   node dist/bench/generate-catalog.js 10k 100k 1m [--seed 42]
 * With --sqlite it also imports each into bench/out/catalog-SIZE.sqlite (importPartsFile, as
 * `headroom catalog import` does), the catalog the search benchmark reads.
 */
import { catalogPath, csvPath, readArgs, sizeOf } from './bench-paths.js';
import { importCatalog, writeSyntheticCsv } from './synthetic-catalog.js';

function writeCatalog(size: string, seed: number, isSqlite: boolean): void {
  const count = sizeOf(size);
  const path = csvPath(size);
  const started = performance.now();
  writeSyntheticCsv(path, count, seed);
  let also = '';
  if (isSqlite) {
    const target = catalogPath(size);
    importCatalog(path, target);
    also = ` and ${target}`;
  }
  console.log(`${path}${also}: ${count} parts in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

const { words, flags } = readArgs(process.argv.slice(2));
const seed = Number(flags.get('seed') ?? 42);
for (const size of words.length > 0 ? words : ['10k']) writeCatalog(size, seed, flags.has('sqlite'));
