import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { syntheticCsv } from '../helpers/synthetic-csv.js';
import { runCliAsync } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

describe('two processes writing one catalog', () => {
  it('an import and repeated adds from another process all succeed, and no trail entry is lost', async () => {
    const dir = tempDir();
    const env = { HEADROOM_CATALOG: join(dir, 'shared.sqlite') };
    const file = join(dir, 'big.csv');
    const rows = 20_000;
    writeFileSync(file, syntheticCsv(rows));
    const importing = runCliAsync(['catalog', 'import', file], env);
    let isImportDone = false;
    void importing.then(() => (isImportDone = true));
    const adds = [];
    for (let i = 0; i < 40 && !isImportDone; i++) {
      const r = await runCliAsync(
        ['catalog', 'add', 'manufacturer=Othertask Devices', `part_number=OT-${i}`, 'kind=zener', 'package=SOD-123', 'vz_v=5V1', 'vz_tol=5%', 'izt_a=5mA', 'pd_w=500mW', 'tj_max_k=150'],
        env,
      );
      adds.push(r);
    }
    const imported = await importing;
    expect(imported.stderr).toBe('');
    expect(imported.status).toBe(0);
    expect(adds.length).toBeGreaterThan(0);
    for (const r of adds) {
      expect(r.stderr).not.toMatch(/locked|busy/i);
      expect(r.status).toBe(0);
    }
    const db = new Database(env.HEADROOM_CATALOG, { readonly: true });
    const parts = (db.prepare('SELECT count(*) AS n FROM part').get() as { n: number }).n;
    const events = (db.prepare('SELECT count(*) AS n FROM approval_event').get() as { n: number }).n;
    db.close();
    expect(parts).toBe(rows + adds.length);
    expect(events).toBe(rows + adds.length);
  });
});
