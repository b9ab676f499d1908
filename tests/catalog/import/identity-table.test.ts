import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { IdentityTable } from '../../../src/catalog/import/identity-table.js';
import { identityOf } from '../../../src/catalog/import/row-values.js';

describe('the identity table of an import file', () => {
  it('finds the same earlier lines as a map keyed by identityOf (letter case ignored as toLowerCase ignores it)', () => {
    // Letters whose case folding is not one ASCII step: Kelvin sign, dotted I, final sigma, German sharp s.
    const unit = fc.constantFrom('a', 'A', 'b', 'B', 'k', 'K', '\u212a', 'i', 'I', '\u0130', '\u03c3', '\u03a3', '\u03c2', '\u00df', 'S', '-', '1', ' ', 'é', 'É');
    const name = fc.string({ unit, minLength: 1, maxLength: 6 });
    fc.assert(
      fc.property(fc.array(fc.tuple(name, name), { maxLength: 60 }), (rows) => {
        const table = new IdentityTable();
        const reference = new Map<string, number>();
        rows.forEach(([maker, number], line) => {
          const key = identityOf(maker, number);
          const expected = reference.get(key);
          if (expected === undefined) reference.set(key, line);
          expect(table.setIfAbsent(maker, number, line)).toBe(expected);
        });
      }),
      { numRuns: 500 },
    );
  });

  it('keeps 300 000 distinct parts apart as it grows, and finds each again', () => {
    const table = new IdentityTable();
    let refused = 0;
    for (let i = 0; i < 300_000; i++) if (table.setIfAbsent('Loadtest Devices', `LT-${i}`, i) !== undefined) refused++;
    expect(refused).toBe(0);
    const found: (number | undefined)[] = [];
    for (let i = 0; i < 300_000; i += 997) found.push(table.setIfAbsent('LOADTEST DEVICES', `lt-${i}`, -1));
    expect(found).toEqual(Array.from({ length: found.length }, (_, k) => k * 997));
  });
});
