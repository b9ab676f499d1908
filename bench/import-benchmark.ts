/**
 * Times the existing import path on a generated CSV, phase by phase, into bench/out/catalog-SIZE.sqlite:
 *   node --max-old-space-size=16384 dist/bench/import-benchmark.js 1m [--search-index deferred|per-row|none]
 * Phases: read + CSV parse, decode + validate (parseQuantity, zod), write (writeParts, one transaction,
 * every index and trigger). --search-index shows what the search index costs: `deferred` as shipped
 * (new rows indexed in one statement at the end), `per-row` by its triggers (writeParts called on
 * 150 parts at a time inside one transaction, below the bulk threshold), `none` without the index.
 * With --end-to-end it times importPartsFile as `headroom catalog import` runs it (conflict check and
 * import baselines included), without the phase split.
 */
import { readFileSync, rmSync } from 'node:fs';
import { readCsvRecords } from '../src/catalog/csv-format.js';
import { decodePartCells } from '../src/catalog/part-cells.js';
import { importPartsFile, openCatalog, writeParts } from '../src/catalog/index.js';
import type { Part } from '../src/parts/index.js';
import { catalogPath, csvPath, mb, readArgs } from './bench-paths.js';

const { words, flags } = readArgs(process.argv.slice(2));
const size = words[0] ?? '10k';
const searchIndex = flags.get('search-index') ?? 'deferred';
const target = flags.get('out') ?? catalogPath(size);
const seconds = (ms: number) => (ms / 1000).toFixed(2);

if (flags.has('end-to-end')) {
  for (const suffix of ['', '-wal', '-shm']) rmSync(target + suffix, { force: true });
  const started = performance.now();
  const catalog = openCatalog(target);
  const result = importPartsFile(catalog, csvPath(size), 'csv', { by: 'bench', at: '2026-01-01T00:00:00.000Z' });
  catalog.db.pragma('wal_checkpoint(TRUNCATE)');
  catalog.close();
  const added = result.ok ? result.written.added : `failed: ${JSON.stringify(result.issues.slice(0, 2))}`;
  console.log(`importPartsFile of ${size}: ${added} added in ${seconds(performance.now() - started)} s, peak rss ${mb(process.resourceUsage().maxRSS * 1024)} MB`);
  process.exit(0);
}

const t0 = performance.now();
const text = readFileSync(csvPath(size), 'utf8');
const read = readCsvRecords(csvPath(size), text);
const t1 = performance.now();
const parts: Part[] = [];
let bad = 0;
for (const record of read.records) {
  const decoded = decodePartCells(record.cells, { bareTemperatureUnit: 'K' });
  if (decoded.ok) parts.push(decoded.part);
  else if (bad++ < 3) console.error(`line ${record.line}:`, decoded.issues);
}
const t2 = performance.now();

for (const suffix of ['', '-wal', '-shm']) rmSync(target + suffix, { force: true });
const catalog = openCatalog(target);
if (searchIndex === 'none') {
  for (const t of ['part_search_ai', 'part_search_ad', 'part_search_au']) catalog.db.exec(`DROP TRIGGER ${t}`);
  catalog.db.exec('DROP TABLE part_search_deferral; DROP TABLE part_search');
}
const t3 = performance.now();
const context = { by: 'bench', reason: 'import benchmark', at: '2026-01-01T00:00:00.000Z' };
const PER_ROW_CHUNK = 150;
const summary =
  searchIndex === 'per-row'
    ? catalog.db.transaction(() => {
        let added = 0;
        for (let i = 0; i < parts.length; i += PER_ROW_CHUNK) added += writeParts(catalog, parts.slice(i, i + PER_ROW_CHUNK), context).added;
        return { added };
      })()
    : writeParts(catalog, parts, context);
const t4 = performance.now();
const t4b = performance.now();
catalog.db.pragma('wal_checkpoint(TRUNCATE)');
catalog.close();
const t5 = performance.now();

console.log(`import of ${size}: ${read.records.length} records, ${bad} invalid, ${summary.added} added; search index: ${searchIndex}`);
console.log(`  read + CSV parse      ${seconds(t1 - t0)} s`);
console.log(`  decode + validate     ${seconds(t2 - t1)} s`);
console.log(`  write (transaction)   ${seconds(t4 - t3)} s`);
console.log(`  checkpoint + close    ${seconds(t5 - t4b)} s`);
console.log(`  total                 ${seconds(t5 - t0)} s   peak rss ${mb(process.resourceUsage().maxRSS * 1024)} MB`);
