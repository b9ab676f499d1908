import { describe, expect, it } from 'vitest';
import { readParts } from '../../src/catalog/candidate-streams.js';
import { openCatalog, writeParts } from '../../src/catalog/index.js';
import { ROW_COLUMNS, rowToPart, type PartRow } from '../../src/catalog/part-rows.js';
import { aPart } from '../helpers/a-part.js';

describe('readParts (rows read as arrays of values)', () => {
  it('gives the parts, keys in the same order, that the row objects give, in the order of the ids', () => {
    const catalog = openCatalog(':memory:');
    writeParts(
      catalog,
      [
        aPart('schottky', { partNumber: 'TW-A', ifsmA: 80, irPoints: [{ irA: 5e-5, vrV: 40, tjK: 298.15 }], unitPrice: 0.12, currency: 'EUR' }),
        aPart('zener', { partNumber: 'TW-Z', notes: 'a note', approval: 'preferred' }),
        aPart('tvs', { partNumber: 'TW-T' }),
      ],
      { by: 't', reason: 't' },
    );
    const rows = catalog.db.prepare(`SELECT id, ${ROW_COLUMNS.join(', ')} FROM part ORDER BY part_number DESC`).all() as (PartRow & { id: number })[];
    const parts = readParts(catalog.db, [...rows.map((r) => r.id), 999]);
    expect(parts).toHaveLength(3);
    parts.forEach((part, i) => {
      const { id: _, ...row } = rows[i]!;
      const expected = rowToPart(row);
      expect(part).toEqual(expected);
      expect(Object.keys(part)).toEqual(Object.keys(expected));
    });
    catalog.close();
  });
});
