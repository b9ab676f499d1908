import { describe, expect, it } from 'vitest';
import { renderApp } from './support/render-app.js';
import { KEY, press, waitFor, widestLine } from '../helpers/render-tui.js';
import { coilParts } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

describe('home', () => {
  it('offers the jobs and help at once, then the catalog size, within 80 columns', async () => {
    const { lastFrame } = renderApp(testServices(coilParts));
    // The first frame does not wait for the count (a scan of a large catalog).
    expect(lastFrame()).toContain('Catalog: test · counting parts…');
    await waitFor(lastFrame, 'Catalog: test · 4 parts');
    for (const text of ['New position', 'Open a design file', 'Browse the catalog', 'Add a part', 'Keys and help', 'search all 4 parts']) {
      expect(lastFrame()).toContain(text);
    }
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
    expect(lastFrame().split('\n').length).toBeLessThanOrEqual(24);
  });

  it('opens a job by its number', async () => {
    const { lastFrame, stdin } = renderApp(testServices(coilParts));
    await press(stdin, '3');
    await waitFor(lastFrame, 'Catalog test');
    await press(stdin, KEY.escape);
    await waitFor(lastFrame, 'Keys and help');
  });

  it('welcomes a first run without a catalog and opens the demo on d', async () => {
    const { lastFrame, stdin } = renderApp(testServices(coilParts, { hasCatalog: false }));
    expect(lastFrame()).toContain('Welcome to Headroom');
    expect(lastFrame()).toContain('There is no parts catalog at /nowhere/catalog.sqlite yet.');
    await press(stdin, 'd');
    await waitFor(lastFrame, 'New position');
  });
});

describe('the key overlay', () => {
  it('lists the keys of the screen in view from the key table; any key closes it', async () => {
    const { lastFrame, stdin } = renderApp(testServices(coilParts));
    await press(stdin, '?');
    expect(lastFrame()).toContain('Keys (any key closes)');
    expect(lastFrame()).toMatch(/Enter\s+choose/);
    expect(lastFrame()).toMatch(/Ctrl\+C\s+quit at once/);
    expect(lastFrame()).toContain('✓ pass · ! marginal · ✗ fail · ? unknown');
    await press(stdin, KEY.down);
    expect(lastFrame()).not.toContain('Keys (any key closes)');
    expect(lastFrame()).toContain('› 1  New position');
  });

  it('quits on q where nothing is being typed', async () => {
    const { stdin, waitUntilExit } = renderApp(testServices(coilParts));
    const exited = waitUntilExit();
    await press(stdin, 'q');
    await expect(exited).resolves.toBeUndefined();
  });
});
