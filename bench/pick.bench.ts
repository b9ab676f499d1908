/**
 * Candidate search and `headroom pick` timings on synthetic catalogs (bench/candidates/pick-catalog.ts):
 *   npm run build && node dist/bench/pick.bench.js 10k 100k 1m [--runs 15] [--cli-runs 5]
 * A missing catalog is built first (about 5 minutes for 1m). Reports wall-clock median and p95 per
 * position, the process CPU time beside it (on a busy machine the two part), how many parts the
 * search read from the index and evaluated, and whether it proved its top complete; then the time
 * from process start to the end of `headroom pick` for a few positions.
 */
import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { findCandidates } from '../src/catalog/candidates.js';
import { openCatalog, packageRoot } from '../src/catalog/index.js';
import { findPolicy } from '../src/circuits/derating.js';
import { runSolve } from '../src/cli/commands/solve.js';
import { median, percentile, readArgs } from './bench-paths.js';
import { ensurePickCatalog } from './candidates/pick-catalog.js';

/** Demo design positions: broad (rectifier, coil), hot (buck, boost, flyback), narrow (zener, TVS), none passing (signal). */
const POSITIONS: readonly [string, string][] = [
  ['buck-freewheel', 'D4'], ['rectifier', 'D1'], ['boost-output', 'D5'], ['flyback-output', 'D107'],
  ['coil-freewheel', 'D5'], ['coil-freewheel', 'D3'], ['polarity-guard', 'D1'], ['signal-clamp', 'D9'],
  ['zener-regulator', 'D7'], ['transient-clamp', 'D2'],
];
const CLI_POSITIONS: readonly [string, string][] = [['buck-freewheel', 'D4'], ['coil-freewheel', 'D5'], ['zener-regulator', 'D7']];

const { words, flags } = readArgs(process.argv.slice(2));
const runs = Number(flags.get('runs') ?? 15);
const cliRuns = Number(flags.get('cli-runs') ?? 5);
const ms = (x: number) => x.toFixed(1).padStart(7);
const design = (role: string) => join(packageRoot(), 'catalog-demo', 'roles', `${role}.yaml`);
const cli = resolve(fileURLToPath(import.meta.url), '..', '..', 'src', 'cli', 'launch.cjs');

for (const size of words.length > 0 ? words : ['10k', '100k', '1m']) {
  const path = ensurePickCatalog(size, (line) => console.log(line));
  const catalog = openCatalog(path);
  console.log(`\n${size} parts (${path})`);
  console.log('position                 wall median     p95   cpu median   read  evaluated  complete  passing');
  const medians: number[] = [];
  for (const [role, ref] of POSITIONS) {
    const solved = runSolve(design(role), ref, { catalog: path });
    if (!solved.result.ok) continue;
    const position = solved.result.position;
    const policy = findPolicy(solved.policy)!;
    const walls: number[] = [];
    const cpus: number[] = [];
    let last;
    for (let i = 0; i < runs + 2; i++) {
      const cpu0 = process.cpuUsage();
      const t0 = performance.now();
      last = findCandidates(catalog, position, policy, { wanted: 10 });
      const wall = performance.now() - t0;
      const cpu = process.cpuUsage(cpu0);
      // The first two runs warm the JIT and SQLite's page cache.
      if (i >= 2) {
        walls.push(wall);
        cpus.push((cpu.user + cpu.system) / 1000);
      }
    }
    medians.push(median(walls));
    console.log(
      `${`${role} ${ref}`.padEnd(24)} ${ms(median(walls))} ${ms(percentile(walls, 0.95))}  ${ms(median(cpus))}    ${String(last!.read).padStart(5)}  ${String(last!.evaluated).padStart(9)}  ${String(last!.isComplete).padStart(8)}  ${String(last!.ranking.passingCount).padStart(7)}`,
    );
  }
  console.log(`median over positions: ${median(medians).toFixed(1)} ms; slowest position: ${Math.max(...medians).toFixed(1)} ms`);
  catalog.close();

  console.log('headroom pick, process start to exit (wall, ms):');
  for (const [role, ref] of CLI_POSITIONS) {
    const times: number[] = [];
    for (let i = 0; i < cliRuns; i++) {
      const t0 = performance.now();
      const r = spawnSync(process.execPath, [cli, '--catalog', path, 'pick', design(role), '--ref', ref], { encoding: 'utf8' });
      times.push(performance.now() - t0);
      if (r.status === 2) throw new Error(r.stderr);
    }
    console.log(`  ${`${role} ${ref}`.padEnd(22)} median ${ms(median(times))}  p95 ${ms(percentile(times, 0.95))}`);
  }
}
