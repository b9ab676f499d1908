import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { openCatalog } from '../../../src/catalog/index.js';
import { searchKey, SEPARATORS } from '../../../src/selection/query/index.js';

describe('the part-number key in SQL and in TypeScript', () => {
  it('squashes and upper-cases alike, for any text (the key triggers of migration 006 and searchKey)', () => {
    const catalog = openCatalog(':memory:');
    const insert = catalog.db.prepare(
      "INSERT INTO part (manufacturer, part_number, kind, package, description, updated_at) VALUES (?, ?, ?, ?, ?, 'x') RETURNING id",
    );
    const keyOf = catalog.db.prepare('SELECT search_key FROM part WHERE id = ?').pluck();
    const rename = catalog.db.prepare('UPDATE part SET part_number = ? WHERE id = ?');
        // Any Unicode but NUL, which SQLite text does not carry through every function.
    const anyCharacter = fc.string({ unit: 'grapheme', minLength: 1, maxLength: 1 }).filter((c) => !c.includes('\u0000'));
    const text = fc.string({ unit: fc.oneof(fc.constantFrom(...SEPARATORS.split(''), 'a', 'Z', '9', 'é', 'µ', 'ß'), anyCharacter), maxLength: 24 });
    fc.assert(
      fc.property(text, text, text, (partNumber, manufacturer, description) => {
        const part = { manufacturer, package: 'SOD-123', kind: 'zener', description };
        const { id } = insert.get(manufacturer, partNumber, part.kind, part.package, description) as { id: number };
        expect(keyOf.get(id)).toBe(searchKey(partNumber));
        rename.run(`${description}-${partNumber}`, id);
        expect(keyOf.get(id)).toBe(searchKey(`${description}-${partNumber}`));
        catalog.db.exec('DELETE FROM part');
      }),
      { numRuns: 300 },
    );
    catalog.close();
  });
});
