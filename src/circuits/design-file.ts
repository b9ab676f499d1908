import { LineCounter, isAlias, isMap, isScalar, isSeq, parseDocument, visit, type Node, type YAMLMap } from 'yaml';

export const DESIGN_FORMAT_NAME = 'headroom-design';
export const DESIGN_FORMAT_VERSION = 1;

/** A located problem in a design file. */
export interface DesignIssue {
  readonly file: string;
  readonly line: number;
  /** Dotted path of the field: "positions[2].conditions.load_current". */
  readonly field: string;
  readonly message: string;
  readonly expected: string;
}

export interface DesignPosition {
  readonly ref: string;
  readonly role: string;
  readonly policy?: string;
  /** Board RθJA override, as typed. */
  readonly rthJa?: string | number;
  /** Assigned part, "MAKER:PART" or "PART". */
  readonly part?: string;
  readonly notes?: string;
  readonly conditions: Readonly<Record<string, unknown>>;
  readonly line: number;
  /** Line of each condition key, for error messages. */
  readonly conditionLines: Readonly<Record<string, number>>;
  readonly index: number;
}

export interface Design {
  readonly file: string;
  readonly name: string;
  readonly policy?: string;
  readonly positions: readonly DesignPosition[];
}

export type DesignReadResult = { ok: true; design: Design } | { ok: false; issues: DesignIssue[] };

const FORM = 'a YAML (or JSON) mapping with format: headroom-design, version: 1, name and a list of positions (see docs/design-format.md)';
const POSITION_KEYS = new Set(['ref', 'role', 'policy', 'rth_ja', 'part', 'notes', 'conditions']);

/** Reads a design file's text. Comments are allowed (YAML); every problem names its line and field. */
export function readDesignText(file: string, text: string): DesignReadResult {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, uniqueKeys: true, prettyErrors: false, logLevel: 'error' });
  const lineOf = (node: unknown) => {
    const range = (node as Node | undefined)?.range;
    return range ? lineCounter.linePos(range[0]).line : 0;
  };
  const issues: DesignIssue[] = [];
  // Anchors found in one pass, on first use: resolving each alias alone would walk the file each time.
  let anchors: Map<string, Node> | undefined;
  const anchored = () => {
    if (!anchors) {
      const found = new Map<string, Node>();
      visit(doc, { Node: (_key, node) => void (node.anchor && found.set(node.anchor, node)) });
      anchors = found;
    }
    return anchors;
  };
  const add = (line: number, field: string, message: string, expected = '') => issues.push({ file, line, field, message, expected });
  if (doc.errors.length > 0) {
    for (const e of doc.errors) add(Math.max(1, e.linePos?.[0]?.line ?? lineCounter.linePos(e.pos[0]).line), '', `not readable as YAML: ${e.message.split('\n')[0]}`, FORM);
    return { ok: false, issues };
  }
  const root = doc.contents;
  if (!isMap(root)) {
    add(lineOf(root) || 1, '', 'the file must be a mapping of keys to values', FORM);
    return { ok: false, issues };
  }
  const top = root.toJSON() as Record<string, unknown>;
  if (top.format !== DESIGN_FORMAT_NAME) add(lineOf(root.get('format', true)) || 1, 'format', `must be "${DESIGN_FORMAT_NAME}"`, FORM);
  if (top.version !== DESIGN_FORMAT_VERSION) add(lineOf(root.get('version', true)) || 1, 'version', `must be ${DESIGN_FORMAT_VERSION}`, FORM);
  const name = typeof top.name === 'string' && top.name.trim() ? top.name.trim() : '';
  if (!name) add(lineOf(root.get('name', true)) || 1, 'name', 'required: a short name for the design', 'text, e.g. name: FC-M24 motor controller');
  if (top.policy !== undefined && typeof top.policy !== 'string') add(lineOf(root.get('policy', true)), 'policy', 'must be a policy id', 'e.g. policy: commercial');
  const positionsNode = root.get('positions', true);
  const positions: DesignPosition[] = [];
  if (!isSeq(positionsNode)) {
    add(lineOf(positionsNode) || 1, 'positions', 'required: a list of positions', '- ref: D1\n  role: rectifier\n  conditions: {…}');
  } else {
    const seen = new Map<string, number>();
    positionsNode.items.forEach((item, index) => {
      const field = `positions[${index}]`;
      const line = lineOf(item);
      if (!isMap(item)) {
        add(line, field, 'each position must be a mapping', 'ref, role, conditions and optionally policy, rth_ja, part, notes');
        return;
      }
      const p = item.toJSON() as Record<string, unknown>;
      for (const key of Object.keys(p)) {
        if (!POSITION_KEYS.has(key)) add(lineOf(item.get(key, true)) || line, `${field}.${key}`, `unknown key "${key}"`, `one of ${[...POSITION_KEYS].join(', ')}`);
      }
      const ref = typeof p.ref === 'string' || typeof p.ref === 'number' ? String(p.ref).trim() : '';
      if (!ref) add(line, `${field}.ref`, 'required: the reference designator', 'e.g. ref: D3');
      else if (seen.has(ref.toUpperCase())) add(line, `${field}.ref`, `${ref} is listed twice (first at line ${seen.get(ref.toUpperCase())})`, 'each reference designator once');
      else seen.set(ref.toUpperCase(), line);
      if (typeof p.role !== 'string') add(line, `${field}.role`, 'required: the circuit role', 'a role from `headroom roles`, e.g. role: rectifier');
      // Shared conditions written once with a YAML anchor (&relay … *relay) read as their mapping.
      const rawConditions = item.get('conditions', true);
      const conditionsNode = isAlias(rawConditions) ? anchored().get(rawConditions.source) : rawConditions;
      if (conditionsNode !== undefined && !isMap(conditionsNode)) add(lineOf(conditionsNode), `${field}.conditions`, 'must be a mapping of condition names to values', 'e.g. conditions: {vin_max: 16 V}');
      for (const key of ['policy', 'part', 'notes'] as const) {
        if (p[key] !== undefined && typeof p[key] !== 'string') add(lineOf(item.get(key, true)), `${field}.${key}`, 'must be text', '');
      }
      positions.push({
        ref,
        role: String(p.role ?? ''),
        ...(typeof p.policy === 'string' ? { policy: p.policy } : {}),
        ...(typeof p.rth_ja === 'string' || typeof p.rth_ja === 'number' ? { rthJa: p.rth_ja } : {}),
        ...(typeof p.part === 'string' ? { part: p.part } : {}),
        ...(typeof p.notes === 'string' ? { notes: p.notes } : {}),
        conditions: isMap(conditionsNode) ? (conditionsNode.toJSON() as Record<string, unknown>) : {},
        conditionLines: isMap(conditionsNode) ? keyLines(conditionsNode, lineOf) : {},
        line,
        index,
      });
    });
  }
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, design: { file, name, ...(typeof top.policy === 'string' ? { policy: top.policy } : {}), positions } };
}

function keyLines(map: YAMLMap, lineOf: (n: unknown) => number): Record<string, number> {
  const lines: Record<string, number> = {};
  for (const pair of map.items) {
    if (isScalar(pair.key)) lines[String(pair.key.value)] = lineOf(pair.key);
  }
  return lines;
}

export function findPosition(design: Design, ref: string): DesignPosition | undefined {
  return design.positions.find((p) => p.ref.toUpperCase() === ref.trim().toUpperCase());
}
