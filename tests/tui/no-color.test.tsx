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
