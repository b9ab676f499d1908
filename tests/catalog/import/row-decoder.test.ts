import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compileRowDecoder, decodeByReference } from '../../../src/catalog/import/row-decoder.js';
import { encodePartCells } from '../../../src/catalog/part-cells.js';
import { PART_COLUMNS } from '../../../src/parts/index.js';
import { aPart } from '../../helpers/a-part.js';

const RUNS = Number(process.env.HEADROOM_FUZZ_RUNS ?? 3000);

/** Cell texts people and exports write, good and bad, for each kind of column. */
const NUMBERS = ['', ' ', '0', '-0', '1', '40', '600', '0.5', '.5', '5.', '+3', '1e-9', '5e-13', '298.15', '423.15', '1000000', '1e999', '-1', "'-0.0003", '0.0003', '1,5', 'abc', 'NaN', '0x10', ' 40 ', '600 V', '5 A', '150 °C', '4k7', '1.5A', '5 %', '62 °C/W', '-0.03 %/K', '10 µs', '8.3 ms', '180p', '5V1', '0.25'];
const POINTS = ['', '0.92@1@298.15', '0.92@1@298.15;0.8@1@398.15', '0.92 V @ 1 A @ 25 °C; 0.80 V @ 1 A @ 125 °C', '5e-6@40@298.15', '0.5@3', ';', ' ; 0.5@3@300 ;', '0.5@-3@300', '0.00005@40@298.15;0.005@40@398.15', '5 µA @ 600 V @ 25 °C', '0.5@3@1000', 'x@y@z'];
const TEXT: Record<string, string[]> = {
  manufacturer: ['Testwell Devices', ' Testwell Devices ', '', 'A\u0001B', 'x'.repeat(121), "'=Maker", 'Ketterby Components'],
  part_number: ['TW-1', 'tw 2/3', '', "'-5", 'KTR-1A1000-L', ' TW-1 '],
  kind: ['rectifier', 'fast-recovery', 'ultrafast', 'schottky', 'sic-schottky', 'zener', 'tvs-uni', 'tvs-bi', 'signal', 'schotky', ' zener ', ''],
  package: ['SMA', 'sod123', 'DO-214AC', ' Custom Pkg ', '', 'SOD-123'],
  description: ['', 'low leakage', 'x'.repeat(4001), "'=HYPERLINK(\"x\")", ' spaced '],
  lifecycle: ['', 'active', 'nrnd', 'obsolete', 'dead'],
  approval: ['', 'preferred', 'approved', 'conditional', 'pending', 'banned', 'maybe'],
  approval_note: ['', 'only below 60 °C', ' '],
  second_source_group: ['', 'G1', 'G\u0002'],
  unit_price: ['', '0.042', '-1', '1e7', '0x10', ' 5 ', 'abc', '-0', '0'],
  currency: ['', 'EUR', 'eur', 'EURO', ' USD '],
  datasheet_url: ['', 'https://example.com/ds.pdf', 'ftp://example.com/x', 'not a url', 'http://example.com'],
  notes: ['', 'line\nbreak', 'x'],
  vf_points: POINTS,
  ir_points: POINTS,
  if_av_ref: ['', 'ambient', 'lead', 'case', 'junction'],
};
const valuesFor = (column: string) => TEXT[column] ?? NUMBERS;

/** A valid part as an export writes it, with some cells replaced by the texts above. */
const record = fc
  .tuple(fc.constantFrom('schottky', 'zener', 'tvs') as fc.Arbitrary<'schottky' | 'zener' | 'tvs'>, fc.array(fc.tuple(fc.constantFrom(...PART_COLUMNS), fc.nat()), { maxLength: 4 }))
  .map(([family, edits]) => {
    const cells = encodePartCells(aPart(family, { irPoints: family === 'schottky' ? [{ irA: 5e-5, vrV: 40, tjK: 298.15 }] : [], description: 'a part' }));
    for (const [column, pick] of edits) cells[column] = valuesFor(column)[pick % valuesFor(column).length]!;
    return cells;
  });

/** The columns of a file: every column, or the four required ones and some others. */
const header = fc.oneof(
  fc.constant([...PART_COLUMNS]),
  fc.subarray([...PART_COLUMNS]).map((cs) => [...new Set(['manufacturer', 'part_number', 'kind', 'package', ...cs])]),
);

describe('fast row decoder against decodePartCells (zod)', () => {
  it('gives the same values or the same issues for generated records', () => {
    fc.assert(
      fc.property(header, record, (columns, cells) => {
        const decode = compileRowDecoder(columns);
        const inFile = Object.fromEntries(columns.map((c) => [c, cells[c] ?? '']));
        expect(decode(columns.map((c) => inFile[c]!))).toEqual(decodeByReference(inFile));
      }),
      { numRuns: RUNS },
    );
  });

  it('takes the fast path for canonical exports', () => {
    const cells = encodePartCells(aPart('zener', { vzTempcoPerK: -3e-4, unitPrice: 0.04, currency: 'EUR' }));
    const r = compileRowDecoder(PART_COLUMNS)(PART_COLUMNS.map((c) => cells[c]!));
    expect(r).toEqual(decodeByReference(cells));
  });
});
