import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { packageRoot } from '../../src/catalog/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();
const demo = (file: string) => join(packageRoot(), 'catalog-demo', file);

function envFor(dir: string) {
  return { HEADROOM_CATALOG: join(dir, 'c.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
}

describe('headroom solve and roles', () => {
  it('solves a position as JSON with a format version, limits, steps and the safety caution', () => {
    const r = runCli(['solve', demo('fc-l40-glasshouse.yaml'), '--ref', 'd101', '--json'], envFor(tempDir()));
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc).toMatchObject({ format: 'headroom-output', version: 1, command: 'solve', ref: 'D101', role: 'rectifier', policy: 'industrial' });
    const position = doc.result.position;
    expect(position.limits.map((l: { id: string }) => l.id)).toContain('vrrm');
    expect(position.steps.length).toBeGreaterThan(5);
    expect(position.cautions.some((c: { level: string }) => c.level === 'safety')).toBe(true);
    for (const step of position.steps) expect(Number.isFinite(step.value)).toBe(true);
  });

  it('prints the derivation for people, with the caution first for a mains position', () => {
    const r = runCli(['solve', demo('fc-l40-glasshouse.yaml'), '--ref', 'D101'], envFor(tempDir()));
    expect(r.status).toBe(0);
    expect(r.stdout.split('\n')[1]).toMatch(/^! Hazardous voltage or surge protection/);
    expect(r.stdout).toContain('Limits a part must meet');
    expect(r.stdout).toContain('Derivation');
  });

  it('names file, line and field of a bad condition, and exits 2', () => {
    const dir = tempDir();
    const file = join(dir, 'bad.yaml');
    writeFileSync(
      file,
      ['format: headroom-design', 'version: 1', 'name: Bad', 'positions:', '  - ref: D1', '    role: buck-freewheel', '    conditions:', '      vin_min: 20 V', '      vin_max: 16 V', '      vout: 5 A', '      iout: 1 A', '      frequency: 100 kHz', ''].join('\n'),
    );
    const r = runCli(['solve', file, '--ref', 'D1'], envFor(dir));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`${file}:10 positions[0].conditions.vout: expected a voltage, got "5 A" (a current)`);
    // Relations between conditions are checked once every condition reads as a quantity.
    writeFileSync(file, readFileSync(file, 'utf8').replace('vout: 5 A', 'vout: 5 V'));
    const r2 = runCli(['solve', file, '--ref', 'D1'], envFor(dir));
    expect(r2.status).toBe(2);
    expect(r2.stderr).toMatch(/bad\.yaml:\d+ positions\[0\]\.conditions\.vin_min: .*above/);
  });

  it('reports an infeasible design with its reason and exit code 1', () => {
    const dir = tempDir();
    const file = join(dir, 'infeasible.yaml');
    writeFileSync(
      file,
      ['format: headroom-design', 'version: 1', 'name: No headroom', 'positions:', '  - ref: D7', '    role: zener-regulator', '    conditions:', '      vin_min: 6 V', '      vin_max: 9 V', '      vz: 6V2', '      load_max: 1 mA', ''].join('\n'),
    );
    const r = runCli(['solve', file, '--ref', 'D7', '--json'], envFor(dir));
    expect(r.status).toBe(1);
    const doc = JSON.parse(r.stdout);
    expect(doc.result.ok).toBe(false);
    expect(doc.result.infeasible.reason).toMatch(/no feasible design because/i);
  });

  it('refuses a design file that is not YAML, and an unknown position', () => {
    const dir = tempDir();
    const file = join(dir, 'not.yaml');
    writeFileSync(file, 'format: headroom-design\nversion: 1\nname: [unclosed\n');
    const r = runCli(['solve', file, '--ref', 'D1'], envFor(dir));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not readable as YAML/);
    const unknown = runCli(['solve', demo('fc-m24-tiller.yaml'), '--ref', 'D99'], envFor(dir));
    expect(unknown.status).toBe(2);
    expect(unknown.stderr).toContain('no position D99');
  });

  it('solves every position of both demo products', () => {
    const env = envFor(tempDir());
    for (const [file, refs] of [
      ['fc-m24-tiller.yaml', ['D1', 'D2', 'D3', 'D4', 'D5', 'D6', 'D7', 'D8', 'D9', 'D10', 'D11', 'D12']],
      ['fc-l40-glasshouse.yaml', ['D101', 'D105', 'D106', 'D107', 'D108', 'D109', 'D110']],
    ] as const) {
      for (const ref of refs) {
        const r = runCli(['solve', demo(file), '--ref', ref, '--json'], env);
        expect(r.status, `${file} ${ref}: ${r.stderr}`).toBe(0);
        expect(JSON.parse(r.stdout).result.ok).toBe(true);
      }
    }
  });

  it('lists every role with its inputs', () => {
    const r = runCli(['roles', '--json'], envFor(tempDir()));
    const ids = JSON.parse(r.stdout).roles.map((x: { id: string }) => x.id);
    expect(ids).toEqual(['rectifier', 'buck-freewheel', 'boost-output', 'flyback-output', 'coil-freewheel', 'polarity-guard', 'zener-regulator', 'transient-clamp', 'signal-clamp']);
  });
});

describe('headroom junction', () => {
  it('estimates a one-sided abrupt junction from its doping (Sze & Gibbons; Sze & Ng §2.4.3, from memory)', () => {
    const r = runCli(['junction', '--doping', '1e16', '--json'], { XDG_DATA_HOME: '/nonexistent' });
    expect(r.status).toBe(0);
    const e = JSON.parse(r.stdout).estimate;
    // 60·(1.12/1.1)^1.5 V at 1e16 cm⁻³ with Eg = 1.12 eV
    expect(e.breakdownV).toBeCloseTo(60 * (1.12 / 1.1) ** 1.5, 6);
    expect(e.mechanism).toBe('avalanche');
  });

  it('says what to type when the doping is missing or malformed', () => {
    const r = runCli(['junction', '--doping', 'lots'], { XDG_DATA_HOME: '/nonexistent' });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('doping_cm3');
  });
});
