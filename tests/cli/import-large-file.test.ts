import { statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/run-cli.js';
import { syntheticCsv } from '../helpers/synthetic-csv.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

/** Files of 4 MiB and more are read in a worker thread and checked row against row on the writing thread (row-feed.ts). */
describe('a large file imported through the reading worker', () => {
  it('refuses a part named twice, far apart and in another letter case, with both lines, and writes nothing', () => {
    const dir = tempDir();
    const env = { HEADROOM_CATALOG: join(dir, 'c.sqlite') };
    const text = syntheticCsv(40_000);
    const lines = text.trimEnd().split('\n');
    // Line 6 of the file is part LT-0000004; the same part again at the end, as "lt-0000004".
    const again = lines[5]!.replace('LT-0000004', 'lt-0000004').replace('Loadtest Devices', 'LOADTEST DEVICES');
    const file = join(dir, 'big.csv');
    writeFileSync(file, [...lines, again].join('\n') + '\n');
    expect(statSync(file).size).toBeGreaterThan(4 << 20);
    const r = runCli(['catalog', 'import', file], env);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`${file}:40002 column part_number value "lt-0000004": the same manufacturer and part number as line 6 (expected each part once per file)`);
    const db = new Database(env.HEADROOM_CATALOG, { readonly: true });
    expect(db.prepare('SELECT count(*) FROM part').pluck().get()).toBe(0);
    // The bulk path's rollback journal (rollback-journal.ts) is given back on failure too.
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    db.close();
  });

  it('stores every part and the distinct values its search matches words against', () => {
    const dir = tempDir();
    const env = { HEADROOM_CATALOG: join(dir, 'c.sqlite') };
    const file = join(dir, 'big.csv');
    writeFileSync(file, syntheticCsv(40_000));
    const r = runCli(['catalog', 'import', file], env);
    expect(r.status, r.stderr).toBe(0);
    const db = new Database(env.HEADROOM_CATALOG, { readonly: true });
    expect(db.prepare('SELECT count(*) FROM part').pluck().get()).toBe(40_000);
    expect(db.prepare("SELECT field, value FROM part_field_value WHERE field IN ('manufacturer', 'package', 'kind') ORDER BY field").all()).toEqual([
      { field: 'kind', value: 'rectifier' },
      { field: 'manufacturer', value: 'Loadtest Devices' },
      { field: 'package', value: 'DO-41' },
    ]);
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    db.close();
  });
});
