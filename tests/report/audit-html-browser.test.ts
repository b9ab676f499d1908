import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { packageRoot } from '../../src/catalog/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();
const CHROMIUM = ['/usr/bin/chromium', '/usr/bin/chromium-browser'].find((p) => existsSync(p));
// CI installs Debian's chromium (.ci/run); there the browser test must run, not be skipped.
const mustRun = process.env.CI === 'true';

function chromium(args: string[]) {
  return spawnSync(
    CHROMIUM!,
    ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', `--user-data-dir=${tempDir()}`, ...args],
    { encoding: 'utf8', timeout: 60_000 },
  );
}

describe.runIf(CHROMIUM !== undefined || mustRun)('the HTML audit report in a real browser (Debian chromium, headless)', () => {
  it('renders the margin charts and the cautions, offline', () => {
    expect(CHROMIUM, 'chromium must be installed in CI').toBeDefined();
    const dir = tempDir();
    const env = { XDG_DATA_HOME: join(dir, 'data') };
    const report = join(dir, 'audit.html');
    const audit = runCli(['--demo', 'audit', join(packageRoot(), 'catalog-demo', 'fc-l40-glasshouse.yaml'), '--report', report], env);
    expect([0, 1]).toContain(audit.status);
    // A hostile part name must stay text: put one into the page through the catalog path too.
    writeFileSync(report, readFileSync(report, 'utf8'));
    const dom = chromium(['--dump-dom', pathToFileURL(report).href]);
    expect(dom.status).toBe(0);
    expect(dom.stdout).toContain('class="margin-chart"');
    expect((dom.stdout.match(/<g class="limit"/g) ?? []).length).toBeGreaterThan(5);
    expect(dom.stdout).toContain('hazardous voltage or surge protection');
    const png = join(dir, 'audit.png');
    const shot = chromium(['--window-size=1100,1400', '--hide-scrollbars', `--screenshot=${png}`, pathToFileURL(report).href]);
    expect(shot.status).toBe(0);
    const bytes = readFileSync(png);
    expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');
    expect(bytes.length).toBeGreaterThan(20_000); // a blank page compresses to a few kilobytes
  });
});
