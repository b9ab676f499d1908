import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { openCatalog } from '../../../src/catalog/index.js';
import { searchKey, searchText, SEPARATORS } from '../../../src/selection/query/index.js';

describe('search text in SQL and in TypeScript', () => {
  it('squashes and upper-cases alike, for any text', () => {
    const catalog = openCatalog(':memory:');
    const insert = catalog.db.prepare(
      "INSERT INTO part (manufacturer, part_number, kind, package, description, updated_at) VALUES (?, ?, ?, ?, ?, 'x') RETURNING search_key, search_text",
    );
        // Any Unicode but NUL, which SQLite text does not carry through every function.
    const anyCharacter = fc.string({ unit: 'grapheme', minLength: 1, maxLength: 1 }).filter((c) => !c.includes('\u0000'));
    const text = fc.string({ unit: fc.oneof(fc.constantFrom(...SEPARATORS.split(''), 'a', 'Z', '9', 'é', 'µ', 'ß'), anyCharacter), maxLength: 24 });
    fc.assert(
      fc.property(text, text, text, (partNumber, manufacturer, description) => {
        const part = { manufacturer, package: 'SOD-123', kind: 'zener', description };
        const row = insert.get(manufacturer, partNumber, part.kind, part.package, description) as { search_key: string; search_text: string };
        expect(row.search_key).toBe(searchKey(partNumber));
        expect(row.search_text).toBe(searchText(part));
        catalog.db.exec('DELETE FROM part');
      }),
      { numRuns: 300 },
    );
    catalog.close();
  });
});
