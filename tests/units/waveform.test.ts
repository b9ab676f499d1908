import { describe, expect, it } from 'vitest';
import { formatWaveform, parseWaveform } from '../../src/units/index.js';

const EXPECTED = 'a surge waveform such as "8/20 \u00b5s", "10/1000 \u00b5s" or "1.2/50 \u00b5s"';

describe('parseWaveform', () => {
  it.each([
    ['8/20 \u00b5s', 8e-6, 20e-6],
    ['8/20\u00b5s', 8e-6, 20e-6],
    ['8 / 20 \u00b5s', 8e-6, 20e-6],
    ['8/20 \u03bcs', 8e-6, 20e-6],
    ['8/20 us', 8e-6, 20e-6],
    ['10/1000us', 10e-6, 1000e-6],
    ['1.2/50 \u00b5s', 1.2e-6, 50e-6],
    ['0.5/700 \u00b5s', 0.5e-6, 700e-6],
    ['10/700 ms', 10e-3, 700e-3],
    ['5/50 ns', 5e-9, 50e-9],
  ])('%s → rise %d s, decay %d s', (text, riseS, decayS) => {
    expect(parseWaveform(text)).toEqual({ ok: true, value: { riseS, decayS } });
  });

  it('reads a bare "8/20" in µs and says so', () => {
    expect(parseWaveform('8/20')).toEqual({
      ok: true,
      value: { riseS: 8e-6, decayS: 20e-6 },
      note: 'no unit given; read as 8/20 \u00b5s',
    });
  });

  it.each([
    ['', 'empty', 'expected a surge waveform, got nothing'],
    ['8-20 \u00b5s', 'not-a-number', 'expected a surge waveform, got "8-20 \u00b5s": write it as rise/decay time, e.g. "8/20 \u00b5s"'],
    ['8/ \u00b5s', 'not-a-number', 'expected a surge waveform, got "8/ \u00b5s": write it as rise/decay time, e.g. "8/20 \u00b5s"'],
    ['-8/20 \u00b5s', 'not-a-number', 'expected a surge waveform, got "-8/20 \u00b5s": write it as rise/decay time, e.g. "8/20 \u00b5s"'],
    ['8/20.5.1 \u00b5s', 'not-a-number', 'expected a surge waveform, got "8/20.5.1 \u00b5s": write it as rise/decay time, e.g. "8/20 \u00b5s"'],
    ['1,2/50 \u00b5s', 'not-a-number', 'expected a surge waveform, got "1,2/50 \u00b5s": use a dot as the decimal point, e.g. "1.2/50 \u00b5s"'],
    ['8/20 V', 'wrong-quantity', 'expected a surge waveform, got "8/20 V" (a voltage)'],
    ['8/20 xs', 'unknown-unit', 'expected a surge waveform, got "8/20 xs": unknown unit "xs"'],
    ['1e999/20 \u00b5s', 'not-finite', 'expected a surge waveform, got "1e999/20 \u00b5s", which is not a finite number'],
  ])('%j fails with %s', (text, code, message) => {
    expect(parseWaveform(text)).toEqual({ ok: false, issue: { code, message, expected: EXPECTED } });
  });
});

describe('formatWaveform', () => {
  it.each([
    [8e-6, 20e-6, '8/20 \u00b5s'],
    [10e-6, 1000e-6, '10/1000 \u00b5s'],
    [1.2e-6, 50e-6, '1.2/50 \u00b5s'],
    [0.5e-6, 700e-6, '0.5/700 \u00b5s'],
    [5e-9, 50e-9, '5/50 ns'],
    [1e-3, 10, '1/10000 ms'],
    [1.2345e-6, 50e-6, '1.23/50 \u00b5s'],
  ])('rise %d s, decay %d s → %s', (riseS, decayS, text) => {
    expect(formatWaveform({ riseS, decayS })).toBe(text);
  });

  it.each(['8/20 \u00b5s', '10/1000 \u00b5s', '1.2/50 \u00b5s'])('%s survives a round trip', (text) => {
    const parsed = parseWaveform(text);
    expect(parsed.ok && formatWaveform(parsed.value)).toBe(text);
  });
});

describe('waveforms that describe no surge', () => {
  it.each(['0/20 µs', '8/0 µs', '20/8 µs', '8/8 µs'])('refuses %s', (text) => {
    const r = parseWaveform(text);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issue.message).toContain('both times must be above zero and the decay longer than the rise');
  });
});
