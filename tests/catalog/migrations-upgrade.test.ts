import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { approvalHistory, checkCatalog, latestSchemaVersion, listParts, listTeamPolicies, loadMigrations, migrate, openCatalog } from '../../src/catalog/index.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();
const earlier = Array.from({ length: latestSchemaVersion() - 1 }, (_, i) => i + 1);

const BASELINE = 'a'.repeat(64);

/** A catalog as a program of schema version `v` would have written it, with data in every table it had. */
function catalogAtVersion(path: string, v: number): void {
  const db = new Database(path);
  db.pragma('journal_mode = WAL');
  migrate(db, loadMigrations(), v);
  db.prepare(
    `INSERT INTO part (manufacturer, part_number, kind, package, description, vrrm_v, if_av_a, tj_max_k, vf_points, ir_points, rth_ja_k_per_w, updated_at)
     VALUES ('Oldtime Devices', 'OT-600', 'rectifier', 'DO-41', 'kept since v${v}', 600, 1, 423.15, '[{"vfV":1.1,"ifA":1,"tjK":298.15}]', '[{"irA":5e-6,"vrV":600,"tjK":298.15}]', 65, '2025-06-01')`,
  ).run();
  if (v >= 2) {
    db.prepare("UPDATE part SET approval = 'conditional', approval_note = 'only below 60 °C', second_source_group = 'R1A-DO41'").run();
    db.prepare("INSERT INTO approval_event (manufacturer, part_number, at, by, from_state, to_state, note, reason) VALUES ('Oldtime Devices', 'OT-600', '2025-06-01', 'ce', NULL, 'conditional', 'only below 60 °C', 'first review')").run();
  }
  if (v >= 3) {
    const policy = {
      id: 'old-rules',
      name: 'Old rules',
      description: '',
      factors: Object.fromEntries(['vrrm', 'ifAv', 'ifsm', 'pd', 'pppm'].map((k) => [k, { value: 0.7, source: 'house rule' }])),
      tj: { marginBelowMaxK: 30, source: 'house rule' },
    };
    db.prepare("INSERT INTO derating_policy (id, body, updated_at, updated_by) VALUES ('old-rules', ?, '2025-06-01', 'ce')").run(JSON.stringify(policy));
    // Baselines had a table of their own until migration 006 moved them into the part row.
    if (v < 6) db.prepare("INSERT INTO import_baseline (manufacturer, part_number, row_digest, source, imported_at) VALUES ('oldtime devices', 'ot-600', ?, 'team.csv', '2025-06-01')").run(BASELINE);
    else db.prepare('UPDATE part SET import_digest = ?').run(BASELINE);
  }
  db.close();
}

describe('upgrading a catalog of every earlier schema version', () => {
  it.each(earlier)('from version %i keeps every part, trail entry and policy, and leaves a backup', (v) => {
    const path = join(tempDir(), `v${v}.sqlite`);
    catalogAtVersion(path, v);
    const catalog = openCatalog(path);
    expect(catalog.migrated).toEqual(loadMigrations().map((m) => m.version).filter((x) => x > v));
    expect(catalog.backupPath).toBe(`${path}.before-v${latestSchemaVersion()}.bak`);
    const [part] = listParts(catalog);
    expect(part).toMatchObject({ partNumber: 'OT-600', description: `kept since v${v}`, vrrmV: 600, rthJaKPerW: 65, irPoints: [{ irA: 5e-6, vrV: 600, tjK: 298.15 }] });
    if (v >= 2) {
      expect(part).toMatchObject({ approval: 'conditional', approvalNote: 'only below 60 °C', secondSourceGroup: 'R1A-DO41' });
      expect(approvalHistory(catalog, part!).map((e) => e.reason)).toEqual(['first review']);
    }
    if (v >= 3) expect(listTeamPolicies(catalog).map((p) => p.id)).toEqual(['old-rules']);
    // Migration 006: the import baseline moves into the part row; the key and the word index are filled.
    expect(catalog.db.prepare('SELECT import_digest, search_key FROM part').get()).toEqual({ import_digest: v >= 3 ? BASELINE : null, search_key: 'OT600' });
    expect(catalog.db.prepare('SELECT field, value FROM part_field_value ORDER BY field').all()).toEqual([
      { field: 'description', value: `kept since v${v}` },
      { field: 'kind', value: 'rectifier' },
      { field: 'manufacturer', value: 'Oldtime Devices' },
      { field: 'package', value: 'DO-41' },
    ]);
    catalog.db.exec("INSERT INTO part_search (part_search, rank) VALUES ('integrity-check', 1)");
    expect(checkCatalog(catalog).isHealthy).toBe(true);
    // Migration 007: identity and typed prefixes walk one index.
    expect(catalog.db.prepare("SELECT name FROM sqlite_schema WHERE type = 'index' AND tbl_name = 'part' AND sql IS NOT NULL ORDER BY name").pluck().all()).toEqual(['part_candidate', 'part_group', 'part_key']);
    catalog.close();
    const backup = new Database(`${path}.before-v${latestSchemaVersion()}.bak`, { readonly: true });
    expect(backup.pragma('user_version', { simple: true })).toBe(v);
    backup.close();
  });
});
