import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { packageRoot } from '../../src/catalog/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();
const design = join(packageRoot(), 'catalog-demo', 'fc-m24-tiller.yaml');

describe('headroom swap', () => {
  it('exits 1 for an alternate that is not a safe drop-in, with the comparison as JSON', () => {
    const env = { XDG_DATA_HOME: join(tempDir(), 'data') };
    const r = runCli(['--demo', 'swap', 'BWK3-40A', 'ODK40-3000A', '--json'], env);
    expect(r.status).toBe(1);
    const doc = JSON.parse(r.stdout);
    expect(doc).toMatchObject({ format: 'headroom-output', command: 'swap', mode: 'check', check: { isDropIn: false } });
    expect(doc.check.parameters.find((p: { label: string }) => p.label === 'IFSM').comparison).toBe('better');
  });

  it('judges in a circuit and lists replacements with --find', () => {
    const env = { XDG_DATA_HOME: join(tempDir(), 'data') };
    const inCircuit = runCli(['--demo', 'swap', 'BWK3-40A', 'BWK2-60A', '--design', design, '--ref', 'D4'], env);
    expect(inCircuit.stdout).toContain('In the circuit');
    const find = runCli(['--demo', 'swap', 'BWK3-40A', '--find', '--design', design, '--ref', 'D4', '--top', '3'], env);
    expect(find.stdout).toMatch(/^ {3}1\. /m);
    expect(find.stdout.match(/^ +\d+\. /gm)).toHaveLength(3);
  });

  it('refuses bad input with exit 2: unknown part, the same part twice, --design without --ref', () => {
    const env = { XDG_DATA_HOME: join(tempDir(), 'data') };
    expect(runCli(['--demo', 'swap', 'NOPE-1', 'BWK3-40A'], env).stderr).toContain('no part "NOPE-1"');
    const same = runCli(['--demo', 'swap', 'BWK3-40A', 'bwk3-40a'], env);
    expect(same.status).toBe(2);
    expect(same.stderr).toContain('the original and the alternate are the same part');
    expect(runCli(['--demo', 'swap', 'BWK3-40A', 'ODK40-3000A', '--design', design], env).stderr).toContain('--design and --ref go together');
  });
});
