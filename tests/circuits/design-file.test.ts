import { describe, expect, it } from 'vitest';
import { readDesignText } from '../../src/circuits/design-file.js';

const head = 'format: headroom-design\nversion: 1\nname: t\npositions:\n';

describe('design files', () => {
  it('reads conditions shared through a YAML anchor', () => {
    const r = readDesignText('d.yaml', `${head}  - ref: D1\n    role: coil-freewheel\n    conditions: &relay\n      supply_max: 32 V\n  - ref: D2\n    role: coil-freewheel\n    conditions: *relay\n`);
    expect(r.ok && r.design.positions.map((p) => [p.ref, p.conditions])).toEqual([
      ['D1', { supply_max: '32 V' }],
      ['D2', { supply_max: '32 V' }],
    ]);
  });

  it('names the line of a repeated designator, an unknown key and a missing role', () => {
    const r = readDesignText('d.yaml', `${head}  - ref: D1\n    role: rectifier\n  - ref: d1\n    role: rectifier\n    colour: red\n  - ref: D3\n`);
    expect(r.ok ? [] : r.issues.map((i) => `${i.line} ${i.field}: ${i.message}`)).toEqual([
      '9 positions[1].colour: unknown key "colour"',
      '7 positions[1].ref: d1 is listed twice (first at line 5)',
      '10 positions[2].role: required: the circuit role',
    ]);
  });

  it('places a YAML syntax error on its line', () => {
    const r = readDesignText('d.yaml', 'format: headroom-design\nversion: 1\nname: [unclosed\n');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues[0]!.line).toBeGreaterThan(0);
  });
});
