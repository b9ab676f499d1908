import { parse } from 'csv-parse/sync';

/** One BOM line: the designators it covers and the part they carry. */
export interface BomLine {
  readonly refs: readonly string[];
  readonly manufacturer: string;
  readonly partNumber: string;
  readonly line: number;
}

export interface BomIssue {
  readonly line: number;
  readonly message: string;
}

export interface BomColumns {
  readonly ref: string;
  readonly maker: string;
  readonly part: string;
}

export type BomReadResult = { ok: true; lines: BomLine[]; columns: BomColumns; ignored: string[] } | { ok: false; issues: BomIssue[] };

// Header spellings recognised without a mapping, compared without case, spaces or punctuation.
const KNOWN: Record<keyof BomColumns, readonly string[]> = {
  ref: ['ref', 'refs', 'reference', 'references', 'refdes', 'designator', 'designators', 'referencedesignator'],
  maker: ['manufacturer', 'maker', 'mfr', 'mfg', 'manufacturername', 'vendor'],
  part: ['partnumber', 'part', 'mpn', 'manufacturerpartnumber', 'mfrpartnumber', 'mfrpn', 'pn'],
};
const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, '');

/** Reads `ref=Designator,maker=Mfr,part=MPN` (any subset) into a column mapping. */
export function parseBomMapping(text: string): { ok: true; mapping: Partial<BomColumns> } | { ok: false; message: string } {
  const mapping: Record<string, string> = {};
  for (const item of text.split(',').map((s) => s.trim()).filter(Boolean)) {
    const eq = item.indexOf('=');
    const key = item.slice(0, eq).trim();
    if (eq <= 0 || !(key in KNOWN)) return { ok: false, message: `"${item}" is not of the form ref=HEADER, maker=HEADER or part=HEADER` };
    mapping[key] = item.slice(eq + 1).trim();
  }
  return { ok: true, mapping };
}

/**
 * Reads a generic BOM CSV: designator, manufacturer and part number columns found by their usual
 * names or by an explicit mapping; other columns are ignored. A cell may list several designators
 * ("D1, D2" or "D1 D2").
 */
export function readBomText(text: string, mapping: Partial<BomColumns> = {}): BomReadResult {
  let rows: string[][];
  try {
    rows = parse(text, { bom: true, skip_empty_lines: true, relax_column_count: true }) as string[][];
  } catch (error) {
    return { ok: false, issues: [{ line: (error as { lines?: number }).lines ?? 0, message: `not readable as CSV: ${(error as Error).message}` }] };
  }
  const header = rows[0] ?? [];
  const find = (key: keyof BomColumns) => {
    const wanted = mapping[key];
    if (wanted !== undefined) return header.findIndex((h) => h.trim().toLowerCase() === wanted.toLowerCase());
    return header.findIndex((h) => KNOWN[key].includes(squash(h)));
  };
  const at = { ref: find('ref'), maker: find('maker'), part: find('part') };
  const issues: BomIssue[] = [];
  for (const key of ['ref', 'maker', 'part'] as const) {
    if (at[key] < 0) {
      const asked = mapping[key] ? `"${mapping[key]}" (from the mapping)` : `one of ${KNOWN[key].join(', ')}`;
      issues.push({ line: 1, message: `no ${key === 'ref' ? 'designator' : key === 'maker' ? 'manufacturer' : 'part number'} column: looked for ${asked}; the header has ${header.map((h) => `"${h}"`).join(', ')}. Map it with --bom-columns ${key}=HEADER` });
    }
  }
  if (issues.length > 0) return { ok: false, issues };
  const lines: BomLine[] = [];
  rows.slice(1).forEach((row, i) => {
    const refs = (row[at.ref] ?? '').split(/[\s,;]+/).map((r) => r.trim()).filter(Boolean);
    const partNumber = (row[at.part] ?? '').trim();
    if (refs.length === 0 && !partNumber) return;
    if (refs.length === 0) issues.push({ line: i + 2, message: `part ${partNumber} has no designator` });
    else lines.push({ refs, manufacturer: (row[at.maker] ?? '').trim(), partNumber, line: i + 2 });
  });
  if (issues.length > 0) return { ok: false, issues };
  const used = new Set([at.ref, at.maker, at.part]);
  return { ok: true, lines, columns: { ref: header[at.ref]!, maker: header[at.maker]!, part: header[at.part]! }, ignored: header.filter((_, i) => !used.has(i)) };
}
