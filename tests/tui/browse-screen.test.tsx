import { describe, expect, it } from 'vitest';
import { BrowseScreen } from '../../src/tui/screens/browse-screen.js';
import { aPart } from '../helpers/a-part.js';
import { renderScreen } from './support/render-app.js';
import { KEY, press, tick, type, waitFor, widestLine } from '../helpers/render-tui.js';
import { testServices } from './support/tui-services.js';

const parts = [
  aPart('schottky'),
  aPart('zener'),
  aPart('schottky', { partNumber: 'TW-SK1A-123', package: 'SOD-123', description: 'small Schottky' }),
];

function browse(list = parts, options: { memoryLimit?: number; columns?: number } = {}) {
  const services = testServices(list, options.memoryLimit !== undefined ? { memoryLimit: options.memoryLimit } : {});
  const columns = options.columns ?? 80;
  return renderScreen(<BrowseScreen width={columns} height={24} isActive />, services, { columns });
}

describe('catalog browser', () => {
  it('lists parts with their headline ratings at 80 columns', () => {
    const { lastFrame } = browse();
    const frame = lastFrame();
    expect(frame).toContain('Catalog test');
    expect(frame).toContain('3 shown of 3 parts');
    expect(frame).toMatch(/TW-Z5V1\s+zener\s+SOD-123\s+VZ 5.10 V ±5.00 %/);
    expect(widestLine(frame)).toBeLessThanOrEqual(80);
  });

  it('shows the maker column only when the terminal is wide', () => {
    expect(browse(parts, { columns: 80 }).lastFrame()).not.toContain('Testwell Devices');
    expect(browse(parts, { columns: 120 }).lastFrame()).toContain('Testwell Devices');
  });

  it('searches after /, ignoring separators, and Esc clears the search', async () => {
    const { lastFrame, stdin } = browse();
    await press(stdin, '/');
    await type(stdin, 'sod123 schottky');
    await waitFor(lastFrame, '1 shown of 3 parts');
    expect(lastFrame()).toContain('TW-SK1A-123');
    expect(lastFrame()).not.toContain('TW-Z5V1');
    expect(lastFrame()).toContain('1 shown of 3 parts');
    await press(stdin, KEY.escape, KEY.escape);
    await waitFor(lastFrame, '3 shown of 3 parts');
  });

  it('pages a large catalog through SQLite with the same search', async () => {
    const many = Array.from({ length: 60 }, (_, i) => aPart('schottky', { partNumber: `TW-${String(i).padStart(3, '0')}`, package: i % 2 ? 'SMA' : 'SMB' }));
    const { lastFrame, stdin } = browse(many, { memoryLimit: 10 });
    expect(lastFrame()).toContain('60 shown of 60 parts');
    expect(lastFrame()).toMatch(/▼ \d+ more/);
    await press(stdin, KEY.pageDown, KEY.pageDown);
    expect(lastFrame()).toMatch(/▲ \d+ more/);
    await press(stdin, '/');
    await type(stdin, 'smb');
    await waitFor(lastFrame, '30 shown of 60 parts');
  });

  it('says so when nothing matches and when the catalog is empty', async () => {
    const { lastFrame, stdin } = browse();
    await press(stdin, '/');
    await type(stdin, 'zzzz');
    await waitFor(lastFrame, 'Nothing matches "zzzz"');
    expect(browse([]).lastFrame()).toContain('The catalog is empty');
  });

  it('opens the selected part with Enter', async () => {
    const { stdin, routes } = browse();
    await press(stdin, KEY.down, KEY.enter);
    expect(routes).toEqual([{ name: 'part', part: expect.objectContaining({ partNumber: 'TW-SK340A' }) }]);
  });

  it('cuts very long names to the column and shows escape sequences harmlessly', async () => {
    const hostile = aPart('schottky', { partNumber: 'TW-' + 'X'.repeat(100), description: 'ok\u001b]0;pwned\u0007\u001b[31mred' });
    const { lastFrame } = browse([hostile]);
    await tick();
    expect(lastFrame()).not.toContain('\u001b]');
    expect(lastFrame()).toMatch(/TW-X+… /);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });
});
