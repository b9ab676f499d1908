import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { packageRoot } from '../../src/catalog/index.js';
import { PART_COLUMNS } from '../../src/parts/index.js';

describe('docs/catalog-format.md', () => {
  const doc = readFileSync(join(packageRoot(), 'docs', 'catalog-format.md'), 'utf8');
  it.each(PART_COLUMNS)('documents column %s in the table', (column) => {
    expect(doc).toContain(`| \`${column}\` |`);
  });
});
