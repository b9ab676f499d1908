import { LineCounter, parseDocument, isMap, isSeq, type Node } from 'yaml';
import { PART_FIELDS, type Part } from '../parts/index.js';
import type { RecordsRead, SourceRecord } from './csv-format.js';
import { encodePartCells } from './part-cells.js';
import type { RowIssue } from './row-issue.js';

export const JSON_FORMAT_NAME = 'headroom-catalog';
export const JSON_FORMAT_VERSION = 1;

const POINT_KEYS: Record<string, readonly [string, string, string]> = {
  vf_points: ['vf_v', 'if_a', 'tj_k'],
  ir_points: ['ir_a', 'vr_v', 'tj_k'],
};
const POINT_DOMAIN_KEYS: Record<string, readonly [string, string, string]> = {
  vf_points: ['vfV', 'ifA', 'tjK'],
  ir_points: ['irA', 'vrV', 'tjK'],
};


const FORM = `{"format": "${JSON_FORMAT_NAME}", "version": ${JSON_FORMAT_VERSION}, "parts": [{…}, …]} as written by \`headroom catalog export --format json\``;

/**
 * Reads the JSON catalog format into the same column-keyed records as CSV, so both
 * formats share one validation. Lines come from a position-keeping parse of the same text.
 */
export function readJsonRecords(file: string, text: string): RecordsRead {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text.replace(/^\uFEFF/, ''), { lineCounter, strict: true, uniqueKeys: true, logLevel: 'error' });
  if (doc.errors.length > 0) {
    return { records: [], isUnreadable: true, issues: doc.errors.map((e) => ({ file, line: e.linePos?.[0]?.line ?? 0, column: '', value: '', message: `not readable as JSON: ${e.message.split('\n')[0]}`, expected: FORM })) };
  }
  const lineOf = (node: Node | null | undefined) => (node?.range ? lineCounter.linePos(node.range[0]).line : 0);
  const root = doc.contents;
  const top = doc.toJS() as unknown;
  const fail = (message: string, line = lineOf(root)): RecordsRead => ({ records: [], isUnreadable: true, issues: [{ file, line, column: '', value: '', message, expected: FORM }] });
  if (!isMap(root) || typeof top !== 'object' || top === null) return fail('the top level must be an object');
  const body = top as { format?: unknown; version?: unknown; parts?: unknown };
  if (body.format !== JSON_FORMAT_NAME) return fail(`"format" must be "${JSON_FORMAT_NAME}"`);
  if (typeof body.version !== 'number' || body.version > JSON_FORMAT_VERSION || body.version < 1) {
    return fail(`"version" ${String(body.version)} is not one this program reads (1 to ${JSON_FORMAT_VERSION})`);
  }
  const partsNode = root.get('parts', true) as Node | undefined;
  if (!Array.isArray(body.parts) || !isSeq(partsNode)) return fail('"parts" must be an array');
  const issues: RowIssue[] = [];
  const records: SourceRecord[] = [];
  body.parts.forEach((item: unknown, i: number) => {
    const line = lineOf(partsNode.items[i] as Node);
    if (typeof item !== 'object' || item === null || Array.isArray(item)) {
      issues.push({ file, line, column: '', value: '', message: `parts[${i}] is not an object`, expected: 'an object of column names and values' });
      return;
    }
    const cells: Record<string, string> = {};
    for (const [key, value] of Object.entries(item)) {
      if (POINT_KEYS[key] && Array.isArray(value)) cells[key] = pointsToText(value, POINT_KEYS[key]);
      else if (typeof value === 'string' || typeof value === 'number') cells[key] = String(value);
      else if (value !== null) cells[key] = JSON.stringify(value);
    }
    records.push({ line, cells });
  });
  return { records, issues };
}

function pointsToText(points: unknown[], keys: readonly [string, string, string]): string {
  return points
    .map((p) => (typeof p === 'object' && p !== null ? keys.map((k) => String((p as Record<string, unknown>)[k] ?? '')).join('@') : String(p)))
    .join(';');
}

/** Canonical JSON: parts in canonical order, keys in column order, empty fields left out. */
export function writeJson(parts: readonly Part[]): string {
  const out = parts.map((part) => {
    const cells = encodePartCells(part);
    const record = part as unknown as Record<string, unknown>;
    const obj: Record<string, unknown> = {};
    for (const field of PART_FIELDS) {
      const value = record[field.key];
      if (value === undefined || cells[field.column] === '') continue;
      if (POINT_KEYS[field.column]) {
        const keys = POINT_KEYS[field.column]!;
        const domainKeys = POINT_DOMAIN_KEYS[field.column]!;
        obj[field.column] = (value as Record<string, number>[]).map((p) =>
          Object.fromEntries(keys.map((k, i) => [k, p[domainKeys[i]!]])),
        );
      } else obj[field.column] = value;
    }
    return obj;
  });
  return JSON.stringify({ format: JSON_FORMAT_NAME, version: JSON_FORMAT_VERSION, parts: out }, null, 2) + '\n';
}
