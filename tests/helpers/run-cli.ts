import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';

/** The command line as `headroom` and `npm start` run it: the launcher and its bundles (npm test builds first). */
export const CLI = join(import.meta.dirname, '..', '..', 'dist', 'src', 'cli', 'launch.cjs');
/** The compiled modules behind it, for tests that call the core from a child process. */
export const DIST_SRC = join(import.meta.dirname, '..', '..', 'dist', 'src');

export interface CliRun {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs the built command line (npm test builds first) with its own catalog and data folder. */
export function runCli(args: readonly string[], env: Record<string, string>, input?: string): CliRun {
  const r = spawnSync(process.execPath, [CLI, ...args], {
    env: { ...process.env, NO_COLOR: '1', ...env },
    encoding: 'utf8',
    input: input ?? '',
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

export function runCliAsync(args: readonly string[], env: Record<string, string>): Promise<CliRun> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [CLI, ...args], { env: { ...process.env, NO_COLOR: '1', ...env } });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    child.stderr.on('data', (d) => (stderr += d));
    child.on('close', (status) => resolve({ status, stdout, stderr }));
  });
}
