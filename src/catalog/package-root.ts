import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let cached: string | undefined;

/** The folder holding Headroom's package.json, found the same way from src/ (tests) and dist/src/ (built). */
export function packageRoot(): string {
  if (cached) return cached;
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate) && JSON.parse(readFileSync(candidate, 'utf8')).name === 'headroom') {
      cached = dir;
      return dir;
    }
    const parent = dirname(dir);
    if (parent === dir) throw new Error('Headroom package root not found above ' + import.meta.url);
    dir = parent;
  }
}

export function packageVersion(): string {
  return JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')).version;
}
