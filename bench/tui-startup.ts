/**
 * Start-up of the interactive screens on a large catalog: the time from launching `headroom` in a
 * terminal to its first usable screen (home, with the catalog's part count), as a user sees it.
 *   npm run build && node dist/bench/tui-startup.js [100k] [--runs 7]
 * The catalog is bench/out/tui-catalog-SIZE.sqlite, built once with the synthetic generator
 * (bench/synthetic-parts.ts, seed 42); bench/out is git-ignored. Each run starts
 * `node dist/src/cli/launch.cjs --catalog FILE` (what `headroom` runs; with --unbundled also the
 * unbundled dist/src/cli/main.js, for comparison) in an 80×24 pseudo-terminal (script(1), util-linux),
 * waits for the home screen, then presses q. For scale it also times, in the same pseudo-terminal,
 * bare Node to its first output and a one-line Ink program to its first frame: the floors no
 * Node program, and no Ink program, can go under on the machine.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openCatalog, writeParts } from '../src/catalog/index.js';
import type { Part } from '../src/parts/index.js';
import { median, outDirectory, readArgs, seededRandom, sizeOf } from './bench-paths.js';
import { syntheticParts } from './synthetic-parts.js';

const HOME_MARKER = 'Keys and help';
const TIMEOUT_MS = 30_000;

function ensureCatalog(size: string): string {
  const target = join(outDirectory(), `tui-catalog-${size}.sqlite`);
  if (existsSync(target)) return target;
  const temp = `${target}.building`;
  for (const suffix of ['', '-wal', '-shm']) rmSync(temp + suffix, { force: true });
  const started = performance.now();
  const catalog = openCatalog(temp);
  let chunk: Part[] = [];
  const flush = () => {
    writeParts(catalog, chunk, { by: 'bench', reason: 'tui start-up benchmark', at: '2026-01-01T00:00:00.000Z' });
    chunk = [];
  };
  for (const part of syntheticParts(sizeOf(size), seededRandom(42))) {
    chunk.push(part);
    if (chunk.length === 20_000) flush();
  }
  if (chunk.length > 0) flush();
  catalog.db.pragma('wal_checkpoint(TRUNCATE)');
  catalog.db.pragma('journal_mode = DELETE');
  catalog.close();
  renameSync(temp, target);
  console.log(`built ${target} in ${((performance.now() - started) / 1000).toFixed(1)} s`);
  return target;
}

/** Milliseconds from spawning `command` in an 80×24 pseudo-terminal until its output shows `marker`. */
function timeToMarker(command: string, marker: string, env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((done, fail) => {
    const started = performance.now();
    const child = spawn('script', ['-qfec', `stty cols 80 rows 24; exec ${command}`, '/dev/null'], { env, stdio: ['pipe', 'pipe', 'inherit'] });
    let output = '';
    let elapsed: number | undefined;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      fail(new Error(`no "${marker}" within ${TIMEOUT_MS} ms; output so far:\n${output.slice(-500)}`));
    }, TIMEOUT_MS);
    child.stdout.on('data', (data: Buffer) => {
      output += data.toString('utf8');
      if (elapsed === undefined && output.includes(marker)) {
        elapsed = performance.now() - started;
        child.stdin.write('q');
        setTimeout(() => child.kill('SIGKILL'), 2000).unref();
      }
    });
    child.on('error', (error) => {
      clearTimeout(timer);
      fail(new Error(`cannot run script(1) for a pseudo-terminal: ${error.message}`));
    });
    child.on('exit', () => {
      clearTimeout(timer);
      if (elapsed !== undefined) done(elapsed);
      else fail(new Error(`exited before showing "${marker}":\n${output.slice(-500)}`));
    });
  });
}

const { words, flags } = readArgs(process.argv.slice(2));
const size = words[0] ?? '100k';
const runs = Number(flags.get('runs') ?? 7);
const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const main = join(root, 'dist', 'src', 'cli', 'launch.cjs');
const unbundled = join(root, 'dist', 'src', 'cli', 'main.js');
const catalog = ensureCatalog(size);
// A person's terminal: under CI=true Ink writes only its last frame.
const env = { ...process.env, XDG_DATA_HOME: mkdtempSync(join(tmpdir(), 'headroom-bench-')), NO_COLOR: '', CI: 'false', CONTINUOUS_INTEGRATION: 'false' };

const inkHello = join(outDirectory(), 'ink-hello.mjs');
writeFileSync(inkHello, "import { createElement } from 'react';\nimport { render, Text } from 'ink';\nconst app = render(createElement(Text, null, 'ready'));\nprocess.stdin.once('data', () => app.unmount());\n");
const programs = {
  node: [`node -e "process.stdout.write('ready')"`, 'ready'],
  ink: [`node ${inkHello}`, 'ready'],
  headroom: [`node ${main} --catalog ${catalog}`, HOME_MARKER],
  ...(flags.has('unbundled') ? { unbundled: [`node ${unbundled} --catalog ${catalog}`, HOME_MARKER] } : {}),
} as const;
const times: Record<string, number[]> = Object.fromEntries(Object.keys(programs).map((name) => [name, []]));
// One run of each first, not counted: the file cache is warm for every counted run.
for (const [command, marker] of Object.values(programs)) await timeToMarker(command, marker, env);
for (let i = 0; i < runs; i++) {
  for (const [name, [command, marker]] of Object.entries(programs)) times[name]!.push(await timeToMarker(command, marker, env));
}
const { node: floor = [], ink = [], headroom = [], unbundled: slow } = times;
const ms = (values: number[]) => `median ${median(values).toFixed(0)} ms (min ${Math.min(...values).toFixed(0)}, max ${Math.max(...values).toFixed(0)})`;
console.log(`catalog: ${catalog} (${sizeOf(size).toLocaleString('en')} parts), ${runs} runs, load average ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
console.log(`headroom to its home screen: ${ms(headroom)}`);
if (slow) console.log(`the same, unbundled modules: ${ms(slow)}`);
console.log(`one-line Ink program to its first frame: ${ms(ink)}`);
console.log(`bare node to its first output: ${ms(floor)}`);
console.log(`headroom above the Ink floor: ${(median(headroom) - median(ink)).toFixed(0)} ms`);
