/**
 * `headroom audit` of a 500-position design against synthetic catalogs (bench/candidates/pick-catalog.ts):
 *   npm run build && node dist/bench/audit.bench.js 10k 100k 1m [--runs 5] [--positions 500]
 * The design repeats the ten example positions of catalog-demo/roles with a part assigned to each:
 * nine in ten get the best-ranked part for their position, one in ten a part drawn at random from
 * the catalog (a planted fault, so the audit also searches for suggestions). Reports the median
 * and worst wall-clock time of the whole audit, and the time from process start for the command.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { stringify } from 'yaml';
import { auditDesign } from '../src/catalog/audit-design.js';
import { findCandidates } from '../src/catalog/candidates.js';
import { openCatalog, packageRoot } from '../src/catalog/index.js';
import { readDesignText, type Design } from '../src/circuits/design-file.js';
import { solvePosition } from '../src/circuits/solve-position.js';
import { median, outDirectory, readArgs, seededRandom } from './bench-paths.js';
import { ensurePickCatalog } from './candidates/pick-catalog.js';

const ROLES = ['buck-freewheel', 'rectifier', 'boost-output', 'flyback-output', 'coil-freewheel', 'polarity-guard', 'signal-clamp', 'zener-regulator', 'transient-clamp'];
const { words, flags } = readArgs(process.argv.slice(2));
const runs = Number(flags.get('runs') ?? 5);
const count = Number(flags.get('positions') ?? 500);
const cli = resolve(fileURLToPath(import.meta.url), '..', '..', 'src', 'cli', 'launch.cjs');

function templates(): { role: string; conditions: Record<string, unknown>; policy?: string }[] {
  return ROLES.flatMap((role) => {
    const file = join(packageRoot(), 'catalog-demo', 'roles', `${role}.yaml`);
    const read = readDesignText(file, readFileSync(file, 'utf8'));
    if (!read.ok) throw new Error(`${file} does not read`);
    return read.design.positions.map((p) => ({ role: p.role, conditions: { ...p.conditions }, ...(read.design.policy ? { policy: read.design.policy } : {}) }));
  });
}

for (const size of words.length > 0 ? words : ['10k', '100k', '1m']) {
  const path = ensurePickCatalog(size, (line) => console.log(line));
  const catalog = openCatalog(path);
  const random = seededRandom(7);
  const total = (catalog.db.prepare('SELECT max(id) AS n FROM part').get() as { n: number }).n;
  const anyPart = catalog.db.prepare('SELECT manufacturer, part_number FROM part WHERE id >= ? LIMIT 1');
  const shapes = templates();
  const best = shapes.map((t) => {
    const design: Design = { file: 'bench', name: 'bench', positions: [{ ref: 'X1', role: t.role, ...(t.policy ? { policy: t.policy } : {}), conditions: t.conditions, conditionLines: {}, line: 1, index: 0 }] };
    const solved = solvePosition(design, design.positions[0]!);
    if (!solved.ok || !solved.result.ok) return undefined;
    const top = findCandidates(catalog, solved.result.position, solved.policy, { wanted: 1 }).ranking.candidates[0]?.evaluation.part;
    return top ? `${top.manufacturer}:${top.partNumber}` : undefined;
  });
  const positions = Array.from({ length: count }, (_, i) => {
    const k = i % shapes.length;
    const planted = random() < 0.1 || best[k] === undefined;
    const row = anyPart.get(1 + Math.floor(random() * total)) as { manufacturer: string; part_number: string };
    const part = planted ? `${row.manufacturer}:${row.part_number}` : best[k]!;
    return { ref: `D${i + 1}`, role: shapes[k]!.role, ...(shapes[k]!.policy ? { policy: shapes[k]!.policy } : {}), part, conditions: shapes[k]!.conditions };
  });
  const text = stringify({ format: 'headroom-design', version: 1, name: `Benchmark board, ${count} positions`, positions }, { aliasDuplicateObjects: false });
  const designFile = join(outDirectory(), `audit-design-${count}.yaml`);
  writeFileSync(designFile, text);
  const read = readDesignText(designFile, text);
  if (!read.ok) throw new Error(`benchmark design does not read: ${JSON.stringify(read.issues.slice(0, 3))}`);
  const times: number[] = [];
  let failing = 0;
  for (let i = 0; i < runs + 1; i++) {
    const t0 = performance.now();
    const result = auditDesign(catalog, read.design);
    const t = performance.now() - t0;
    failing = result.counts.fail;
    if (i > 0) times.push(t); // the first run warms the JIT and the page cache
  }
  catalog.close();
  const started = performance.now();
  const r = spawnSync(process.execPath, [cli, '--catalog', path, 'audit', designFile, '--json'], { encoding: 'utf8', maxBuffer: 1 << 28 });
  const cliMs = performance.now() - started;
  console.log(`${size}: audit of ${count} positions (${failing} failing) median ${median(times).toFixed(0)} ms, worst ${Math.max(...times).toFixed(0)} ms; command from process start ${cliMs.toFixed(0)} ms (exit ${r.status})`);
}
