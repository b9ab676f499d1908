import { describe, expect, it } from 'vitest';
import {
  importPartsText,
  listParts,
  openCatalog,
  readPartsText,
  writePartsText,
  formatRowIssue,
  type Catalog,
} from '../../src/catalog/index.js';
import { PART_COLUMNS } from '../../src/parts/index.js';
import { aPart } from '../helpers/a-part.js';

const BY = { by: 'tester', at: '2026-02-01T10:00:00.000Z' };
const header = PART_COLUMNS.join(',');
const blank = Object.fromEntries(PART_COLUMNS.map((c) => [c, '']));
/** One CSV line from a few named cells, the rest empty. */
function row(cells: Record<string, string>): string {
  return PART_COLUMNS.map((c) => {
    const v = cells[c] ?? blank[c]!;
    return /[",\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
  }).join(',');
}
const schottky = (pn: string, extra: Record<string, string> = {}) =>
  row({ manufacturer: 'Testwell Devices', part_number: pn, kind: 'schottky', package: 'SMA', vrrm_v: '40 V', if_av_a: '3 A', tj_max_k: '150 °C', vf_points: '0.5 V @ 3 A @ 25 °C', ...extra });

function fresh(): Catalog {
  return openCatalog(':memory:');
}

describe('reading a parts file', () => {
  it('reads cells with engineering units into SI numbers, temperatures in kelvin', () => {
    const r = readPartsText('p.csv', `${header}\n${schottky('TW-1', { ir_points: '50 µA @ 40 V @ 25 °C; 5 mA @ 40 V @ 125 °C', cj_f: '180p' })}\n`, 'csv');
    expect(r.issues).toEqual([]);
    expect(r.parts[0]).toMatchObject({
      line: 2,
      part: {
        vrrmV: 40,
        tjMaxK: 423.15,
        cjF: 180e-12,
        vfPoints: [{ vfV: 0.5, ifA: 3, tjK: 298.15 }],
        irPoints: [
          { irA: 50e-6, vrV: 40, tjK: 298.15 },
          { irA: 5e-3, vrV: 40, tjK: 398.15 },
        ],
      },
    });
  });

  it('reports every bad row with its line, column, value and accepted form', () => {
    const text = [
      header,
      schottky('TW-OK'),
      schottky('TW-2', { vrrm_v: '5 A' }),
      schottky('TW-3', { kind: 'schotky' }),
      schottky('TW-4', { tj_max_k: '' }),
      '"quoted, with',
      'a line break",TW-5,schottky,SMA',
      schottky('TW-6', { vf_points: '0.5 V @ 3 A' }),
      schottky('TW-OK'),
      schottky('TW-8', { if_av_a: '1,5' }),
    ].join('\n');
    const r = readPartsText('bad.csv', text, 'csv');
    expect(r.parts.map((p) => p.part.partNumber)).toEqual(['TW-OK']);
    expect(r.issues.map(formatRowIssue)).toMatchInlineSnapshot(`
      [
        "bad.csv:3 column vrrm_v value "5 A": expected a voltage, got "5 A" (a current) (expected VRRM (repetitive peak reverse voltage): a voltage, bare numbers in V, or with a unit as in "600 V")",
        "bad.csv:4 column kind value "schotky": missing or unknown kind (expected one of rectifier, fast-recovery, ultrafast, schottky, sic-schottky, zener, tvs-uni, tvs-bi, signal)",
        "bad.csv:5 column tj_max_k: required for this kind of part (expected Tj max (maximum junction temperature): a temperature, bare numbers in K (in files) or °C (typed), or with a unit as in "85 °C")",
        "bad.csv:6: 4 cells where the header has 44 (expected one cell per header column (quote cells that contain commas))",
        "bad.csv:8 column vf_points value "0.5 V @ 3 A": point 1 "0.5 V @ 3 A" needs three values joined by "@" (expected "VF @ IF @ Tj" points separated by ";", e.g. "0.92 V @ 1 A @ 25 °C; 0.80 V @ 1 A @ 125 °C")",
        "bad.csv:9 column part_number value "TW-OK": the same manufacturer and part number as line 2 (expected each part once per file)",
        "bad.csv:10 column if_av_a value "1,5": expected a current, got "1,5": use a dot as the decimal point, e.g. "1.5" (expected IF(AV) (average forward current rating): a current, bare numbers in A, or with a unit as in "1.5 A")",
      ]
    `);
  });

  it('rejects an unknown or repeated header column and a missing required one', () => {
    const r = readPartsText('h.csv', 'manufacturer,part_numbr,kind,kind\nA,B,schottky,schottky\n', 'csv');
    expect(r.issues.map((i) => `${i.line} ${i.column}: ${i.message}`)).toEqual([
      '1 part_numbr: unknown column 2',
      '1 kind: column named twice',
      '1 part_number: required column missing from the header',
      '1 package: required column missing from the header',
    ]);
  });

  it('locates problems in the JSON format too', () => {
    const json = `{
  "format": "headroom-catalog",
  "version": 1,
  "parts": [
    {"manufacturer": "Testwell Devices", "part_number": "TW-J1", "kind": "zener", "package": "SOD-123",
     "vz_v": 5.1, "vz_tol": 0.05, "izt_a": 0.005, "pd_w": 0.5, "tj_max_k": 423.15},
    {"manufacturer": "Testwell Devices", "part_number": "TW-J2", "kind": "zener", "package": "SOD-123",
     "vz_v": "5.1 A", "vz_tol": 0.05, "izt_a": 0.005, "pd_w": 0.5, "tj_max_k": 423.15}
  ]
}`;
    const r = readPartsText('p.json', json, 'json');
    expect(r.parts).toHaveLength(1);
    expect(r.issues.map((i) => [i.line, i.column, i.message])).toEqual([[7, 'vz_v', 'expected a voltage, got "5.1 A" (a current)']]);
    expect(readPartsText('p.json', '{"format": "other"}', 'json').issues[0]!.message).toBe('"format" must be "headroom-catalog"');
    expect(readPartsText('p.json', '{"parts": [', 'json').issues[0]!.message).toMatch(/^not readable as JSON/);
  });
});

describe('importing', () => {
  it('writes nothing when any row is bad, and the good rows with skipInvalid', () => {
    const catalog = fresh();
    const text = `${header}\n${schottky('TW-A')}\n${schottky('TW-B', { vrrm_v: '-40 V' })}\n`;
    const refused = importPartsText(catalog, 'x.csv', text, 'csv', BY);
    expect(refused.ok).toBe(false);
    expect(listParts(catalog)).toEqual([]);
    const skipped = importPartsText(catalog, 'x.csv', text, 'csv', { ...BY, skipInvalid: true });
    expect(skipped).toMatchObject({ ok: true, written: { added: 1, updated: 0, unchanged: 0 } });
    expect(skipped.ok && skipped.skipped.map((i) => i.line)).toEqual([3]);
    expect(listParts(catalog).map((p) => p.partNumber)).toEqual(['TW-A']);
  });

  it('updates parts of the same maker and number, whatever the letter case, and counts unchanged ones', () => {
    const catalog = fresh();
    importPartsText(catalog, 'a.csv', `${header}\n${schottky('TW-A')}\n${schottky('TW-B')}\n`, 'csv', BY);
    const r = importPartsText(catalog, 'b.csv', `${header}\n${schottky('tw-a', { vrrm_v: '45 V' })}\n${schottky('TW-B')}\n`, 'csv', BY);
    expect(r).toMatchObject({ ok: true, written: { added: 0, updated: 1, unchanged: 1 } });
    expect(listParts(catalog).map((p) => [p.partNumber, p.vrrmV])).toEqual([
      ['TW-B', 40],
      ['tw-a', 45],
    ]);
  });

  it('records approval changes in the trail', () => {
    const catalog = fresh();
    importPartsText(catalog, 'a.csv', `${header}\n${schottky('TW-A')}\n`, 'csv', BY);
    importPartsText(catalog, 'b.csv', `${header}\n${schottky('TW-A', { approval: 'approved' })}\n`, 'csv', { by: 'ce', at: '2026-02-02T00:00:00.000Z' });
    const trail = catalog.db.prepare('SELECT by, from_state, to_state, reason FROM approval_event ORDER BY id').all();
    expect(trail).toEqual([
      { by: 'tester', from_state: null, to_state: 'pending', reason: 'import of a.csv' },
      { by: 'ce', from_state: 'pending', to_state: 'approved', reason: 'import of b.csv' },
    ]);
  });
});

describe('exporting', () => {
  const parts = [
    aPart('tvs', { manufacturer: 'Zed Works', partNumber: 'ZW-1', vzTempcoPerK: undefined }),
    aPart('zener', { vzTempcoPerK: -3e-4, description: '=HYPERLINK("x")', notes: 'line one\nline two, "quoted"' }),
    aPart('schottky', { unitPrice: 0.042, currency: 'EUR', irPoints: [{ irA: 5e-5, vrV: 40, tjK: 298.15 }] }),
  ];

  it('sorts by manufacturer then part number and writes SI numbers in shortest exact text', () => {
    const csv = writePartsText(parts, 'csv');
    const lines = csv.split('\n');
    expect(lines[0]).toBe(PART_COLUMNS.join(','));
    expect(lines.slice(1, 3).map((l) => l.split(',')[1])).toEqual(['TW-SK340A', 'TW-Z5V1']);
    expect(csv).toContain(',0.00005@40@298.15,');
  });

  it('neutralises cells a spreadsheet would run as formulas, and reads them back unchanged', () => {
    const csv = writePartsText(parts, 'csv');
    expect(csv).toContain(`"'=HYPERLINK(""x"")"`);
    expect(csv).toContain(",'-0.0003,");
    const back = readPartsText('e.csv', csv, 'csv');
    expect(back.issues).toEqual([]);
    expect(back.parts.find((p) => p.part.partNumber === 'TW-Z5V1')?.part).toMatchObject({ description: '=HYPERLINK("x")', vzTempcoPerK: -3e-4 });
  });

  it.each(['csv', 'json'] as const)('export → import → export is byte-identical (%s)', (format) => {
    const first = writePartsText(parts, format);
    const catalog = fresh();
    const r = importPartsText(catalog, `e.${format}`, first, format, BY);
    expect(r.ok).toBe(true);
    expect(writePartsText(listParts(catalog), format)).toBe(first);
  });
});
