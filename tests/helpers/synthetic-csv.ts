import { PART_COLUMNS } from '../../src/parts/index.js';

/** A CSV of many simple, valid, invented rectifiers for load and crash tests. */
export function syntheticCsv(rows: number, maker = 'Loadtest Devices'): string {
  const lines = [PART_COLUMNS.join(',')];
  for (let i = 0; i < rows; i++) {
    const cells: Record<string, string> = {
      manufacturer: maker,
      part_number: `LT-${String(i).padStart(7, '0')}`,
      kind: 'rectifier',
      package: 'DO-41',
      vrrm_v: String(100 + (i % 10) * 100),
      if_av_a: '1',
      tj_max_k: '423.15',
      vf_points: '1.1@1@298.15',
    };
    lines.push(PART_COLUMNS.map((c) => cells[c] ?? '').join(','));
  }
  return lines.join('\n') + '\n';
}
