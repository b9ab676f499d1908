import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readCsvFile, readCsvText } from '../../../src/catalog/import/read-csv-file.js';
import type { ReadSummary, RowBatch } from '../../../src/catalog/import/row-collector.js';
import { PART_COLUMNS } from '../../../src/parts/index.js';
import { useTempDir } from '../../helpers/temp-dir.js';

const tempDir = useTempDir();

/** Everything the reader hands on: rows by line with their values, issues, summary. */
function collect(read: (onBatch: (b: RowBatch) => void) => ReadSummary) {
  const shapes: number[][] = [];
  const rows: { line: number; values: unknown[] }[] = [];
  const issues: unknown[] = [];
  const summary = read((b) => {
    shapes.push(...b.newShapes);
    issues.push(...b.issues);
    for (const g of b.groups) {
      const width = shapes[g.shape]!.length;
      g.lines.forEach((line, r) => rows.push({ line, values: g.values.slice(r * width, (r + 1) * width) }));
    }
  });
  rows.sort((a, b) => a.line - b.line);
  return { rows, issues, summary: { ...summary, fieldValues: Object.fromEntries(Object.entries(summary.fieldValues).map(([k, v]) => [k, [...v].sort()])) } };
}

const header = PART_COLUMNS.join(',');
const row = (cells: Record<string, string>) => PART_COLUMNS.map((c) => cells[c] ?? '').join(',');
/** Text with characters of one, two, three and four UTF-8 bytes. */
const text = fc.string({ unit: fc.constantFrom('a', 'Z', '7', ' ', '-', 'µ', '±', '°', 'Ω', '€', '漢', '😀', 'é'), minLength: 1, maxLength: 12 });
const quoted = (s: string) => `"${s.replace(/"/g, '""')}"`;

describe('reading a CSV file in chunks of bytes', () => {
  it('gives what reading its text gives, whatever characters cross the chunk boundaries', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(text, text, fc.boolean()), { minLength: 1, maxLength: 30 }), fc.boolean(), fc.constantFrom('\n', '\r\n'), fc.integer({ min: 2, max: 300 }), (parts, bom, end, chunk) => {
        const lines = parts.map(([number, description, isQuoted], i) =>
          row({ manufacturer: 'Testwell Devices', part_number: `TW-${i}-${number.trim() || 'x'}`, kind: 'zener', package: 'SOD-123', description: isQuoted ? quoted(`${description}, ${i}`) : description.replace(/[",\r\n]/g, ''), vz_v: '5.1 V', vz_tol: '5 %', izt_a: '5 mA', pd_w: '500 mW', tj_max_k: '150 °C' }),
        );
        const content = (bom ? '\uFEFF' : '') + [header, ...lines].join(end) + end;
        const path = join(tempDir(), 'p.csv');
        writeFileSync(path, content);
        // Chunks of a few bytes: characters, cells and records all fall across their ends.
        expect(collect((on) => readCsvFile(path, 'p.csv', on, chunk))).toEqual(collect((on) => readCsvText(content.replace(/^\uFEFF/, ''), 'p.csv', on)));
      }),
      { numRuns: 200 },
    );
  });

  it('keeps multi-byte characters whole across megabyte chunks', () => {
    const lines = [header];
    for (let i = 0; i < 20_000; i++) {
      lines.push(row({ manufacturer: 'Testwell Devices', part_number: `TW-${i}`, kind: 'zener', package: 'SOD-123', description: `Zener ±${i % 7} % Ω€漢😀 ${'µ'.repeat(i % 5)}`, vz_v: '5.1', vz_tol: '0.05', izt_a: '0.005', pd_w: '0.5', tj_max_k: '423.15' }));
    }
    const content = lines.join('\n') + '\n';
    const path = join(tempDir(), 'big.csv');
    writeFileSync(path, '\uFEFF' + content);
    const fromFile = collect((on) => readCsvFile(path, 'big.csv', on));
    expect(fromFile.rows).toHaveLength(20_000);
    expect(fromFile).toEqual(collect((on) => readCsvText(content, 'big.csv', on)));
  });
});
