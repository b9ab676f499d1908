import { describe, expect, it } from 'vitest';
import { displayWidth, fit, fitRight, groupDigits, truncate, wrap } from '../../src/tui/text/fit.js';
import { lineText, wrapStyled } from '../../src/tui/text/styled.js';

describe('fitting text to columns', () => {
  it('cuts with an ellipsis and pads to the exact width', () => {
    expect(truncate('TW-SK340A-VERY-LONG', 8)).toBe('TW-SK34…');
    expect(fit('SMA', 6)).toBe('SMA   ');
    expect(fitRight('72', 5)).toBe('   72');
    expect(fit('a'.repeat(200), 80)).toHaveLength(80);
  });

  it('counts wide characters as two columns', () => {
    expect(displayWidth('二極管')).toBe(6);
    expect(displayWidth(truncate('二極管二極管', 7))).toBeLessThanOrEqual(7);
  });
});

describe('wrapping', () => {
  it('keeps words whole and every line within the width', () => {
    const lines = wrap('the worst reverse voltage across the diode at high line with the surge on top', 20);
    expect(lines.every((l) => displayWidth(l) <= 20)).toBe(true);
    expect(lines.join(' ')).toBe('the worst reverse voltage across the diode at high line with the surge on top');
  });

  it('indents continuation lines and breaks words longer than a line', () => {
    expect(wrap('aaaa bbbb cccc', 9, 2)).toEqual(['aaaa bbbb', '  cccc']);
    expect(wrap('x'.repeat(12), 5)).toEqual(['xxxxx', 'xxxxx', 'xx']);
  });

  it('keeps the spaces of aligned columns and indents', () => {
    expect(wrap('  Ambient      -20 °C', 40)).toEqual(['  Ambient      -20 °C']);
  });

  it('never parts a number from its unit', () => {
    const lines = wrapStyled([{ text: 'VRRM 1.00 kV against 373 V needed' }], 12).map(lineText);
    expect(lines.some((l) => l.includes('1.00 kV'))).toBe(true);
    expect(lines.some((l) => l.endsWith('373') || l.startsWith('V '))).toBe(false);
  });

  it('keeps the tone of each piece across a break', () => {
    const lines = wrapStyled([{ text: 'pass ', tone: 'good' }, { text: 'tightest margin here', tone: 'muted' }], 10);
    expect(lines[0]![0]).toEqual({ text: 'pass', tone: 'good' });
    expect(lines.flat().filter((s) => s.tone === 'muted').map((s) => s.text.trim()).filter(Boolean)).toEqual(['tightest', 'margin', 'here']);
  });
});

describe('groupDigits', () => {
  it('groups thousands as toLocaleString("en") does', () => {
    for (const n of [0, 7, 999, 1000, 12345, 100000, 1000000, 123456789]) expect(groupDigits(n)).toBe(n.toLocaleString('en'));
  });
});
