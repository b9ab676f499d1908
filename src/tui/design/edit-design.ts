import { Document, LineCounter, isMap, isScalar, isSeq, parseDocument, stringify, type Pair, type YAMLMap, type YAMLSeq } from 'yaml';
import { DESIGN_FORMAT_NAME, DESIGN_FORMAT_VERSION, readDesignText } from '../../circuits/design-file.js';

/*
 * Edits of a design file's text. The yaml Document API finds the nodes and their source ranges;
 * the change is then spliced into the original text, so comments, their alignment, long lines
 * and the author's layout all stay exactly as they were and a review diff shows one line. Every
 * result is parsed back and compared with the intended document; if the splice cannot be proven
 * right (a flow-style file, say), the whole document is written out by the Document API instead.
 * Pure: text in, text out; the caller reads and writes the file.
 */

export type EditResult = { readonly ok: true; readonly text: string } | { readonly ok: false; readonly message: string };

/** A position as the interface writes it: conditions as typed. */
export interface NewPosition {
  readonly ref: string;
  readonly role: string;
  readonly policy?: string;
  readonly part?: string;
  readonly notes?: string;
  readonly conditions: Readonly<Record<string, string | number | boolean>>;
}

/** Keys a new `part:` may follow, so it sits near the top of the entry. */
const PART_AFTER = ['ref', 'role', 'policy', 'rth_ja', 'notes'];

interface Parsed {
  readonly doc: Document;
  readonly lines: LineCounter;
  readonly positions: YAMLSeq;
}

function parse(text: string): Parsed | { message: string } {
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines });
  if (doc.errors.length > 0) return { message: `not readable as YAML: ${doc.errors[0]!.message.split('\n')[0]}` };
  const positions = isMap(doc.contents) ? doc.contents.get('positions', true) : undefined;
  if (!isSeq(positions)) return { message: 'the file has no list of positions' };
  return { doc, lines, positions };
}

const refOf = (item: unknown) => {
  const ref = isMap(item) ? item.get('ref') : undefined;
  return typeof ref === 'string' || typeof ref === 'number' ? String(ref).trim().toUpperCase() : '';
};

/** A string as YAML writes it on one line: plain when it can be, quoted when it must be. */
const scalarText = (value: string) => stringify(value, { lineWidth: 0 }).trimEnd();

/** JSON with every mapping's keys sorted: equal data, whatever the key order. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

/** The text, if it reads as a valid design holding exactly the `expected` data. */
function checked(file: string, text: string, expected: unknown): EditResult | null {
  const doc = parseDocument(text);
  if (doc.errors.length > 0 || canonical(doc.toJSON()) !== canonical(expected)) return null;
  const design = readDesignText(file, text);
  if (!design.ok) return { ok: false, message: `the edited file would not read back: ${design.issues[0]!.message}` };
  return { ok: true, text };
}

/** The whole document written out by the yaml library: comments kept, spacing normalised. */
function rewritten(file: string, doc: Document, expected: unknown): EditResult {
  const text = doc.toString({ lineWidth: 0 });
  return checked(file, text, expected) ?? { ok: false, message: 'the edited file did not read back as intended; nothing was written' };
}

function lineEndAfter(text: string, offset: number): number {
  if (offset > 0 && text[offset - 1] === '\n') return offset;
  const nl = text.indexOf('\n', offset);
  return nl === -1 ? text.length : nl + 1;
}

/** Sets `part:` of one position: its value replaced in place, or a line added after ref/role/notes. */
export function assignPart(file: string, text: string, ref: string, partRef: string): EditResult {
  const parsed = parse(text);
  if ('message' in parsed) return { ok: false, message: parsed.message };
  const index = parsed.positions.items.findIndex((i) => refOf(i) === ref.trim().toUpperCase());
  const item = parsed.positions.items[index];
  if (!isMap(item)) return { ok: false, message: `no position ${ref} in the file` };
  const expected = parsed.doc.toJSON() as { positions: Record<string, unknown>[] };
  expected.positions[index]!.part = partRef;

  const spliced = spliceAssignment(text, parsed, item, partRef);
  const result = spliced === null ? null : checked(file, spliced, expected);
  if (result) return result;
  parsed.doc.setIn(['positions', index, 'part'], partRef);
  return rewritten(file, parsed.doc, expected);
}

