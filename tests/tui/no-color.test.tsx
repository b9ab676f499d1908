// Colour must be possible for the test to mean anything: force it before Ink's colour library loads.
const before = process.env.FORCE_COLOR;
process.env.FORCE_COLOR = '1';

import { afterAll, describe, expect, it } from 'vitest';

afterAll(() => {
  if (before === undefined) delete process.env.FORCE_COLOR;
  else process.env.FORCE_COLOR = before;
});

const { renderApp } = await import('./support/render-app.js');
const { themeFor } = await import('../../src/tui/theme.js');
const { testServices } = await import('./support/tui-services.js');
const { coilParts } = await import('./support/tui-fixtures.js');
const { KEY, press, waitFor } = await import('../helpers/render-tui.js');

// SGR colour parameters: 30–37, 38;…, 39, 40–47, 48;…, 49, 90–97, 100–107.
const COLOUR = /\u001b\[(?:\d+;)*(?:3[0-9]|4[0-9]|9[0-7]|10[0-7])(?:;\d+)*m/;

async function browseFrame(theme: ReturnType<typeof themeFor>) {
  const { lastFrame, stdin } = renderApp(testServices(coilParts), { theme });
  await press(stdin, '3');
  await waitFor(lastFrame, 'shown of 4 parts');
  await press(stdin, KEY.escape);
  await waitFor(lastFrame, 'Keys and help');
  return lastFrame();
}

describe('NO_COLOR', () => {
  it('has colour by default', async () => {
    expect(await browseFrame(themeFor({}))).toMatch(COLOUR);
  });

  it('writes no colour codes at all under NO_COLOR, and stays readable', async () => {
    const frame = await browseFrame(themeFor({ NO_COLOR: '1' }));
    expect(frame).not.toMatch(COLOUR);
    expect(frame).toContain('› 1  New position');
  });
});

async function substitutionFrame(theme: ReturnType<typeof themeFor>) {
  const { lastFrame, stdin } = renderApp(testServices(coilParts), { theme });
  await press(stdin, '5');
  await waitFor(lastFrame, 'Choose the original');
  await press(stdin, '/', 'l', 'o', 'w', 'v', KEY.enter, KEY.enter);
  await waitFor(lastFrame, 'ranked replacements of the original');
  await press(stdin, KEY.enter);
  await waitFor(lastFrame, 'DROP-IN');
  return lastFrame();
}

describe('NO_COLOR on the substitution screen', () => {
  it('has colour by default', async () => {
    expect(await substitutionFrame(themeFor({}))).toMatch(COLOUR);
  });

  it('writes no colour, every verdict and rating still marked', async () => {
    const frame = await substitutionFrame(themeFor({ NO_COLOR: '1' }));
    expect(frame).not.toMatch(COLOUR);
    expect(frame).toContain('✓ DROP-IN');
    expect(frame.replace(/\u001b\[\d+m/g, '')).toMatch(/✓ VRRM\s+35.0 V\s+100 V\s+better/);
  });
});
