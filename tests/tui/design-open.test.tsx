import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DesignOpenScreen } from '../../src/tui/screens/design-open-screen.js';
import { renderScreen } from './support/render-app.js';
import { KEY, press, type } from '../helpers/render-tui.js';
import { useTempDir } from '../helpers/temp-dir.js';
import { coilParts } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

const tempDir = useTempDir();

const DESIGN = `# Relay board
format: headroom-design
version: 1
name: Relay board
positions:
  - ref: K1-D
    role: coil-freewheel
    part: Testwell Devices:GOOD-1
    conditions:
      supply_max: 32 V
      coil_resistance: 800 Ω
      coil_inductance: 0.6 H
      ambient_max: 343.15
  - ref: X1
    role: teleporter
    conditions: {}
`;

describe('opening a design file', () => {
  it('completes the path with Tab, lists the positions and opens one in the form', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'relay-board.yaml'), DESIGN);
    const { lastFrame, stdin, routes } = renderScreen(<DesignOpenScreen width={80} height={24} isActive />, testServices(coilParts, { cwd: dir }));
    await type(stdin, 'rel');
    await press(stdin, KEY.tab);
    expect(lastFrame()).toContain('relay-board.yaml▏');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('Relay board · 2 positions');
    expect(lastFrame()).toMatch(/› K1-D\s+coil-freewheel\s+part Testwell Devices:GOOD-1/);
    await press(stdin, KEY.enter);
    const route = routes[0] as { name: string; draft: { values: Record<string, string>; origin: { ref: string } } };
    expect(route.name).toBe('form');
    expect(route.draft.origin.ref).toBe('K1-D');
    expect(route.draft.values).toMatchObject({ supply_max: '32 V', ambient_max: '343.15 K' });
  });

  it('says which role is unknown', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'd.yaml'), DESIGN);
    const { lastFrame, stdin } = renderScreen(<DesignOpenScreen width={80} height={24} isActive />, testServices(coilParts, { cwd: dir }));
    await type(stdin, 'd.yaml');
    await press(stdin, KEY.enter, KEY.down, KEY.enter);
    expect(lastFrame()).toContain('X1: unknown role "teleporter"');
  });

  it('lists every problem of a broken file with its line', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'bad.yaml'), 'format: headroom-design\nversion: 2\npositions: 3\n');
    const { lastFrame, stdin } = renderScreen(<DesignOpenScreen width={80} height={24} isActive />, testServices(coilParts, { cwd: dir }));
    await type(stdin, 'bad.yaml');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('problems in the design file');
    expect(lastFrame()).toContain('line 2 version: must be 1');
    await press(stdin, KEY.ctrlU);
    await type(stdin, 'missing.yaml');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('no file');
  });
});
