import { mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Catalog sizes the benchmarks know, by the name typed on the command line. */
export const SIZES: Record<string, number> = { '1k': 1_000, '10k': 10_000, '100k': 100_000, '1m': 1_000_000 };

/** bench/out beside the sources, whether run from bench/ or compiled into dist/bench/. */
export function outDirectory(): string {
  const here = dirname(fileURLToPath(import.meta.url));
  const root = here.includes(`${join('dist', 'bench')}`) ? resolve(here, '..', '..') : resolve(here, '..');
  const dir = join(root, 'bench', 'out');
  mkdirSync(dir, { recursive: true });
  return dir;
}

export const csvPath = (size: string) => join(outDirectory(), `parts-${size}.csv`);
export const catalogPath = (size: string) => join(outDirectory(), `catalog-${size}.sqlite`);

/** Reads "--name value" pairs and bare words; enough for scripts run by hand. */
export function readArgs(argv: readonly string[]): { words: string[]; flags: Map<string, string> } {
  const words: string[] = [];
  const flags = new Map<string, string>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a.startsWith('--')) {
      const next = argv[i + 1];
      if (next !== undefined && !next.startsWith('--')) flags.set(a.slice(2), argv[++i]!);
      else flags.set(a.slice(2), 'true');
    } else words.push(a);
  }
  return { words, flags };
}

export function sizeOf(name: string): number {
  const n = SIZES[name.toLowerCase()];
  if (n === undefined) throw new Error(`unknown size "${name}": use one of ${Object.keys(SIZES).join(', ')}`);
  return n;
}

/** A small seeded generator (mulberry32) so every run makes the same catalog. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function median(values: readonly number[]): number {
  return percentile(values, 0.5);
}

export function percentile(values: readonly number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1))]!;
}

export const mb = (bytes: number) => Math.round(bytes / 1048576);
