import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type BetterSqlite3 from 'better-sqlite3';
import { packageRoot } from './package-root.js';

export interface Migration {
  readonly version: number;
  readonly name: string;
  readonly sql: string;
}

let cached: Migration[] | undefined;

/** The numbered SQL files of migrations/, in order; numbers must run 1, 2, 3 … without gaps. */
export function loadMigrations(dir = join(packageRoot(), 'migrations')): Migration[] {
  if (cached && dir === join(packageRoot(), 'migrations')) return cached;
  const files = readdirSync(dir).filter((f) => /^\d{3}-[a-z0-9-]+\.sql$/.test(f)).sort();
  const migrations = files.map((file, i) => {
    const version = Number(file.slice(0, 3));
    if (version !== i + 1) throw new Error(`migration ${file} is out of sequence: expected number ${i + 1}`);
    return { version, name: file.slice(4, -4), sql: readFileSync(join(dir, file), 'utf8') };
  });
  cached = migrations;
  return migrations;
}

export function latestSchemaVersion(): number {
  return loadMigrations().length;
}

/**
 * Brings the schema up to `target`, one transaction per migration, so a failure leaves the
 * last complete version. The version is read again inside each write lock because another
 * process may have migrated meanwhile.
 */
export function migrate(db: BetterSqlite3.Database, migrations = loadMigrations(), target = migrations.length): number[] {
  const applied: number[] = [];
  for (const m of migrations) {
    if (m.version > target) break;
    const apply = db.transaction(() => {
      const current = db.pragma('user_version', { simple: true }) as number;
      if (current >= m.version) return false;
      db.exec(m.sql);
      db.pragma(`user_version = ${m.version}`);
      return true;
    });
    if (apply.immediate()) applied.push(m.version);
  }
  return applied;
}
