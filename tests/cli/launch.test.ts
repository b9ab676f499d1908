import { spawn, spawnSync } from 'node:child_process';
import { cpSync, mkdirSync, readdirSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { packageRoot } from '../../src/catalog/index.js';
import { CLI, runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();
const root = packageRoot();

/** A copy of the launcher and its bundles with the rest of the package linked, so caches can be spoiled safely. */
function installCopy(): string {
  const dir = tempDir();
  mkdirSync(join(dir, 'dist', 'src', 'cli'), { recursive: true });
  cpSync(CLI, join(dir, 'dist', 'src', 'cli', 'launch.cjs'));
  mkdirSync(join(dir, 'dist', 'bundle'));
  for (const name of ['cli.cjs', 'app.cjs']) cpSync(join(root, 'dist', 'bundle', name), join(dir, 'dist', 'bundle', name));
  for (const name of ['package.json', 'node_modules', 'migrations', 'catalog-demo']) symlinkSync(join(root, name), join(dir, name));
  return dir;
}

const caches = (dir: string) => readdirSync(join(dir, 'dist', 'bundle')).filter((f) => f.endsWith('.cache'));

describe('the launcher and its code cache', () => {
  it('runs a command without a cache, leaves one, and uses it the next time with the same output', () => {
    const dir = installCopy();
    const launch = join(dir, 'dist', 'src', 'cli', 'launch.cjs');
    const env = { XDG_DATA_HOME: join(dir, 'data') };
    const first = runCliAt(launch, ['--demo', 'roles', '--json'], env);
    expect(first.status, first.stderr).toBe(0);
    expect(caches(dir)).toEqual([expect.stringMatching(/^cli\.cjs\.\d+-\d+\.cache$/)]);
    const second = runCliAt(launch, ['--demo', 'roles', '--json'], env);
    expect(second.status).toBe(0);
    expect(second.stdout).toBe(first.stdout);
  });

  it('ignores a damaged cache: the command still runs and the cache is written anew', () => {
    const dir = installCopy();
    const launch = join(dir, 'dist', 'src', 'cli', 'launch.cjs');
    const env = { XDG_DATA_HOME: join(dir, 'data') };
    expect(runCliAt(launch, ['--version'], env).status).toBe(0);
    const [cache] = caches(dir);
    writeFileSync(join(dir, 'dist', 'bundle', cache!), 'not a V8 code cache');
    const r = runCliAt(launch, ['--demo', 'policies'], env);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain('commercial');
    // Rejected by V8, so the run wrote a real cache in its place.
    expect(statSync(join(dir, 'dist', 'bundle', cache!)).size).toBeGreaterThan(10_000);
  });

  it('sends `headroom` alone to the full bundle: off a terminal it prints the plain summary', () => {
    const r = runCli(['--demo'], { XDG_DATA_HOME: join(tempDir(), 'data') });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain('output is not a terminal');
    expect(r.stdout).toMatch(/112 parts/);
  });

  // script(1) (util-linux) gives the screens a pseudo-terminal, as a user's terminal would.
  it.runIf(spawnSync('script', ['--version']).status === 0)('opens the screens from the bundle in a terminal and quits on q', async () => {
    // A person's terminal: under CI=true Ink writes only the last frame, at exit.
    const env = { ...process.env, XDG_DATA_HOME: join(tempDir(), 'data'), NO_COLOR: '1', CI: 'false', CONTINUOUS_INTEGRATION: 'false' };
    const output = await new Promise<string>((resolve, reject) => {
      const child = spawn('script', ['-qfec', `stty cols 80 rows 24; exec ${JSON.stringify(process.execPath)} ${JSON.stringify(CLI)} --demo`, '/dev/null'], { env });
      let text = '';
      let quit = false;
      const timer = setTimeout(() => {
        child.kill('SIGKILL');
        reject(new Error(`no home screen with the part count within 20 s:\n${text.slice(-800)}`));
      }, 20_000);
      child.stdout.on('data', (d: Buffer) => {
        text += d.toString('utf8');
        if (!quit && text.includes('112 parts')) {
          quit = true;
          child.stdin.write('q');
        }
      });
      child.on('close', () => {
        clearTimeout(timer);
        resolve(text);
      });
    });
    expect(output).toContain('Browse the catalog');
    expect(output).toMatch(/112 parts/);
  }, 30_000);
});

function runCliAt(launch: string, args: string[], env: Record<string, string>) {
  const r = spawnSync(process.execPath, [launch, ...args], { env: { ...process.env, NO_COLOR: '1', ...env }, encoding: 'utf8' });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
