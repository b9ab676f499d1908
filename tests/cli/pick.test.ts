import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/run-cli.js';

// Runs the built command line (npm run build first) on the bundled demo catalog.
const ROLES = join(import.meta.dirname, '..', '..', 'catalog-demo', 'roles');
let dir = '';
let env: Record<string, string> = {};

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'headroom-pick-'));
  env = { XDG_DATA_HOME: join(dir, 'data'), HEADROOM_CATALOG: join(dir, 'none.sqlite') };
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const pick = (...args: string[]) => runCli(['--demo', 'pick', ...args], env);

describe('headroom pick (command line)', () => {
  it('ranks the demo catalog for the buck catch diode: exit 0, every candidate explained', () => {
    const r = pick(join(ROLES, 'buck-freewheel.yaml'), '--ref', 'D4', '--top', '3');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('D4 · role buck-freewheel · derating policy commercial');
    expect(r.stdout).toMatch(/^1\s+Brackwater Semiconductor BWK3-60B\s+preferred\s+pass\s+VRRM 20 %/m);
    expect(r.stdout).toContain('1. Brackwater Semiconductor BWK3-60B: VRRM 60.0 V against 48.0 V needed after 80 % derating: 20 % headroom');
    expect(r.stdout).toMatch(/score [\d.]+ = margin [\d.]+ \(tightest VRRM 20 % headroom.*\) \+ approval 20 \(preferred\) \+ lifecycle 0 \(active\) \+ price/);
    expect(r.stdout).toContain('the search is complete');
  });

  it('writes the whole evaluation as versioned JSON with --json', () => {
    const r = pick(join(ROLES, 'buck-freewheel.yaml'), '--ref', 'D4', '--top', '2', '--json');
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc).toMatchObject({ format: 'headroom-output', version: 1, command: 'pick', ref: 'D4', role: 'buck-freewheel', top: 2 });
    const best = doc.search.ranking.candidates[0];
    expect(best.evaluation.verdict).toBe('pass');
    expect(Object.keys(best.scoreParts)).toEqual(['margin', 'approval', 'lifecycle', 'price', 'package']);
    expect(best.evaluation.limits.map((l: { limitId: string }) => l.limitId)).toEqual(['vrrm', 'if-av', 'tj']);
    expect(best.evaluation.thermal.losses.totalW).toBeGreaterThan(0);
    expect(doc.search.ranking.candidates).toHaveLength(2);
  });

  it('exits 1 and names the closest parts when none passes (1 µA leakage at 70 °C)', () => {
    const r = pick(join(ROLES, 'signal-clamp.yaml'), '--ref', 'D9', '--top', '2');
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('No catalog part passes; the closest are:');
    expect(r.stdout).toMatch(/✗1\. .*: fails IR: IR [\d.]+ µA at 32\.0 V and Tj [\d.]+ °C is above the 1\.00 µA allowed/);
    const json = pick(join(ROLES, 'signal-clamp.yaml'), '--ref', 'D9', '--json');
    expect(json.status).toBe(1);
    expect(JSON.parse(json.stdout).search.ranking.passingCount).toBe(0);
  });

  it('shows where the part a design assigns ranks', () => {
    const design = join(dir, 'assigned.yaml');
    writeFileSync(design, readFileSync(join(ROLES, 'buck-freewheel.yaml'), 'utf8').replace('role: buck-freewheel', 'role: buck-freewheel\n    part: QFK50-100C'));
    const r = pick(design, '--ref', 'D4', '--top', '2');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Assigned part QFK50-100C: rank 3 \(pass, score [\d.]+\)\./);
    const unknown = join(dir, 'unknown.yaml');
    writeFileSync(unknown, readFileSync(join(ROLES, 'buck-freewheel.yaml'), 'utf8').replace('role: buck-freewheel', 'role: buck-freewheel\n    part: NO-SUCH-PART'));
    expect(pick(unknown, '--ref', 'D4').stdout).toMatch(/Assigned part NO-SUCH-PART: no part "NO-SUCH-PART" in /);
  });

  it('exits 2 on usage errors, with what to do next', () => {
    const noRef = pick(join(ROLES, 'buck-freewheel.yaml'));
    expect(noRef.status).toBe(2);
    expect(noRef.stderr).toContain('which position? name it with --ref');
    const badTop = pick(join(ROLES, 'buck-freewheel.yaml'), '--ref', 'D4', '--top', '0');
    expect(badTop.status).toBe(2);
    expect(badTop.stderr).toContain('--top must be a whole number from 1 to 200, got "0"');
    const json = pick(join(ROLES, 'buck-freewheel.yaml'), '--ref', 'D99', '--json');
    expect(json.status).toBe(2);
    expect(JSON.parse(json.stdout)).toMatchObject({ command: 'error' });
  });
});
