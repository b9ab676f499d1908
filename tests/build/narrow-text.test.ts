import fc from 'fast-check';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import stringWidth from 'string-width';
import { describe, expect, it } from 'vitest';
import { isNarrowText, narrowGraphemes } from '../../src/build/narrow-text.js';
import { packageRoot } from '../../src/catalog/index.js';

// The bundle answers Ink's width questions with text.length wherever isNarrowText holds, and asks
// string-width otherwise. That shortcut is only sound if string-width itself (both copies Ink
// uses: string-width 8 directly, string-width 7 through wrap-ansi) says width 1 for every such
// character. These tests ask them.
const nestedStringWidth = (await import(pathToFileURL(join(packageRoot(), 'node_modules', 'wrap-ansi', 'node_modules', 'string-width', 'index.js')).href)).default as (s: string) => number;

const narrowCharacters: string[] = [];
for (let c = 0x20; c <= 0x2fff; c++) {
  const s = String.fromCharCode(c);
  if (isNarrowText(s)) narrowCharacters.push(s);
}

describe('isNarrowText', () => {
  it('accepts only characters both string-width copies count as one column', () => {
    expect(narrowCharacters.length).toBeGreaterThan(900);
    const disagreeing = narrowCharacters.filter((s) => stringWidth(s) !== 1 || nestedStringWidth(s) !== 1);
    expect(disagreeing.map((s) => `U+${s.charCodeAt(0).toString(16)}`)).toEqual([]);
  });

  it('gives the same width as string-width for any text made of them', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...narrowCharacters), { maxLength: 60 }), (chars) => {
        const text = chars.join('');
        expect(isNarrowText(text)).toBe(true);
        expect(stringWidth(text)).toBe(text.length);
        expect(nestedStringWidth(text)).toBe(text.length);
      }),
      { numRuns: 300 },
    );
  });

  it('sends escape codes, controls, combining marks, emoji and wide characters to string-width', () => {
    for (const text of ['\u001b[1mbold\u001b[22m', 'tab\there', 'e\u0301', '⚠', '✅', '漢字', 'soft\u00adhyphen', 'a\u200bb']) {
      expect(isNarrowText(text), JSON.stringify(text)).toBe(false);
    }
  });
});

describe('narrowGraphemes', () => {
  const segmenter = new Intl.Segmenter(undefined, { granularity: 'grapheme' });
  const styled = fc.array(fc.oneof(fc.constantFrom(...narrowCharacters), fc.constantFrom('\u001b[1m', '\u001b[22m', '\u001b[90m', '\u001b[39m', '\u001b[7m', '\u001b]8;;x\u0007')), { maxLength: 40 });

  it('splits styled narrow text exactly as Intl.Segmenter does, one code unit a grapheme', () => {
    fc.assert(
      fc.property(styled, (parts) => {
        const text = parts.join('').replace(/\u0007/g, '');
        const ours = narrowGraphemes(text);
        expect(ours).toBeDefined();
        expect(ours).toEqual([...segmenter.segment(text)].map(({ segment, index }) => ({ segment, index })));
      }),
      { numRuns: 300 },
    );
  });

  it('leaves everything else to the segmenter', () => {
    for (const text of ['e\u0301', '👍🏽', '漢字', 'a\r\nb', '\u0007']) expect(narrowGraphemes(text)).toBeUndefined();
  });
});
