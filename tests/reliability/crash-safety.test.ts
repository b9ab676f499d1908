import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoSourcePath } from '../../src/catalog/index.js';
import { CLI, DIST_SRC, runCli } from '../helpers/run-cli.js';
import { syntheticCsv } from '../helpers/synthetic-csv.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

/**
 * Starts a command and kills it with SIGKILL `ms` after it starts (or after its stdout first
 * shows `once`, so a loaded machine still kills it mid-work), or lets it finish if it is quicker.
 */
function killAfter(args: string[], env: Record<string, string>, ms: number, once?: string): Promise<{ wasKilled: boolean; stdout: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, args, { env: { ...process.env, ...env } });
    let stdout = '';
    let timer: NodeJS.Timeout | undefined = once === undefined ? setTimeout(() => child.kill('SIGKILL'), ms) : undefined;
    child.stdout.on('data', (d) => {
      stdout += d;
      if (timer === undefined && once !== undefined && stdout.includes(once)) timer = setTimeout(() => child.kill('SIGKILL'), ms);
    });
    child.on('close', (_code, signal) => {
      clearTimeout(timer);
      resolve({ wasKilled: signal === 'SIGKILL', stdout });
    });
  });
}

describe('a process killed mid-write', () => {
  it('leaves the catalog exactly as before when an import of 200,000 rows is killed at several points', async () => {
    const dir = tempDir();
    const env = { HEADROOM_CATALOG: join(dir, 'c.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
    const imported = runCli(['catalog', 'import', demoSourcePath()], env);
    expect(imported.status, imported.stderr).toBe(0);
    const big = join(dir, 'big.csv');
    writeFileSync(big, syntheticCsv(200_000));
    // How long a whole import takes here, into a copy, so the kills land early (reading and
    // writing rows), in the middle and late (indexes, commit) on a fast or a loaded machine.
    const scratch = { ...env, HEADROOM_CATALOG: join(dir, 'scratch.sqlite') };
    runCli(['catalog', 'import', demoSourcePath()], scratch);
    const started = performance.now();
    expect(runCli(['catalog', 'import', big], scratch).status).toBe(0);
    const wholeMs = performance.now() - started;
    let kills = 0;
    for (const share of [0.1, 0.35, 0.6, 0.85]) {
      // Taken again each time: an import that finished before its kill changed the catalog.
      const before = runCli(['catalog', 'export', '--format', 'json'], env).stdout;
      const r = await killAfter([CLI, 'catalog', 'import', big], env, wholeMs * share);
      if (!r.wasKilled) continue;
      kills++;
      const check = runCli(['catalog', 'check'], env);
      expect(check.status, check.stdout).toBe(0);
      expect(runCli(['catalog', 'export', '--format', 'json'], env).stdout).toBe(before);
    }
    expect(kills).toBeGreaterThan(0);
  }, 180_000);

  it('loses no committed approval change when killed during a run of changes', async () => {
    const dir = tempDir();
    const env = { HEADROOM_CATALOG: join(dir, 'c.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
    const imported = runCli(['catalog', 'import', demoSourcePath()], env);
    expect(imported.status, imported.stderr).toBe(0);
    const script = join(dir, 'flip.mjs');
    const catalogModule = join(DIST_SRC, 'catalog', 'index.js');
    writeFileSync(
      script,
      `const { openCatalog, changeApproval } = await import(${JSON.stringify(catalogModule)});
       const c = openCatalog(process.env.HEADROOM_CATALOG, { create: false });
       const states = ['banned', 'approved', 'pending', 'preferred'];
       for (let i = 0; ; i++) {
         changeApproval(c, 'BWK3-40A', { state: states[i % 4], reason: 'flip ' + i, by: 'crash-test' });
         process.stdout.write('committed ' + (i + 1) + '\\n');
       }`,
    );
    const r = await killAfter([script], env, 500, 'committed');
    expect(r.wasKilled).toBe(true);
    const committed = Number(r.stdout.trim().split('\n').at(-1)?.split(' ')[1] ?? 0);
    expect(committed).toBeGreaterThan(0);
    const history = JSON.parse(runCli(['catalog', 'history', 'BWK3-40A', '--json'], env).stdout).events as unknown[];
    // The import entry plus every change reported committed; at most one more committed after the last report.
    expect(history.length - 1).toBeGreaterThanOrEqual(committed);
    expect(history.length - 1).toBeLessThanOrEqual(committed + 1);
    expect(runCli(['catalog', 'check'], env).status).toBe(0);
    expect(readFileSync(env.HEADROOM_CATALOG).subarray(0, 15).toString()).toBe('SQLite format 3');
  }, 60_000);
});
