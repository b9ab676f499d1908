/**
 * Import of a generated CSV (bench/out/parts-SIZE.csv, from generate-catalog.js) into a new catalog:
 *   node dist/bench/import-benchmark.js 10k 100k 1m [--runs 3] [--cli-runs 3] [--out FILE]
 * Each run opens a fresh catalog and calls importPartsFile as `headroom catalog import` does, then
 * closes it (the last connection folds the write-ahead log into the file), and prints each step's
 * time (reading and writing rows, each index, the approval trail, the commit) and the peak memory of
 * the process. Then `headroom catalog import` itself, from process start to exit, with its peak
 * memory. Medians over the runs; load average before and after, the machine being shared.
 */
import { spawn } from 'node:child_process';
import { readFileSync, rmSync } from 'node:fs';
import { loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { importPartsFile, openCatalog } from '../src/catalog/index.js';
import { csvPath, mb, median, outDirectory, readArgs } from './bench-paths.js';

const { words, flags } = readArgs(process.argv.slice(2));
const runs = Number(flags.get('runs') ?? 3);
const cliRuns = Number(flags.get('cli-runs') ?? 3);
const cli = resolve(fileURLToPath(import.meta.url), '..', '..', 'src', 'cli', 'launch.cjs');
const seconds = (ms: number) => (ms / 1000).toFixed(2).padStart(7);
const load = () => loadavg().map((x) => x.toFixed(1)).join(' ');

function removeCatalog(path: string): void {
  for (const suffix of ['', '-wal', '-shm']) rmSync(path + suffix, { force: true });
}

/** One import in this process; the steps in the order they ran, and the total. */
function importOnce(size: string, target: string): { steps: [string, number][]; total: number; added: number } {
  removeCatalog(target);
  const steps: [string, number][] = [];
  const started = performance.now();
  const catalog = openCatalog(target);
  steps.push(['open catalog', performance.now() - started]);
  const result = importPartsFile(catalog, csvPath(size), 'csv', { by: 'bench', at: '2026-01-01T00:00:00.000Z', trace: (step, ms) => steps.push([step, ms]) });
  if (!result.ok) throw new Error(`import failed: ${JSON.stringify(result).slice(0, 400)}`);
  const closing = performance.now();
  catalog.close();
  steps.push(['close (write-ahead log into the file)', performance.now() - closing]);
  return { steps, total: performance.now() - started, added: result.written.added };
}

/** `headroom catalog import` in a child process: wall time and the child's peak resident memory. */
function cliOnce(size: string, target: string): Promise<{ ms: number; peakMb: number }> {
  removeCatalog(target);
  return new Promise((done, fail) => {
    const started = performance.now();
    const child = spawn(process.execPath, [cli, '--catalog', target, 'catalog', 'import', csvPath(size)], { env: { ...process.env, NO_COLOR: '1' }, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    let peakKb = 0;
    child.stderr.on('data', (d) => (stderr += d));
    // VmHWM is the peak resident size so far (Linux); read it until the process ends.
    const poll = setInterval(() => {
      try {
        peakKb = Number(/VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'))?.[1] ?? peakKb);
      } catch {
        // The process has just exited.
      }
    }, 50);
    child.on('close', (status) => {
      clearInterval(poll);
      if (status !== 0) fail(new Error(`headroom catalog import exited ${status}: ${stderr}`));
      else done({ ms: performance.now() - started, peakMb: Math.round(peakKb / 1024) });
    });
  });
}

for (const size of words.length > 0 ? words : ['10k', '100k', '1m']) {
  const target = flags.get('out') ?? join(outDirectory(), `import-${size}.sqlite`);
  console.log(`\nimport of ${csvPath(size)} (load average ${load()})`);
  const all = Array.from({ length: runs }, () => importOnce(size, target));
  const names = all[0]!.steps.map(([name]) => name);
  for (const name of names) {
    const times = all.map((r) => r.steps.find(([n]) => n === name)?.[1] ?? 0);
    console.log(`  ${name.padEnd(44)} ${seconds(median(times))} s   (${times.map((t) => (t / 1000).toFixed(2)).join(', ')})`);
  }
  const totals = all.map((r) => r.total);
  console.log(`  ${'total, importPartsFile in this process'.padEnd(44)} ${seconds(median(totals))} s   (${totals.map((t) => (t / 1000).toFixed(2)).join(', ')}); ${all[0]!.added} parts; peak rss ${mb(process.resourceUsage().maxRSS * 1024)} MB`);
  const commands = [];
  for (let i = 0; i < cliRuns; i++) commands.push(await cliOnce(size, target));
  if (commands.length > 0) {
    const ms = commands.map((c) => c.ms);
    console.log(`  ${'headroom catalog import, start to exit'.padEnd(44)} ${seconds(median(ms))} s   (${ms.map((t) => (t / 1000).toFixed(2)).join(', ')}); peak rss ${Math.max(...commands.map((c) => c.peakMb))} MB`);
  }
  console.log(`  load average after: ${load()}`);
}
