import { describe, expect, it } from 'vitest';
import { readDesignText } from '../../src/circuits/design-file.js';
import { appendPosition, assignPart, newDesign } from '../../src/tui/design/edit-design.js';

const DESIGN = `# Bench supply, rev B.
# Reviewed 2026-01-04.
format: headroom-design
version: 1
name: Bench supply
policy: commercial
positions:
  - ref: D1
    role: polarity-guard
    notes: Series guard on the input; a very long note that goes on past eighty columns without a break at all
    part: Testwell Devices:TW-SK340A   # first choice, aligned comment
    conditions:
      supply_max: 16 V        # car battery, charging
      load_max: 1 A
  - ref: D2
    role: coil-freewheel
    conditions:
      supply_max: 12 V
      coil_resistance: 120 Ω
      coil_inductance: 50 mH   # relay K1
    rth_ja: 200 °C/W
`;

const changedLines = (before: string, after: string) => {
  const a = before.split('\n');
  const b = after.split('\n');
  return { removed: a.filter((l) => !b.includes(l)), added: b.filter((l) => !a.includes(l)) };
};

describe('assigning a part in a design file', () => {
  it('replaces the part in place: one line changes, comments and their alignment stay', () => {
    const r = assignPart('bench.yaml', DESIGN, 'd1', 'Testwell Devices:TW-SK360B');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(changedLines(DESIGN, r.text)).toEqual({
      removed: ['    part: Testwell Devices:TW-SK340A   # first choice, aligned comment'],
      added: ['    part: Testwell Devices:TW-SK360B   # first choice, aligned comment'],
    });
    expect(r.text).toContain('# Bench supply, rev B.');
    expect(r.text).toContain('supply_max: 16 V        # car battery, charging');
  });

  it('adds a part: line after ref, role and notes when there is none', () => {
    const r = assignPart('bench.yaml', DESIGN, 'D2', 'Acme: "odd" name');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(changedLines(DESIGN, r.text)).toEqual({ removed: [], added: [`    part: 'Acme: "odd" name'`] });
    expect(r.text.indexOf("part: 'Acme")).toBeLessThan(r.text.indexOf('conditions:', r.text.indexOf('ref: D2')));
    const read = readDesignText('bench.yaml', r.text);
    expect(read.ok && read.design.positions[1]!.part).toBe('Acme: "odd" name');
  });

  it('says so when the position is not in the file', () => {
    expect(assignPart('bench.yaml', DESIGN, 'D9', 'X:Y')).toEqual({ ok: false, message: 'no position D9 in the file' });
  });

  it('writes a flow-style file through the Document API, keeping its comments', () => {
    const flow = '# top comment\nformat: headroom-design\nversion: 1\nname: F\npositions: [{ref: D1, role: signal-clamp, conditions: {reverse_max: 5 V, forward_peak: 1 mA}}] # inline\n';
    const r = assignPart('f.yaml', flow, 'D1', 'A:B');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.text).toContain('# top comment');
    const read = readDesignText('f.yaml', r.text);
    expect(read.ok && read.design.positions[0]!.part).toBe('A:B');
  });
});

describe('saving a new position', () => {
  const position = { ref: 'D3', role: 'signal-clamp', policy: 'commercial', part: 'A:B', conditions: { reverse_max: '32 V', forward_peak: '5 mA', ambient_max: '70 °C' } };

  it('appends after the last position in the file\'s indentation, the rest untouched', () => {
    const r = appendPosition('bench.yaml', DESIGN, position);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.text.startsWith(DESIGN)).toBe(true);
    expect(r.text.slice(DESIGN.length)).toBe('\n  - ref: D3\n    role: signal-clamp\n    policy: commercial\n    part: A:B\n    conditions:\n      reverse_max: 32 V\n      forward_peak: 5 mA\n      ambient_max: 70 °C\n');
  });

  it('refuses a reference the file already has', () => {
    expect(appendPosition('bench.yaml', DESIGN, { ...position, ref: 'd1' })).toEqual({ ok: false, message: 'the file already has a position d1' });
  });

  it('starts a new, valid design file with one position', () => {
    const r = newDesign('new.yaml', 'Relay board', position);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.text).toContain('format: headroom-design');
    const read = readDesignText('new.yaml', r.text);
    expect(read.ok && read.design.positions.map((p) => [p.ref, p.part])).toEqual([['D3', 'A:B']]);
  });
});
