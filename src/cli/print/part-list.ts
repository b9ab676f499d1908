import type { Part } from '../../parts/index.js';
import { textTable } from './text-table.js';
import { headlineRatings, headlineVf } from '../../parts/index.js';

export function printPartList(parts: readonly Part[], catalogPath: string): string {
  if (parts.length === 0) return `No parts match in ${catalogPath}.\nImport some with \`headroom catalog import FILE.csv\`.`;
  const table = textTable(
    [
      { header: 'Part number', max: 28 },
      { header: 'Manufacturer', max: 22 },
      { header: 'Kind' },
      { header: 'Package' },
      { header: 'Ratings', max: 30 },
      { header: 'VF' },
      { header: 'Approval' },
      { header: 'Lifecycle' },
    ],
    parts.map((p) => [p.partNumber, p.manufacturer, p.kind, p.package, headlineRatings(p), headlineVf(p), p.approval, p.lifecycle]),
  );
  return `${table}\n\n${parts.length} part${parts.length === 1 ? '' : 's'} in ${catalogPath}`;
}
