import type BetterSqlite3 from 'better-sqlite3';
import { seededRandom } from './bench-paths.js';

/** A query and, for typo queries, the part number it was made from. */
export interface BenchQuery {
  readonly text: string;
  readonly group: 'keystroke' | 'typo';
  readonly slip?: 'wrong' | 'missing' | 'extra' | 'swapped' | 'no-hyphens';
  readonly intended?: string;
}

/** Words and filters people type besides part numbers. */
export const WORD_QUERIES: readonly string[] = [
  'sma', 'sod123', 'do41', 'smb', 'to220ac', 'schottky', 'zener', 'tvs', 'ultrafast', 'signal',
  'brackwater', 'ketterby', 'automotive', 'low leakage', 'glass passivated',
  'schottky sma vrrm>=40V if>=2A', 'zener vz=5.1V tol<=2%', 'tvs vrwm>=24V pppm>=600W approval=preferred',
  'maker=brackwater -obsolete', 'ultrafast vrrm>=600V trr<=50ns', 'schottky cj<=15pF', 'tj>=175C ultrafast',
  'rectifier price<=0.05', 'zener vz=3.3..3.9V sod323', 'vf<=0.5V schottky', 'sic vrrm>=1200V to247',
];

/** Part numbers picked evenly at random from the catalog, the same ones for the same seed. */
export function samplePartNumbers(db: BetterSqlite3.Database, count: number, seed: number): string[] {
  const max = (db.prepare('SELECT max(id) FROM part').pluck().get() as number | null) ?? 0;
  const pick = db.prepare('SELECT part_number FROM part WHERE id >= ? ORDER BY id LIMIT 1').pluck();
  const random = seededRandom(seed);
  const out = new Set<string>();
  for (let tries = 0; out.size < count && tries < count * 10; tries++) {
    const found = pick.get(1 + Math.floor(random() * max)) as string | undefined;
    if (found) out.add(found);
  }
  return [...out];
}

/** A part number typed one character at a time, as the search box sees it. */
export function keystrokes(partNumber: string): string[] {
  return Array.from({ length: partNumber.length }, (_, i) => partNumber.slice(0, i + 1));
}

/** The slips a hand makes, placed away from the first character (people see a wrong first letter). */
export function typos(partNumber: string, random: () => number): BenchQuery[] {
  const at = 1 + Math.floor(random() * (partNumber.length - 2));
  const typo = (slip: BenchQuery['slip'], text: string): BenchQuery => ({ text, group: 'typo', slip, intended: partNumber });
  const letter = partNumber[at]!;
  const other = /\d/.test(letter) ? String((Number(letter) + 3) % 10) : letter === 'X' ? 'Y' : 'X';
  const out = [
    typo('wrong', partNumber.slice(0, at) + other + partNumber.slice(at + 1)),
    typo('missing', partNumber.slice(0, at) + partNumber.slice(at + 1)),
    typo('extra', partNumber.slice(0, at) + other + partNumber.slice(at)),
    typo('swapped', partNumber.slice(0, at) + partNumber[at + 1] + partNumber[at] + partNumber.slice(at + 2)),
  ];
  if (partNumber.includes('-')) out.push(typo('no-hyphens', partNumber.replace(/-/g, '')));
  return out.filter((q) => q.text !== partNumber);
}

export function benchQueries(db: BetterSqlite3.Database, options: { typed: number; typo: number; seed: number }): BenchQuery[] {
  const typed = samplePartNumbers(db, options.typed, options.seed);
  const forTypos = samplePartNumbers(db, options.typo, options.seed + 1);
  const random = seededRandom(options.seed + 2);
  return [
    ...typed.flatMap((pn) => keystrokes(pn).map((text): BenchQuery => ({ text, group: 'keystroke' }))),
    ...WORD_QUERIES.map((text): BenchQuery => ({ text, group: 'keystroke' })),
    ...forTypos.flatMap((pn) => typos(pn, random)),
  ];
}
