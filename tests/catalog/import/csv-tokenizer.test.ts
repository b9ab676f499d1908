import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CsvTokenizer } from '../../../src/catalog/import/csv-tokenizer.js';

interface Read {
  readonly records: { cells: string[]; line: number }[];
  readonly error?: number;
}

/** Our tokenizer, fed in pieces of the given sizes (the file read in chunks). */
function ours(text: string, pieces: readonly number[] = [text.length]): Read {
  const tokenizer = new CsvTokenizer();
  const records: { cells: string[]; line: number }[] = [];
  const sink = (cells: readonly string[], count: number, line: number) => records.push({ cells: cells.slice(0, count), line });
  let at = 0;
  for (const size of pieces) {
    const problem = tokenizer.push(text.slice(at, at + size), sink);
    at += size;
    if (problem) return { records, error: problem.line };
  }
  const problem = tokenizer.push(text.slice(at), sink) ?? tokenizer.end(sink);
  return problem ? { records, error: problem.line } : { records };
}

/**
 * csv-parse 7 with the options the catalog reader used before (src/catalog/csv-format.ts at
 * commit df779a0): the reference. It reports the line a record ends on; the start line is that
 * less the line breaks inside the record, as the reader computed it.
 */
function reference(text: string): Read {
  try {
    const rows = parse(text, { bom: true, info: true, raw: true, skip_empty_lines: true, relax_column_count: true }) as unknown as { record: string[]; info: { lines: number }; raw: string }[];
    return {
      records: rows.map((r) => {
        const body = r.raw.replace(/^(\r?\n)+/, '').replace(/\r?\n$/, '');
        return { cells: r.record, line: r.info.lines - (body.match(/\n/g)?.length ?? 0) };
      }),
    };
  } catch (error) {
    return { records: [], error: (error as { lines?: number }).lines ?? 0 };
  }
}

const cellText = fc.string({ unit: fc.constantFrom('a', 'b', '1', ' ', ',', '"', '\n', '\r', 'é', '@', ';'), maxLength: 8 });
const quoted = (s: string) => `"${s.replace(/"/g, '""')}"`;
/** A cell as a writer would put it: quoted when it has to be, sometimes when it need not be. */
const cell = fc.tuple(cellText, fc.boolean()).map(([s, forceQuote]) => (forceQuote || /[",\r\n]/.test(s) ? quoted(s) : s));
const record = fc.array(cell, { minLength: 1, maxLength: 5 }).map((cells) => cells.join(','));
/** A whole file with one kind of line end, empty lines here and there, maybe a byte-order mark. */
const file = fc
  .tuple(fc.array(fc.oneof({ weight: 5, arbitrary: record }, { weight: 1, arbitrary: fc.constant('') }), { minLength: 1, maxLength: 8 }), fc.constantFrom('\n', '\r\n'), fc.boolean(), fc.boolean())
  .map(([records, end, bom, trailing]) => (bom ? '\uFEFF' : '') + records.join(end) + (trailing ? end : ''));
/** The same with some characters replaced, inserted or cut: mostly not valid CSV any more. */
const damaged = fc
  .tuple(file, fc.array(fc.tuple(fc.nat(), fc.nat(3), fc.constantFrom('"', ',', '\n', '\r', 'x', '"x', 'x"')), { minLength: 1, maxLength: 3 }))
  .map(([text, edits]) => edits.reduce((t, [at, cut, add]) => t.slice(0, at % (t.length + 1)) + add + t.slice((at % (t.length + 1)) + cut), text));
const pieces = fc.array(fc.integer({ min: 0, max: 7 }), { maxLength: 12 });

describe('CSV tokenizer against csv-parse', () => {
  it('splits well-formed files into the same cells on the same lines, however the text arrives', () => {
    fc.assert(
      fc.property(file, pieces, (text, sizes) => {
        const expected = reference(text);
        expect(expected.error).toBeUndefined();
        const got = ours(text, sizes);
        expect(got.records.map((r) => r.cells)).toEqual(expected.records.map((r) => r.cells));
        // csv-parse counts a \r\n inside a quoted cell as two lines; compare lines where it cannot.
        if (!text.includes('\r')) expect(got.records.map((r) => r.line)).toEqual(expected.records.map((r) => r.line));
      }),
      { numRuns: Number(process.env.HEADROOM_FUZZ_RUNS ?? 3000) },
    );
  });

  it('accepts and rejects the same damaged files, with the same cells when it accepts', () => {
    fc.assert(
      fc.property(damaged, pieces, (text, sizes) => {
        const expected = reference(text);
        const got = ours(text, sizes);
        expect(got.error === undefined).toBe(expected.error === undefined);
        if (expected.error === undefined) expect(got.records.map((r) => r.cells)).toEqual(expected.records.map((r) => r.cells));
      }),
      { numRuns: Number(process.env.HEADROOM_FUZZ_RUNS ?? 3000) },
    );
  });

  it('names the line of a quote never closed and of a stray quote', () => {
    expect(ours('a,b\nc,"d\ne\n').error).toBe(2);
    expect(ours('a,b\nc,d"e\n').error).toBe(2);
    expect(ours('a,b\n"c"d,e\n').error).toBe(2);
  });

  it('counts lines of quoted cells with line breaks, and of skipped empty lines', () => {
    expect(ours('a\n\n"b\nc",d\r\ne\n').records).toEqual([
      { cells: ['a'], line: 1 },
      { cells: ['b\nc', 'd\r'], line: 3 },
      { cells: ['e'], line: 5 },
    ]);
  });
});
