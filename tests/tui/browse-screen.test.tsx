import { describe, expect, it } from 'vitest';
import { BrowseScreen } from '../../src/tui/screens/browse-screen.js';
import { aPart } from '../helpers/a-part.js';
import { KEY, renderTui, tick } from '../helpers/render-tui.js';

const parts = [
  aPart('schottky'),
  aPart('zener'),
  aPart('schottky', { partNumber: 'TW-SK1A-123', package: 'SOD-123', description: 'small Schottky' }),
];
const noop = () => undefined;

describe('catalog browser', () => {
  it('lists parts with their headline ratings at 80 columns', () => {
    const { lastFrame } = renderTui(<BrowseScreen parts={parts} catalogLabel="demo" width={80} height={24} onQuit={noop} />);
    const frame = lastFrame()!;
    expect(frame).toContain('catalog demo · 3 parts');
    expect(frame).toContain('TW-Z5V1');
    expect(frame).toMatch(/TW-Z5V1\s+zener\s+SOD-123\s+VZ 5.10 V ±5.00 %/);
    expect(frame.split('\n').every((l) => l.length <= 80)).toBe(true);
  });

  it('filters as you type, ignoring separators', async () => {
    const { lastFrame, stdin } = renderTui(<BrowseScreen parts={parts} catalogLabel="demo" width={80} height={24} onQuit={noop} />);
    stdin.write('sod123 schottky');
    await tick();
    expect(lastFrame()).toContain('TW-SK1A-123');
    expect(lastFrame()).not.toContain('TW-Z5V1');
    expect(lastFrame()).not.toContain('TW-SK340A');
    expect(lastFrame()).toContain('1 shown');
  });

  it('says so when nothing matches and when the catalog is empty', async () => {
    const { lastFrame, stdin } = renderTui(<BrowseScreen parts={parts} catalogLabel="demo" width={80} height={24} onQuit={noop} />);
    stdin.write('zzzz');
    await tick();
    expect(lastFrame()).toContain('Nothing matches "zzzz"');
    const empty = renderTui(<BrowseScreen parts={[]} catalogLabel="new" width={80} height={24} onQuit={noop} />);
    expect(empty.lastFrame()).toContain('The catalog is empty');
  });

  it('opens a part with Enter and shows its ratings with conditions, Esc returns', async () => {
    const { lastFrame, stdin } = renderTui(<BrowseScreen parts={parts} catalogLabel="demo" width={80} height={24} onQuit={noop} />);
    stdin.write(KEY.enter);
    await tick();
    expect(lastFrame()).toContain('Testwell Devices TW-SK340A');
    expect(lastFrame()).toMatch(/VF\s+500 mV at 3.00 A, Tj 25.0 °C/);
    stdin.write(KEY.escape);
    await tick();
    expect(lastFrame()).toContain('Search:');
  });

  it('shows escape sequences from catalog text harmlessly', () => {
    const hostile = aPart('schottky', { description: 'ok\u001b]0;pwned\u0007\u001b[31mred' });
    const { lastFrame } = renderTui(<BrowseScreen parts={[hostile]} catalogLabel="demo" width={80} height={24} onQuit={noop} />);
    expect(lastFrame()).not.toContain('\u001b]');
  });
});