function spliceAssignment(text: string, { lines }: Parsed, item: YAMLMap, partRef: string): string | null {
  if (item.flow) return null;
  const pairs = item.items as Pair[];
  const existing = pairs.find((p) => isScalar(p.key) && p.key.value === 'part');
  if (existing) {
    const range = isScalar(existing.value) ? existing.value.range : undefined;
    return range ? text.slice(0, range[0]) + scalarText(partRef) + text.slice(range[1]) : null;
  }
  const keyOf = (p: Pair) => (isScalar(p.key) ? String(p.key.value) : '');
  // After the run of leading keys such as ref, role and notes: before conditions, wherever rth_ja is.
  const leading = pairs.findIndex((p) => !PART_AFTER.includes(keyOf(p)));
  const anchor = pairs[(leading === -1 ? pairs.length : leading) - 1];
  const firstKey = pairs[0]?.key;
  const end = (anchor && isScalar(anchor.value) ? anchor.value.range?.[2] : undefined) ?? undefined;
  if (end === undefined || !isScalar(firstKey) || !firstKey.range) return null;
  const at = lineEndAfter(text, end);
  const indent = ' '.repeat(lines.linePos(firstKey.range[0]).col - 1);
  const before = text.slice(0, at);
  return `${before}${before.endsWith('\n') ? '' : '\n'}${indent}part: ${scalarText(partRef)}\n${text.slice(at)}`;
}

function positionBody(position: NewPosition): Record<string, unknown> {
  return {
    ref: position.ref,
    role: position.role,
    ...(position.policy ? { policy: position.policy } : {}),
    ...(position.notes ? { notes: position.notes } : {}),
    ...(position.part ? { part: position.part } : {}),
    conditions: { ...position.conditions },
  };
}

/** Appends a position after the last one, in the file's own indentation; its ref must be new. */
export function appendPosition(file: string, text: string, position: NewPosition): EditResult {
  const parsed = parse(text);
  if ('message' in parsed) return { ok: false, message: parsed.message };
  if (parsed.positions.items.some((i) => refOf(i) === position.ref.trim().toUpperCase())) {
    return { ok: false, message: `the file already has a position ${position.ref}` };
  }
  const body = positionBody(position);
  const expected = parsed.doc.toJSON() as { positions: unknown[] };
  expected.positions.push(body);

  const seq = parsed.positions;
  if (!seq.flow && seq.range) {
    const at = lineEndAfter(text, seq.range[2]);
    const indent = ' '.repeat(parsed.lines.linePos(seq.range[0]).col - 1);
    const block = new Document([body]).toString({ lineWidth: 0 }).trimEnd().split('\n').map((l) => indent + l).join('\n');
    const before = text.slice(0, at);
    const spliced = `${before}${before.endsWith('\n') ? '' : '\n'}\n${block}\n${text.slice(at)}`;
    const result = checked(file, spliced, expected);
    if (result) return result;
  }
  const node = parsed.doc.createNode(body) as YAMLMap;
  node.spaceBefore = true;
  seq.items.push(node);
  return rewritten(file, parsed.doc, expected);
}

/** A new design file holding one position. */
export function newDesign(file: string, name: string, position: NewPosition): EditResult {
  const body = positionBody(position);
  const doc = new Document({ format: DESIGN_FORMAT_NAME, version: DESIGN_FORMAT_VERSION, name, positions: [body] });
  doc.commentBefore = ' Design file written by Headroom (docs/design-format.md). Edit freely: comments are kept.';
  return rewritten(file, doc, doc.toJSON());
}
