import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderApp } from './support/render-app.js';
import { KEY, press, type, waitFor, widestLine } from '../helpers/render-tui.js';
import { useTempDir } from '../helpers/temp-dir.js';
import { coilParts } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

const tempDir = useTempDir();

const RELAY_BOARD = `# Relay board, rev A. Keep this comment.
format: headroom-design
version: 1
name: Relay board
policy: commercial
positions:
  - ref: K1-D            # across relay K1
    role: coil-freewheel
    notes: Freewheel for K1.
    conditions:
      supply_max: 32 V   # 24 V rail at its worst
      coil_resistance: 800 Ω
      coil_inductance: 0.6 H
      ambient_max: 70 °C
`;

describe('a whole session at the keyboard', () => {
  it('goes from the role to a part saved as a new position of a commented design file', async () => {
    const dir = tempDir();
    const file = join(dir, 'relay-board.yaml');
    writeFileSync(file, RELAY_BOARD);
    const { lastFrame, stdin } = renderApp(testServices(coilParts, { cwd: dir }));
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'choose the circuit role');
    await press(stdin, KEY.down, KEY.down, KEY.down, KEY.down);
    expect(lastFrame()).toContain('› Freewheel diode across a coil');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'Derating policy');
    await press(stdin, KEY.down);
    await type(stdin, '32 V');
    await press(stdin, KEY.down);
    await type(stdin, '530 Ω');
    await press(stdin, KEY.down);
    await type(stdin, '0.4 H');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'LIMITS A PART MUST MEET');
    expect(lastFrame()).toContain('VRRM ≥ 40.0 V');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'GOOD-1');
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
    await press(stdin, 'a');
    await waitFor(lastFrame, 'save to a design file');
    await type(stdin, 'relay-board.yaml');
    expect(lastFrame()).toContain('existing design "Relay board"');
    await press(stdin, KEY.down);
    await type(stdin, 'K2-D');
    await press(stdin, KEY.down);
    await type(stdin, 'Freewheel for the brake relay K2.');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, '✓ Saved:');
    const saved = readFileSync(file, 'utf8');
    expect(saved.startsWith(RELAY_BOARD)).toBe(true);
    expect(saved).toContain('# Relay board, rev A. Keep this comment.');
    expect(saved).toContain('supply_max: 32 V   # 24 V rail at its worst');
    expect(saved).toContain('  - ref: K2-D\n    role: coil-freewheel\n    policy: commercial\n    notes: Freewheel for the brake relay K2.\n    part: Testwell Devices:GOOD-1\n');
    expect(saved).toContain('coil_resistance: 530 Ω');
  });

  it('opens a position of a design file, ranks it and writes the chosen part into it', async () => {
    const dir = tempDir();
    const file = join(dir, 'relay-board.yaml');
    writeFileSync(file, RELAY_BOARD);
    const { lastFrame, stdin } = renderApp(testServices(coilParts, { cwd: dir }));
    await press(stdin, '2');
    await waitFor(lastFrame, 'Open a design file');
    await type(stdin, 'relay-board.yaml');
    await press(stdin, KEY.enter, KEY.enter);
    await waitFor(lastFrame, 'K1-D › Freewheel diode across a coil');
    expect(lastFrame()).toMatch(/Highest ambient\s+70 °C/);
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'Design         Relay board');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'GOOD-1');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'MARGINS');
    await press(stdin, 'a');
    await waitFor(lastFrame, 'Enter writes `part:` into this position');
    expect(lastFrame()).toMatch(/Replaces\s+\(no part assigned yet\)/);
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, '✓ Saved.');
    const saved = readFileSync(file, 'utf8');
    expect(saved).toBe(RELAY_BOARD.replace('    notes: Freewheel for K1.\n', '    notes: Freewheel for K1.\n    part: Testwell Devices:GOOD-1\n'));
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'part Testwell Devices:GOOD-1');
  });

  it('follows keys sent in one burst across changes of screen', async () => {
    const { lastFrame, stdin } = renderApp(testServices(coilParts));
    stdin.write('\r\u001b[B\u001b[B\u001b[B\u001b[B\r\u001b[B');
    await waitFor(lastFrame, 'Freewheel diode across a coil');
    stdin.write('32 V');
    await waitFor(lastFrame, '32 V▏');
    expect(lastFrame()).toMatch(/› Highest supply voltage \* 32 V▏/);
  });
});
