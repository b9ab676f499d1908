import { loadPartsSource } from '../../catalog/index.js';
import { diffParts, type PartsDiff } from '../../parts/index.js';

export interface DiffOutcome {
  readonly before: string;
  readonly after: string;
  readonly diff: PartsDiff;
}

/** Compares two exports or two catalog files; made for reviewing a change to the approved list. */
export function runCatalogDiff(before: string, after: string): DiffOutcome {
  return { before, after, diff: diffParts(loadPartsSource(before), loadPartsSource(after)) };
}
