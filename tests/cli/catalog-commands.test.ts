import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoSourcePath } from '../../src/catalog/index.js';
import { PART_COLUMNS } from '../../src/parts/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

function setup() {
  const dir = tempDir();
  const env = { HEADROOM_CATALOG: join(dir, 'catalog.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
  return { dir, env };
}

describe('headroom catalog (command line)', () => {
  it('imports the demo CSV, lists, shows and exports it; export → import → export is identical', () => {
    const { dir, env } = setup();
    const imported = runCli(['catalog', 'import', demoSourcePath(), '--json'], env);
    expect(imported.status).toBe(0);
    const doc = JSON.parse(imported.stdout);
    expect(doc).toMatchObject({ format: 'headroom-output', version: 1, command: 'catalog import' });
    expect(doc.written.added).toBeGreaterThanOrEqual(80);

    const list = runCli(['catalog', 'list', '--kind', 'zener'], env);
    expect(list.status).toBe(0);
    expect(list.stdout).toMatch(/zener/);
    expect(list.stdout).not.toMatch(/schottky/);

    const first = join(dir, 'first.csv');
    expect(runCli(['catalog', 'export', first], env).status).toBe(0);
    const other = { ...env, HEADROOM_CATALOG: join(dir, 'other.sqlite') };
    expect(runCli(['catalog', 'import', first], other).status).toBe(0);
    const second = join(dir, 'second.csv');
    expect(runCli(['catalog', 'export', second], other).status).toBe(0);
    expect(readFileSync(second, 'utf8')).toBe(readFileSync(first, 'utf8'));
  });

  it('refuses a CSV with broken rows: exit 2, every row named, catalog byte-for-byte unchanged', () => {
    const { dir, env } = setup();
    runCli(['catalog', 'import', demoSourcePath()], env);
    const exported = runCli(['catalog', 'export'], env).stdout.split('\n');
    const col = (name: string) => PART_COLUMNS.indexOf(name);
    const broken = exported.map((line, i) => {
      if (i === 3) return line.split(',').map((c, j) => (j === col('kind') ? 'diode' : c)).join(',');
      if (i === 5) return line.split(',').map((c, j) => (j === col('manufacturer') ? '' : c)).join(',');
      return line;
    });
    broken.push('only,three,cells');
    const file = join(dir, 'broken.csv');
    writeFileSync(file, broken.join('\n'));
    const before = readFileSync(env.HEADROOM_CATALOG);
    const r = runCli(['catalog', 'import', file], env);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`${file}:4 column kind value "diode": missing or unknown kind`);
    expect(r.stderr).toContain(`${file}:6 column manufacturer: required`);
    expect(r.stderr).toMatch(/broken\.csv:\d+: 3 cells where the header has 44/);
    expect(r.stderr).toContain('nothing was imported');
    expect(r.stderr).toContain('Next: fix the rows named above');
    expect(readFileSync(env.HEADROOM_CATALOG).equals(before)).toBe(true);
  });

  it('adds a part from column=value pairs, reading a bare temperature as °C', () => {
    const { env } = setup();
    const r = runCli(
      ['catalog', 'add', 'manufacturer=Testwell Devices', 'part_number=TW-ADD1', 'kind=schottky', 'package=sod123', 'vrrm_v=40V', 'if_av_a=1A', 'tj_max_k=125', 'vf_points=0.45 V @ 1 A @ 25 °C', '--json'],
      env,
    );
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).part).toMatchObject({ package: 'SOD-123', tjMaxK: 398.15, vrrmV: 40 });
    const again = runCli(['catalog', 'add', 'manufacturer=Testwell Devices', 'part_number=tw-add1', 'kind=schottky', 'package=SMA', 'vrrm_v=40V', 'if_av_a=1A', 'tj_max_k=125', 'vf_points=0.45@1@25'], env);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('is already in the catalog');
    const show = runCli(['catalog', 'show', 'TW-ADD1'], env);
    expect(show.stdout).toContain('Tj max               125 °C');
  });

  it('says what is wrong with bad add arguments and exits 2', () => {
    const { env } = setup();
    const r = runCli(['catalog', 'add', 'kind=zener', 'vz_v=5.1 A', 'bogus'], env);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('"bogus" is not of the form column=value');
    const r2 = runCli(['catalog', 'add', 'kind=zener', 'vz_v=5.1 A'], env);
    expect(r2.stderr).toContain('vz_v "5.1 A": expected a voltage, got "5.1 A" (a current)');
    expect(r2.stderr).toContain('manufacturer: required');
  });

  it('gives usage errors exit 2 and help exit 0', () => {
    const { env } = setup();
    expect(runCli(['--help'], env).status).toBe(0);
    expect(runCli(['--version'], env).stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
    expect(runCli(['catalog', 'frobnicate'], env).status).toBe(2);
    const unknown = runCli(['catalog', 'show', 'NOPE-1'], env);
    expect(unknown.status).toBe(2);
    expect(unknown.stderr).toContain('no catalog at');
  });

  it('starts nothing interactive when stdout is not a terminal', () => {
    const { env } = setup();
    const r = runCli([], env);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('not a terminal');
    const demo = runCli(['--demo'], env);
    expect(demo.stdout).toMatch(/Catalog .*demo\.sqlite: \d+ parts/);
  });
});
