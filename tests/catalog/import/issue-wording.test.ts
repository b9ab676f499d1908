import { describe, expect, it } from 'vitest';
import { formatRowIssue, importPartsText, openCatalog } from '../../../src/catalog/index.js';
import { compileRowDecoder, decodeByReference } from '../../../src/catalog/import/row-decoder.js';

// Issues from the schema's own checks read in plain words with units, not zod's defaults.
const BY = { by: 'tester', at: '2026-03-01T00:00:00.000Z' };
const VF_FORM = '"VF @ IF @ Tj" points separated by ";", e.g. "0.92 V @ 1 A @ 25 °C; 0.80 V @ 1 A @ 125 °C"';
const MISSING_VF = 'at least one VF point is required for this kind of part';
const COLUMNS = ['manufacturer', 'part_number', 'kind', 'package', 'vrrm_v', 'if_av_a', 'tj_max_k', 'vf_points', 'lifecycle', 'datasheet_url', 'unit_price', 'currency'];
const GOOD: Record<string, string> = { manufacturer: 'Testwell', part_number: 'TW-1', kind: 'schottky', package: 'SMA', vrrm_v: '40', if_av_a: '3', tj_max_k: '423.15', vf_points: '0.5@3@298.15' };

function csv(...rows: Record<string, string>[]): string {
  return [COLUMNS.join(','), ...rows.map((r) => COLUMNS.map((c) => r[c] ?? '').join(','))].join('\n') + '\n';
}

function importIssues(file: string, text: string, format: 'csv' | 'json'): string[] {
  const r = importPartsText(openCatalog(':memory:'), file, text, format, BY);
  return r.ok ? [] : r.issues.map(formatRowIssue);
}

describe('import issue wording', () => {
  it('calls a missing or empty vf_points required, in CSV and JSON, on both decoders', () => {
    expect(importIssues('bad.csv', csv({ ...GOOD, vf_points: '' }), 'csv')).toEqual([`bad.csv:2 column vf_points: ${MISSING_VF} (expected ${VF_FORM})`]);
    const { vf_points: _, ...noVf } = GOOD;
    const json = (vf: object) => JSON.stringify({ format: 'headroom-catalog', version: 1, parts: [{ ...noVf, ...vf }] }, null, 1);
    expect(importIssues('bad.json', json({}), 'json')).toEqual([`bad.json:5 column vf_points: ${MISSING_VF} (expected ${VF_FORM})`]);
    expect(importIssues('bad.json', json({ vf_points: [] }), 'json')).toEqual([`bad.json:5 column vf_points: ${MISSING_VF} (expected ${VF_FORM})`]);
    const issue = { column: 'vf_points', value: '', message: MISSING_VF, expected: VF_FORM };
    expect(decodeByReference(noVf)).toEqual({ ok: false, issues: [issue] });
    expect(compileRowDecoder(Object.keys(noVf))(Object.values(noVf))).toEqual({ ok: false, issues: [issue] });
  });

  it('words out-of-range numbers with units, long text, unknown choices and addresses', () => {
    const messages = (cells: Record<string, string>) => {
      const r = decodeByReference({ ...GOOD, ...cells });
      return r.ok ? [] : r.issues.map((i) => `${i.column}: ${i.message}`);
    };
    expect(messages({ vrrm_v: '200 kV' })).toEqual(['vrrm_v: must be at most 100 kV']);
    expect(messages({ vrrm_v: '-40 V' })).toEqual(['vrrm_v: must be above 0 V']);
    expect(messages({ tj_max_k: '1000' })).toEqual(['tj_max_k: must be at most 500 °C (773.15 K)']);
    expect(messages({ vf_points: '0.5@3@298.15; 0@3@398.15' })).toEqual(['vf_points: point 2: VF must be above 0 V']);
    expect(messages({ ir_points: '20@10@298.15' })).toEqual(['ir_points: point 1: IR must be at most 10.0 A']);
    expect(messages({ unit_price: '-1', currency: 'EUR' })).toEqual(['unit_price: must be at least 0']);
    expect(messages({ manufacturer: 'x'.repeat(121) })).toEqual(['manufacturer: must be at most 120 characters']);
    expect(messages({ notes: 'x'.repeat(4001) })).toEqual(['notes: must be at most 4000 characters']);
    expect(messages({ lifecycle: 'retired' })).toEqual(['lifecycle: not one of the accepted values']);
    expect(messages({ datasheet_url: 'ftp://example.com/a.pdf' })).toEqual(['datasheet_url: not an http or https address']);
  });

  it('reports the file, line, column, value and accepted form of each', () => {
    expect(importIssues('bad.csv', csv(GOOD, { ...GOOD, part_number: 'TW-2', vrrm_v: '200 kV', lifecycle: 'retired' }), 'csv')).toEqual([
      'bad.csv:3 column lifecycle value "retired": not one of the accepted values (expected one of active, nrnd, obsolete)',
      'bad.csv:3 column vrrm_v value "200 kV": must be at most 100 kV (expected VRRM (repetitive peak reverse voltage): a voltage, bare numbers in V, or with a unit as in "600 V")',
    ]);
  });
});
