import { partSchema } from '../parts/part-schema.js';
import type { Catalog } from './open-catalog.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from './part-rows.js';
import { plainSchemaWording } from '../parts/schema-wording.js';

export interface CheckFinding {
  readonly check: 'sqlite-integrity' | 'part-schema' | 'history';
  readonly message: string;
}

export interface CatalogCheck {
  readonly path: string;
  readonly schemaVersion: number;
  readonly parts: number;
  readonly historyEntries: number;
  readonly findings: readonly CheckFinding[];
  readonly isHealthy: boolean;
}

/**
 * SQLite's own integrity check, then ours: every stored part still valid against its schema, and
 * the approval trail consistent with the current states (each part's last entry is its state now,
 * and each entry starts where the one before it ended).
 */
export function checkCatalog(catalog: Catalog, limit = 50): CatalogCheck {
  const { db } = catalog;
  const findings: CheckFinding[] = [];
  const integrity = db.pragma('integrity_check') as { integrity_check: string }[];
  for (const row of integrity) if (row.integrity_check !== 'ok') findings.push({ check: 'sqlite-integrity', message: row.integrity_check });
  const foreign = db.pragma('foreign_key_check') as unknown[];
  if (foreign.length > 0) findings.push({ check: 'sqlite-integrity', message: `${foreign.length} foreign-key violations` });

  let parts = 0;
  for (const row of db.prepare(`SELECT ${ROW_COLUMNS.join(', ')} FROM part`).iterate() as IterableIterator<PartRow>) {
    parts++;
    if (findings.length >= limit) continue;
    const parsed = partSchema.safeParse(rowToPart(row), { error: plainSchemaWording });
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      findings.push({ check: 'part-schema', message: `${row.manufacturer} ${row.part_number}: ${issue.path.join('.')} ${issue.message}` });
    }
  }

  const events = db.prepare('SELECT manufacturer, part_number, from_state, to_state FROM approval_event ORDER BY manufacturer COLLATE NOCASE, part_number COLLATE NOCASE, id').all() as {
    manufacturer: string;
    part_number: string;
    from_state: string | null;
    to_state: string;
  }[];
  const current = new Map(
    (db.prepare('SELECT manufacturer, part_number, approval FROM part').all() as { manufacturer: string; part_number: string; approval: string }[]).map((r) => [
      `${r.manufacturer}\u0000${r.part_number}`.toLowerCase(),
      r.approval,
    ]),
  );
  const last = new Map<string, string>();
  for (const e of events) {
    const key = `${e.manufacturer}\u0000${e.part_number}`.toLowerCase();
    const before = last.get(key);
    if (before !== undefined && e.from_state !== before && findings.length < limit) {
      findings.push({ check: 'history', message: `${e.manufacturer} ${e.part_number}: an entry starts from ${e.from_state} but the one before ended at ${before}` });
    }
    last.set(key, e.to_state);
  }
  for (const [key, state] of current) {
    const trail = last.get(key);
    if (trail !== undefined && trail !== state && findings.length < limit) {
      findings.push({ check: 'history', message: `${key.replace('\u0000', ' ')}: state ${state}, but its trail ends at ${trail}` });
    }
  }
  return {
    path: catalog.path,
    schemaVersion: db.pragma('user_version', { simple: true }) as number,
    parts,
    historyEntries: events.length,
    findings,
    isHealthy: findings.length === 0,
  };
}
