import { RECTIFYING_KINDS, TVS_KINDS, isRectifying, isTvs, type Part } from '../parts/index.js';
import type { Catalog } from './open-catalog.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from './part-rows.js';

/** Enough to rank in a moment even in a million-part catalog where one package holds many. */
export const MAX_CANDIDATES = 5000;

/**
 * Parts that could sit on the original's footprint doing its job: the same package and a kind of
 * the same family, not banned and not obsolete, the original itself left out.
 */
export function replacementCandidates(catalog: Catalog, original: Part): Part[] {
  const kinds: readonly string[] = isRectifying(original.kind) ? RECTIFYING_KINDS : isTvs(original.kind) ? TVS_KINDS : [original.kind];
  const rows = catalog.db
    .prepare(
      `SELECT ${ROW_COLUMNS.join(', ')} FROM part
       WHERE package = ? AND kind IN (${kinds.map(() => '?').join(', ')})
         AND approval <> 'banned' AND lifecycle <> 'obsolete'
         AND NOT (manufacturer = ? COLLATE NOCASE AND part_number = ? COLLATE NOCASE)
       LIMIT ${MAX_CANDIDATES}`,
    )
    .all(original.package, ...kinds, original.manufacturer, original.partNumber) as PartRow[];
  return rows.map(rowToPart);
}
