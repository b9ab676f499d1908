/**
 * Search benchmark on bench/out/catalog-SIZE.sqlite (make it with generate-catalog.js --sqlite
 * or import-benchmark.js):
 *   node dist/bench/search-benchmark.js 1m [--typed 12] [--typo 40] [--baseline 8] [--seed 7] [--catalog FILE]
 * Per-keystroke queries (real part numbers typed a character at a time, package and kind words,
 * filters) and typo queries, through searchParts; then the same queries, cut to --baseline of
 * each group, through plain fuse.js over all parts in a child process (0 skips it).
 */
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openCatalog } from '../src/catalog/index.js';
import { createCatalogSearch } from '../src/catalog/search/index.js';
import { catalogPath, mb, median, outDirectory, percentile, readArgs } from './bench-paths.js';
import { benchQueries, type BenchQuery } from './search-queries.js';

const { words, flags } = readArgs(process.argv.slice(2));
const size = words[0] ?? '10k';
const option = (name: string, fallback: number) => Number(flags.get(name) ?? fallback);
const file = flags.get('catalog') ?? catalogPath(size);

const t0 = performance.now();
const catalog = openCatalog(file, { readonly: true });
const search = createCatalogSearch(catalog);
const queries = benchQueries(catalog.db, { typed: option('typed', 12), typo: option('typo', 40), seed: option('seed', 7) });
search(queries[0]!.text);
const startMs = performance.now() - t0;

interface Run {
  readonly query: BenchQuery;
  readonly ms: number;
  readonly found?: boolean;
  /** The typo is itself another part's number, which then rightly comes first. */
  readonly namesAnother: boolean;
}
const once = (q: BenchQuery): Run => {
  const r = search(q.text, { limit: 10 });
  if (!r.ok) throw new Error(`${q.text}: ${r.issues.map((i) => i.message).join('; ')}`);
  const found = q.intended === undefined ? undefined : r.results.some((h) => h.part.partNumber === q.intended);
  const namesAnother = q.intended !== undefined && r.results[0]?.score === 1 && r.results[0].part.partNumber !== q.intended;
  return { query: q, ms: r.elapsedMs, namesAnother, ...(found === undefined ? {} : { found }) };
};
// One pass to warm statements and pages, as a session in use has; the second is measured.
queries.forEach(once);
const runs = queries.map(once);
const rss = process.memoryUsage().rss;
catalog.close();

const ms = (runs: readonly Run[]) => runs.map((r) => r.ms);
const keystroke = runs.filter((r) => r.query.group === 'keystroke');
const typo = runs.filter((r) => r.query.group === 'typo');
const recall = (rs: readonly Run[]) => {
  const fair = rs.filter((r) => !r.namesAnother);
  const other = rs.length - fair.length;
  return `${fair.filter((r) => r.found).length}/${fair.length}${other > 0 ? ` (+${other} typed another part's number)` : ''}`;
};
const f = (x: number) => (x >= 100 ? x.toFixed(0) : x.toFixed(2));

console.log(`search benchmark, ${size} parts (${file}), started in ${f(startMs)} ms, rss ${mb(rss)} MB`);
console.log(`  keystroke: ${keystroke.length} queries, median ${f(median(ms(keystroke)))} ms, p95 ${f(percentile(ms(keystroke), 0.95))} ms, max ${f(Math.max(...ms(keystroke)))} ms`);
console.log(`  typo:      ${typo.length} queries, median ${f(median(ms(typo)))} ms, p95 ${f(percentile(ms(typo), 0.95))} ms, intended part in top 10: ${recall(typo)}`);
for (const slip of ['wrong', 'missing', 'extra', 'swapped', 'no-hyphens'] as const) {
  const rs = typo.filter((r) => r.query.slip === slip);
  if (rs.length > 0) console.log(`    ${slip.padEnd(10)} median ${f(median(ms(rs)))} ms, found ${recall(rs)}`);
}
const slowest = [...runs].sort((a, b) => b.ms - a.ms).slice(0, 5);
console.log(`  slowest: ${slowest.map((r) => `${JSON.stringify(r.query.text)} ${f(r.ms)} ms`).join(', ')}`);

const perGroup = option('baseline', 8);
if (perGroup > 0) {
  // Spread over the typed part numbers, not only the first one's prefixes.
  const pickEvenly = (rs: readonly Run[]) => rs.filter((_, i) => i % Math.max(1, Math.floor(rs.length / perGroup)) === 0).slice(0, perGroup);
  const chosen = [...pickEvenly(keystroke), ...pickEvenly(typo)];
  const queriesFile = join(outDirectory(), `baseline-queries-${size}.json`);
  writeFileSync(queriesFile, JSON.stringify(chosen.map((r) => r.query)));
  const script = fileURLToPath(new URL('./fuse-baseline.js', import.meta.url));
  const out = execFileSync(process.execPath, ['--max-old-space-size=8192', script, file, queriesFile], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const baseline = JSON.parse(out.trim().split('\n').pop()!) as { loadMs: number; rss: number; runs: { ms: number; found?: boolean }[] };
  const side = (group: string) => {
    const idx = chosen.map((r, i) => [r, i] as const).filter(([r]) => r.query.group === group);
    const oursMs = median(idx.map(([r]) => r.ms));
    const fuseMs = median(idx.map(([, i]) => baseline.runs[i]!.ms));
    const found = idx.filter(([, i]) => baseline.runs[i]!.found).length;
    const foundNote = group === 'typo' ? `, fuse found ${found}/${idx.length}, ours ${idx.filter(([r]) => r.found).length}/${idx.length}` : '';
    console.log(`    ${group.padEnd(9)} ${idx.length} queries: ours median ${f(oursMs)} ms, fuse.js ${f(fuseMs)} ms, ours/fuse ${(oursMs / fuseMs).toExponential(1)}${foundNote}`);
  };
  console.log(`  baseline (plain fuse.js over all parts, same queries, a subset): load ${f(baseline.loadMs)} ms, rss ${mb(baseline.rss)} MB`);
  side('keystroke');
  side('typo');
}
