import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CLI } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

describe('output into a reader that stops early', () => {
  it('ends quietly, as `headroom catalog export | head` expects', async () => {
    const env = { ...process.env, NO_COLOR: '1', XDG_DATA_HOME: join(tempDir(), 'data') };
    const child = spawn(process.execPath, [CLI, '--demo', 'catalog', 'export', '--format', 'json'], { env });
    let stderr = '';
    child.stderr.on('data', (d) => (stderr += d));
    // Take the first piece of the export, then close the pipe as head does.
    child.stdout.once('data', () => child.stdout.destroy());
    const status = await new Promise<number | null>((done) => child.on('close', (code) => done(code)));
    expect(stderr).not.toMatch(/EPIPE|internal error|Unhandled/);
    expect(status).toBe(0);
  });
});
