import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { demoSourcePath, latestSchemaVersion, loadMigrations, migrate } from '../../src/catalog/index.js';
import { runCli } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

function goodCatalog(dir: string): string {
  const path = join(dir, 'good.sqlite');
  expect(runCli(['catalog', 'import', demoSourcePath()], { HEADROOM_CATALOG: path }).status).toBe(0);
  const db = new Database(path);
  db.pragma('journal_mode = DELETE'); // one self-contained file to damage
  db.close();
  return path;
}

describe('foreign and damaged files', () => {
  it.each([
    ['a truncated catalog', (dir: string) => {
      const path = join(dir, 'truncated.sqlite');
      writeFileSync(path, readFileSync(goodCatalog(dir)).subarray(0, 8192));
      return path;
    }, /cannot (use|open)|damaged|malformed|not a database/i],
    ['a file that is not SQLite', (dir: string) => {
      const path = join(dir, 'parts.sqlite');
      writeFileSync(path, readFileSync(demoSourcePath()));
      return path;
    }, /is not a SQLite database/],
    ['a catalog from a newer version', (dir: string) => {
      const path = join(dir, 'newer.sqlite');
      copyFileSync(goodCatalog(dir), path);
      const db = new Database(path);
      db.pragma(`user_version = ${latestSchemaVersion() + 1}`);
      db.close();
      return path;
    }, /written by a newer Headroom .* It was left untouched/],
  ])('%s: a clear message, exit 2, the file unchanged', (_name, make, message) => {
    const dir = tempDir();
    const path = make(dir);
    const before = readFileSync(path);
    for (const args of [['catalog', 'list'], ['catalog', 'import', demoSourcePath()], ['catalog', 'approval', 'BWK3-40A', 'banned', '--reason', 'x']]) {
      const r = runCli(['--catalog', path, ...args], {});
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(readFileSync(path).equals(before)).toBe(true);
    }
  });

  it('names the backup it takes before upgrading an older catalog', () => {
    const dir = tempDir();
    const path = join(dir, 'v2.sqlite');
    const db = new Database(path);
    migrate(db, loadMigrations(), 2);
    db.close();
    const r = runCli(['--catalog', path, 'catalog', 'info'], {});
    expect(r.status).toBe(0);
    expect(r.stderr).toContain(`the previous file was copied to ${path}.before-v${latestSchemaVersion()}.bak`);
  });

  it('refuses a design file that is not YAML and leaves it unchanged', () => {
    const dir = tempDir();
    const path = join(dir, 'design.yaml');
    writeFileSync(path, '\u0000\u0001PNG binary junk: [unclosed');
    const before = readFileSync(path);
    const r = runCli(['solve', path, '--ref', 'D1'], { XDG_DATA_HOME: join(dir, 'data') });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/design\.yaml:1 : not readable as YAML|design\.yaml:\d+.*not readable as YAML/);
    expect(readFileSync(path).equals(before)).toBe(true);
  });
});
