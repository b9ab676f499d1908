import { existsSync } from 'node:fs';
import { openCatalog } from '../../catalog/open-catalog.js';
import { countParts } from '../../catalog/part-repository.js';
import { catalogPathFor, type CatalogOptions } from '../catalog-session.js';

/**
 * `headroom` alone: the interactive screens in a terminal; anywhere else (pipes, CI)
 * a short plain summary, so nothing waits for keys that will never come.
 */
export async function runHome(options: CatalogOptions): Promise<void> {
  const path = catalogPathFor(options);
  const exists = existsSync(path);
  if (process.stdout.isTTY && process.stdin.isTTY) {
    const { startTui } = await import('../../tui/start-tui.js');
    await startTui({ catalogPath: path, isDemo: Boolean(options.demo), hasCatalog: exists });
    return;
  }
  const lines = ['Headroom: output is not a terminal, so the interactive screens were not started.'];
  if (exists) {
    const catalog = openCatalog(path, { create: false });
    try {
      lines.push(`Catalog ${path}: ${countParts(catalog)} parts.`);
    } finally {
      catalog.close();
    }
  } else {
    lines.push(`No catalog at ${path} yet.`, 'Next: `headroom --demo catalog list` to look at the demo, or `headroom catalog import FILE.csv`.');
  }
  lines.push('Commands: headroom catalog list | show PART | import FILE | export [FILE] | add column=value… (headroom --help)');
  process.stdout.write(lines.join('\n') + '\n');
}
