import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { CatalogError } from './catalog-error.js';
import { demoCatalogPath } from './catalog-location.js';
import { importPartsText } from './import-parts.js';
import { openCatalog } from './open-catalog.js';
import { packageRoot } from './package-root.js';
import { formatRowIssue } from './row-issue.js';

export function demoSourcePath(): string {
  return join(packageRoot(), 'catalog-demo', 'parts.csv');
}

/**
 * Builds the demo catalog from catalog-demo/parts.csv when it is missing or the CSV changed,
 * into a temporary file renamed into place, so a half-built demo is never opened.
 * The demo is rebuilt rather than migrated: it holds nothing of the user's.
 */
export function ensureDemoCatalog(target = demoCatalogPath()): string {
  const source = demoSourcePath();
  const text = readFileSync(source, 'utf8');
  const digest = createHash('sha256').update(text).digest('hex').slice(0, 16);
  const stamp = `${target}.source`;
  if (existsSync(target) && existsSync(stamp) && readFileSync(stamp, 'utf8') === digest) return target;

  mkdirSync(dirname(target), { recursive: true });
  const temp = `${target}.building-${process.pid}`;
  rmSync(temp, { force: true });
  const catalog = openCatalog(temp);
  try {
    const result = importPartsText(catalog, source, text, 'csv', { by: 'demo', at: '2026-01-05T09:00:00.000Z' });
    if (!result.ok) {
      throw new CatalogError('damaged', `the bundled demo catalog has errors:\n${result.issues.map(formatRowIssue).join('\n')}`);
    }
    catalog.db.pragma('journal_mode = DELETE'); // one self-contained file to move into place
  } finally {
    catalog.close();
  }
  for (const suffix of ['-wal', '-shm']) rmSync(target + suffix, { force: true });
  renameSync(temp, target);
  writeStamp(stamp, digest);
  return target;
}

function writeStamp(path: string, digest: string): void {
  const temp = `${path}.${process.pid}`;
  // Written after the catalog, so a crash in between only causes a rebuild.
  writeFileSync(temp, digest);
  renameSync(temp, path);
}
