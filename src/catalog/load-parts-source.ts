import { existsSync, readFileSync } from 'node:fs';
import { extname } from 'node:path';
import type { Part } from '../parts/index.js';
import { CatalogError } from './catalog-error.js';
import { openCatalog } from './open-catalog.js';
import { formatFromPath, readPartsText } from './part-file.js';
import { listParts } from './part-repository.js';
import { formatRowIssue } from './row-issue.js';

/** All parts of an export (.csv/.json) or of a catalog file (.sqlite/.db), for comparing the two. */
export function loadPartsSource(path: string): Part[] {
  if (!existsSync(path)) throw new CatalogError('not-found', `no file ${path}`, 'check the path');
  const format = formatFromPath(path);
  if (format) {
    const reading = readPartsText(path, readFileSync(path, 'utf8'), format);
    if (reading.issues.length > 0) {
      throw new CatalogError('damaged', `${path} has ${reading.issues.length} bad rows:\n  ${reading.issues.slice(0, 20).map(formatRowIssue).join('\n  ')}`, 'fix the file first');
    }
    return reading.parts.map((p) => p.part);
  }
  if (!['.sqlite', '.db', '.sqlite3'].includes(extname(path).toLowerCase())) {
    throw new CatalogError('not-found', `cannot tell what ${path} is`, 'compare .csv or .json exports, or .sqlite catalog files');
  }
  const catalog = openCatalog(path, { create: false, readonly: true });
  try {
    return listParts(catalog);
  } finally {
    catalog.close();
  }
}
