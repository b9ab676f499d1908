#!/usr/bin/env node
/**
 * What `headroom` runs: a command goes to dist/bundle/cli.cjs (the commands without the
 * interactive screens), `headroom` alone to app.cjs (everything), each compiled with V8's code
 * cache.
 * Why: on Node 20 most of a cold start is compiling JavaScript; a code cache made by an earlier
 * run lets V8 skip that (bench/README.md, start-up). The cache is an optimisation only: a missing,
 * stale or rejected cache (other Node version, other flags) means a normal compile, and the run
 * then leaves a fresh cache behind for the next one. Build: src/build/bundle.ts.
 */
import { closeSync, openSync, readSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { Script } from 'node:vm';

// CommonJS (.cts), unlike the rest: Node starts a CommonJS entry without its ES module loader.
const bundleDir = join(__dirname, '..', '..', 'bundle');

/** Reads up to `size` bytes of a file into the start of `buffer`; the count read, 0 when unreadable. */
function readInto(path: string, buffer: Buffer, size: number): number {
  let fd: number | undefined;
  try {
    fd = openSync(path, 'r');
    let read = 0;
    for (let n = -1; read < size && n !== 0; read += n) n = readSync(fd, buffer, read, size - read, read);
    return read;
  } catch {
    return 0;
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

function sizeOf(path: string): number {
  try {
    return statSync(path).size;
  } catch {
    return 0;
  }
}

function loadBundle(name: string): void {
  const file = join(bundleDir, `${name}.cjs`);
  // V8 checks a cache against the source's length, not its text: name the cache after the
  // bundle's size and time so a rebuilt bundle never meets an old cache.
  const { size, mtimeMs } = statSync(file);
  const cacheFile = `${file}.${size}-${Math.trunc(mtimeMs)}.cache`;
  // One buffer serves both files: fresh memory costs a page fault per 4 KiB on first touch, a
  // large share of a cold start (bench/README.md, start-up), so the cache is read over the
  // bundle's bytes once they are copied into the source string.
  const buffer = Buffer.allocUnsafeSlow(Math.max(size, sizeOf(cacheFile)));
  if (readInto(file, buffer, size) !== size) throw new Error(`cannot read ${file}`);
  // The bundles are ASCII and already wrapped as a CommonJS function (src/build/bundle.ts): read
  // as Latin-1, V8 keeps one byte a character, and compiles the text as it is.
  const source = buffer.toString('latin1', 0, size);
  const cacheSize = readInto(cacheFile, buffer, buffer.length);
  const cachedData = cacheSize > 0 ? buffer.subarray(0, cacheSize) : undefined;
  const script = new Script(source, { filename: file, cachedData });
  const module = { exports: {} as unknown };
  script.runInThisContext()(module.exports, createRequire(file), module, file, bundleDir);
  if (cachedData === undefined || script.cachedDataRejected || process.env.HEADROOM_REFRESH_CODE_CACHE === '1') {
    // At exit the cache also holds every function this run compiled, not just the top level.
    process.once('exit', () => {
      try {
        const temp = `${cacheFile}.${process.pid}`;
        writeFileSync(temp, script.createCachedData());
        renameSync(temp, cacheFile);
      } catch {
        // A read-only install runs without a cache: slower to start, nothing else.
      }
    });
  }
}

/** The same test as main.ts: no command word and no help or version asked for opens the screens. */
function opensScreens(args: readonly string[]): boolean {
  const words = args.filter((a, i) => !a.startsWith('-') && args[i - 1] !== '--catalog');
  return words.length === 0 && !args.some((a) => ['--help', '-h', '--version', '-V'].includes(a));
}

loadBundle(opensScreens(process.argv.slice(2)) ? 'app' : 'cli');
