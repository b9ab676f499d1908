import { describePart, type Part } from '../../parts/index.js';
import { safeText } from '../output.js';

/** Every rating of a part with its test condition, one per line. */
export function printPartDetail(part: Part): string {
  const rows = describePart(part);
  const line = (r: { label: string; value: string }) => `  ${r.label.padEnd(20)} ${safeText(r.value)}`;
  return [
    `${safeText(part.manufacturer)} ${safeText(part.partNumber)}`,
    ...rows.filter((r) => r.section === 'identity').map(line),
    '  Ratings',
    ...rows.filter((r) => r.section === 'ratings').map(line),
  ].join('\n');
}
