import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoSourcePath } from '../../src/catalog/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

const DESIGN = `# test board with planted faults
format: headroom-design
version: 1
name: Audit fixture
policy: commercial
positions:
  - ref: D4            # passes
    role: buck-freewheel
    part: BWK3-60B
    conditions: { vin_min: 18 V, vin_max: 32 V, vout: 5 V, iout: 1.2 A, frequency: 400 kHz, inductance: 22 µH, ambient_max: 70 °C }
  - ref: D1            # runs away thermally and drops too much
    role: polarity-guard
    part: BWK1-100F
    conditions: { mode: series, supply_max: 32 V, reverse_max: 53 V, load_max: 0.6 A, drop_max: 0.7 V, ambient_max: 70 °C }
  - ref: D2            # pending review: not approved for use
    role: transient-clamp
    part: ODT-U33-B
    conditions: { working_max: 30 V, withstand: 60 V, open_circuit_voltage: 100 V, source_impedance: 5 Ω, waveform: 10/1000 µs }
  - ref: D5            # part comes from the BOM; the datasheet has no RθJA: unknown
    role: coil-freewheel
    conditions: { supply_max: 32 V, coil_resistance: 800 Ω, coil_inductance: 0.6 H, pwm_frequency: 1 kHz, duty_min: 50 % }
  - ref: D9            # nothing assigned anywhere
    role: signal-clamp
    conditions: { reverse_max: 32 V, forward_peak: 5 mA }
`;

const BOM = `Item,Designator,Mfr,Mfr Part,Qty,Notes
1,D5,Testwell Devices,TW-NORTH,1,no thermal data
2,D20,Brackwater Semiconductor,BWR1-1000L,1,not in the design
`;

function setup() {
  const dir = tempDir();
  const env = { HEADROOM_CATALOG: join(dir, 'c.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
  expect(runCli(['catalog', 'import', demoSourcePath()], env).status).toBe(0);
  const add = runCli(
    ['catalog', 'add', 'manufacturer=Testwell Devices', 'part_number=TW-NORTH', 'kind=rectifier', 'package=DO-41', 'approval=approved', 'vrrm_v=400 V', 'if_av_a=1 A', 'ifsm_a=30 A', 'tj_max_k=150 °C', 'vf_points=1.0 V @ 1 A @ 25 °C'],
    env,
  );
  expect(add.status, add.stderr).toBe(0);
  writeFileSync(join(dir, 'board.yaml'), DESIGN);
  writeFileSync(join(dir, 'bom.csv'), BOM);
  return { dir, env };
}

describe('headroom audit', () => {
  it('finds every planted fault, passes the good position and exits 1', () => {
    const { dir, env } = setup();
    const r = runCli(['audit', join(dir, 'board.yaml'), '--bom', join(dir, 'bom.csv'), '--bom-columns', 'ref=Designator,maker=Mfr,part=Mfr Part', '--json'], env);
    expect(r.status).toBe(1);
    const doc = JSON.parse(r.stdout);
    const by = Object.fromEntries(doc.positions.map((p: { ref: string; status: string; findings: string[] }) => [p.ref, p]));
    expect(Object.fromEntries(Object.entries(by).map(([k, v]) => [k, (v as { status: string }).status]))).toEqual({ D4: 'pass', D1: 'fail', D2: 'fail', D5: 'fail', D9: 'fail', D20: 'unchecked' });
    expect(by.D1.findings.join(' ')).toMatch(/thermal runaway/);
    expect(by.D2.findings[0]).toBe('ODT-U33-B is not approved for use: pending');
    expect(by.D5.partSource).toBe('bom');
    expect(by.D5.findings.join(' ')).toMatch(/unknown|no RθJA|cannot/i);
    expect(by.D9.findings).toEqual(['no part assigned (neither a part: key in the design nor a BOM line)']);
    expect(by.D20.findings[0]).toContain('the design gives no conditions for D20');
    expect(by.D1.suggestion?.part.partNumber).toBeTruthy();
  });

  it('writes a Markdown report for review and a self-contained HTML page', () => {
    const { dir, env } = setup();
    const md = join(dir, 'audit.md');
    const r = runCli(['audit', join(dir, 'board.yaml'), '--report', md], env);
    expect(r.status).toBe(1);
    const text = readFileSync(md, 'utf8');
    expect(text).toContain('## Diode audit: Audit fixture');
    expect(text).toContain('| D4 | buck-freewheel | Brackwater Semiconductor BWK3-60B | PASS |');
    const html = join(dir, 'audit.html');
    runCli(['audit', join(dir, 'board.yaml'), '--report', html], env);
    const page = readFileSync(html, 'utf8');
    expect(page).toContain('<svg class="margin-chart"');
    expect(page).not.toMatch(/<script|https?:\/\//);
  });

  it('refuses a BOM whose columns cannot be found, naming the headers', () => {
    const { dir, env } = setup();
    const r = runCli(['audit', join(dir, 'board.yaml'), '--bom', join(dir, 'bom.csv')], env);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('no part number column');
    expect(r.stderr).toContain('"Mfr Part"');
    expect(existsSync(join(dir, 'nothing.md'))).toBe(false);
  });
});
