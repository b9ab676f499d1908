import { describe, expect, it } from 'vitest';
import { parseBomMapping, readBomText } from '../../src/catalog/index.js';

describe('reading a BOM', () => {
  it('finds the usual headers, splits grouped designators and ignores extra columns', () => {
    const r = readBomText('Item,Qty,Designator,Manufacturer,MPN,Notes\n1,2,"D5, D6",Brackwater Semiconductor,BWR1-1000L,relays\n2,1,D4,Brackwater Semiconductor,BWK3-60B,\n');
    expect(r).toEqual({
      ok: true,
      columns: { ref: 'Designator', maker: 'Manufacturer', part: 'MPN' },
      ignored: ['Item', 'Qty', 'Notes'],
      lines: [
        { refs: ['D5', 'D6'], manufacturer: 'Brackwater Semiconductor', partNumber: 'BWR1-1000L', line: 2 },
        { refs: ['D4'], manufacturer: 'Brackwater Semiconductor', partNumber: 'BWK3-60B', line: 3 },
      ],
    });
  });

  it('takes other header names from a mapping', () => {
    const mapping = parseBomMapping('ref=Pos, maker=Vendor Name, part=Order code');
    expect(mapping).toEqual({ ok: true, mapping: { ref: 'Pos', maker: 'Vendor Name', part: 'Order code' } });
    const r = readBomText('Pos,Vendor Name,Order code\nD1,Quillfen Electronics,QFK50-100C\n', mapping.ok ? mapping.mapping : {});
    expect(r.ok && r.lines[0]).toEqual({ refs: ['D1'], manufacturer: 'Quillfen Electronics', partNumber: 'QFK50-100C', line: 2 });
  });

  it('names the missing column and the headers it found', () => {
    const r = readBomText('Ref,Maker\nD1,X\n');
    expect(r).toEqual({
      ok: false,
      issues: [
        {
          line: 1,
          message:
            'no part number column: looked for one of partnumber, part, mpn, manufacturerpartnumber, mfrpartnumber, mfrpn, pn; the header has "Ref", "Maker". Map it with --bom-columns part=HEADER',
        },
      ],
    });
    expect(parseBomMapping('designator=X')).toEqual({ ok: false, message: '"designator=X" is not of the form ref=HEADER, maker=HEADER or part=HEADER' });
  });

  it('reports a part without a designator by its line', () => {
    const r = readBomText('Ref,Manufacturer,Part Number\n,Brackwater Semiconductor,BWK3-60B\n');
    expect(r).toEqual({ ok: false, issues: [{ line: 2, message: 'part BWK3-60B has no designator' }] });
  });
});
