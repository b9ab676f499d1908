import { describe, expect, it } from 'vitest';
import { findPart } from '../../src/catalog/index.js';
import { aPart } from '../helpers/a-part.js';
import { KEY, press, pressUntil, type, waitFor, widestLine } from '../helpers/render-tui.js';
import { renderApp } from './support/render-app.js';
import { testServices } from './support/tui-services.js';

const OTHER = 'Oristane Devices';
const parts = [
  aPart('schottky', { ifsmA: 80, secondSourceGroup: 'SK3A40' }),
  aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-340A', ifsmA: 80, secondSourceGroup: 'SK3A40' }),
  aPart('schottky', { manufacturer: OTHER, partNumber: 'ODK-360A', vrrmV: 60, ifsmA: 100, vfPoints: [{ vfV: 0.55, ifA: 3, tjK: 298.15 }] }),
];

describe('a part at the keyboard', () => {
  it('part detail → edit → change a rating → save → the detail shows it', async () => {
    const services = testServices(parts);
    const { lastFrame, stdin } = renderApp(services);
    await press(stdin, '3');
    await waitFor(lastFrame, 'shown of 3 parts');
    await press(stdin, '/');
    await type(stdin, 'tw-sk340a');
    await press(stdin, KEY.enter, KEY.enter);
    await waitFor(lastFrame, 'Testwell Devices TW-SK340A');
    expect(lastFrame()).toMatch(/VRRM\s+40.0 V/);
    await press(stdin, 'e');
    await waitFor(lastFrame, 'TW-SK340A › edit');
    await pressUntil(stdin, lastFrame, KEY.down, '› VRRM', 20);
    await press(stdin, KEY.ctrlU);
    await type(stdin, '45 V');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, '✓ Saved Testwell Devices:TW-SK340A: VRRM changed.');
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'APPROVAL TRAIL');
    expect(lastFrame()).toMatch(/VRRM\s+45.0 V/);
    expect(findPart(services.catalogDb, 'TW-SK340A').vrrmV).toBe(45);
  });

  it('part detail → substitution → choose the alternate → verdict', async () => {
    const { lastFrame, stdin } = renderApp(testServices(parts));
    await press(stdin, '3');
    await waitFor(lastFrame, 'shown of 3 parts');
    await press(stdin, KEY.down, KEY.enter);
    await waitFor(lastFrame, 'Oristane Devices ODK-360A');
    await press(stdin, 'r');
    await waitFor(lastFrame, 'ranked replacements of the original (2)');
    expect(lastFrame()).toMatch(/› 1\s+✗ ODK-340A/);
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, 'NOT A DROP-IN');
    expect(lastFrame()).toMatch(/✗ VRRM\s+60.0 V\s+40.0 V\s+worse/);
    expect(lastFrame()).toMatch(/✓ VF\s+550 mV\s+500 mV\s+better/);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
    await press(stdin, KEY.escape);
    await waitFor(lastFrame, 'APPROVAL TRAIL');
  });

  it('home → check a substitute: the original from the catalog, then the alternate from its replacements', async () => {
    const { lastFrame, stdin } = renderApp(testServices(parts));
    expect(lastFrame()).toContain('5  Check a substitute');
    await press(stdin, '5');
    await waitFor(lastFrame, 'Choose the original');
    await press(stdin, '/');
    await type(stdin, 'tw-sk');
    await press(stdin, KEY.enter, KEY.enter);
    await waitFor(lastFrame, 'ranked replacements of the original (2)');
    expect(lastFrame()).toMatch(/Original\s+Testwell Devices TW-SK340A/);
    await press(stdin, KEY.enter);
    await waitFor(lastFrame, '✓ DROP-IN');
    expect(lastFrame()).toContain('• equal or better in every rating both datasheets give');
    await press(stdin, '?');
    expect(lastFrame()).toMatch(/x\s+exchange: original and alternate change places/);
    expect(lastFrame()).toMatch(/o\s+original: choose the part to be replaced/);
  });
});
