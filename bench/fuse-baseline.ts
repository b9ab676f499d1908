/**
 * The baseline: plain fuse.js over every part in memory, as a small catalog would be searched,
 * holding only the five searched fields of each part (whole parts would need several times the memory).
 * Run by search-benchmark.js in its own process so the two memory figures stay apart:
 *   node dist/bench/fuse-baseline.js CATALOG QUERIES.json
 * Prints one JSON line: load time, resident memory, and per query its time and whether the
 * intended part was in the first ten.
 */
import { readFileSync } from 'node:fs';
import Fuse from 'fuse.js';
import { openCatalog } from '../src/catalog/index.js';
import type { BenchQuery } from './search-queries.js';

const [catalogFile, queriesFile] = process.argv.slice(2);
const queries = JSON.parse(readFileSync(queriesFile!, 'utf8')) as BenchQuery[];
const started = performance.now();
const catalog = openCatalog(catalogFile!, { readonly: true });
const parts = catalog.db
  .prepare('SELECT part_number AS partNumber, manufacturer, description, package, kind FROM part')
  .all() as { partNumber: string; manufacturer: string; description: string; package: string; kind: string }[];
catalog.close();
const fuse = new Fuse(parts, { keys: ['partNumber', 'manufacturer', 'description', 'package', 'kind'], includeScore: true });
const loadMs = performance.now() - started;
const runs = queries.map((q) => {
  const t0 = performance.now();
  const top = fuse.search(q.text, { limit: 10 });
  const ms = performance.now() - t0;
  return { ms, found: q.intended === undefined ? undefined : top.some((r) => r.item.partNumber === q.intended) };
});
console.log(JSON.stringify({ loadMs, rss: process.memoryUsage().rss, runs }));
