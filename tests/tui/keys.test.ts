import type { Key } from 'ink';
import { describe, expect, it } from 'vitest';
import { commandFor, describeCommands, helpLine, splitBurst, typedText } from '../../src/tui/keys.js';

const key = (overrides: Partial<Key> = {}): Key =>
  ({ upArrow: false, downArrow: false, leftArrow: false, rightArrow: false, pageDown: false, pageUp: false, home: false, end: false, return: false, escape: false, ctrl: false, shift: false, tab: false, backspace: false, delete: false, meta: false, super: false, hyper: false, capsLock: false, numLock: false, ...overrides }) as Key;

describe('key commands', () => {
  it('maps letters to commands only when not typing', () => {
    expect(commandFor('q', key(), [])).toBe('quit');
    expect(commandFor('q', key(), [], true)).toBeUndefined();
    expect(commandFor('s', key(), ['sort'])).toBe('sort');
    expect(commandFor('s', key(), ['sort'], true)).toBeUndefined();
    expect(commandFor('?', key(), [])).toBe('help');
  });

  it('keeps Ctrl+C, Esc, Enter and arrows while typing', () => {
    expect(commandFor('c', key({ ctrl: true }), [], true)).toBe('forceQuit');
    expect(commandFor('', key({ escape: true }), ['back'], true)).toBe('back');
    expect(commandFor('', key({ return: true }), ['select'], true)).toBe('select');
    expect(commandFor('', key({ downArrow: true }), ['down'], true)).toBe('down');
  });

  it('offers only the commands a screen names', () => {
    expect(commandFor('a', key(), ['sort'])).toBeUndefined();
  });

  it('builds the footer from the table, pairs joined, within the width', () => {
    const line = helpLine(['down', 'up', ['select', 'open: every margin'], 'sort', 'back'], 80);
    expect(line).toBe('Enter open · s sort · Esc back · ↑/↓ move · ? keys');
    expect(helpLine(['select', 'sort', 'filter', 'search', 'assign', 'back', 'up', 'down'], 30).length).toBeLessThanOrEqual(30);
  });

  it('describes commands with the screen\'s own words', () => {
    expect(describeCommands([['select', 'solve: limits'], 'sort'])).toEqual([
      { label: 'Enter', help: 'solve: limits' },
      { label: 's', help: 'sort: by score, price or tightest margin' },
    ]);
  });

  it('types printable text only, pastes whole', () => {
    expect(typedText('12 V', key())).toBe('12 V');
    expect(typedText('a\u001b[31mb\u0007', key())).toBe('ab');
    expect(typedText('u', key({ ctrl: true }))).toBe('');
  });
});

describe('bursts of keys', () => {
  it('splits text that arrived in one piece into keys, a carriage return being Enter', () => {
    const pieces = splitBurst('2d°\rx', key());
    expect(pieces.map((p) => [p.input, p.key.return])).toEqual([['2', false], ['d', false], ['°', false], ['\r', true], ['x', false]]);
  });

  it('reads control characters inside a burst as the keys that send them', () => {
    const pieces = splitBurst('\u0015a\u007f\tb', key());
    expect(pieces.map((p) => commandFor(p.input, p.key, ['clearField', 'erase', 'nextField'], true) ?? p.input)).toEqual(['clearField', 'a', 'erase', 'nextField', 'b']);
  });

  it('leaves single keys alone', () => {
    const enter = key({ return: true });
    expect(splitBurst('\r', enter)).toEqual([{ input: '\r', key: enter }]);
    expect(splitBurst('u', key({ ctrl: true }))).toEqual([{ input: 'u', key: key({ ctrl: true }) }]);
  });
});
