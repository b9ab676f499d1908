import { decimalValue, scanNumber, separatorAdvice } from './number-text.js';
import { readUnit } from './parse-quantity.js';
import { emptyIssue, notANumberIssue, notFiniteIssue, type Subject, type UnitIssue } from './unit-issue.js';
import { normaliseText } from './unit-lookup.js';

/** A surge test waveform, rise (front) time / decay time to half value, in seconds. */
export interface Waveform {
  riseS: number;
  decayS: number;
}

export type WaveformResult = { ok: true; value: Waveform; note?: string } | { ok: false; issue: UnitIssue };

const SUBJECT: Subject = {
  noun: 'a surge waveform',
  expected: 'a surge waveform such as "8/20 µs", "10/1000 µs" or "1.2/50 µs"',
};

// Surge standards (IEC 61000-4-5, ITU-T K.44) write every waveform in µs.
const DEFAULT_UNIT = 'µs';

const SHAPE_ADVICE = 'write it as rise/decay time, e.g. "8/20 µs"';

/** Reads "8/20 µs", "10/1000us", "1.2/50 µs"; a bare "8/20" is read in µs with a note. */
export function parseWaveform(text: string): WaveformResult {
  const input = typeof text === 'string' ? text : '';
  const source = normaliseText(input).trim();
  if (source === '') return { ok: false, issue: emptyIssue(SUBJECT) };
  if (/\d,\d/.test(source)) return { ok: false, issue: notANumberIssue(SUBJECT, input, separatorAdvice(source)) };

  const rise = /^[+-]/.test(source) ? undefined : scanNumber(source);
  const slash = rise && /^\s*\/\s*/.exec(rise.rest);
  const afterSlash = rise && slash ? rise.rest.slice(slash[0].length) : '';
  const decay = slash && !/^[+-]/.test(afterSlash) ? scanNumber(afterSlash) : undefined;
  if (!rise || !decay || /^[.\d]/.test(decay.rest)) {
    return { ok: false, issue: notANumberIssue(SUBJECT, input, SHAPE_ADVICE) };
  }

  const reading = readUnit('time', SUBJECT, input, decay.rest, DEFAULT_UNIT);
  if (!reading.ok) return reading;
  const riseS = decimalValue(rise.number, reading.unit.exponent);
  const decayS = decimalValue(decay.number, reading.unit.exponent);
  if (!Number.isFinite(riseS) || !Number.isFinite(decayS)) {
    return { ok: false, issue: notFiniteIssue(SUBJECT, input) };
  }
  // A zero width, or a decay shorter than the front, describes no surge: scaling by it would divide by zero.
  if (!(riseS > 0) || !(decayS > riseS)) {
    return { ok: false, issue: notANumberIssue(SUBJECT, input, 'both times must be above zero and the decay longer than the rise, e.g. "8/20 µs"') };
  }
  const value = { riseS, decayS };
  if (reading.unit.unitWritten) return { ok: true, value };
  return { ok: true, value, note: `no unit given; read as ${formatWaveform(value)}` };
}

const WAVEFORM_UNITS = [
  { exponent: -6, symbol: 'µs' },
  { exponent: -3, symbol: 'ms' },
  { exponent: -9, symbol: 'ns' },
  { exponent: 0, symbol: 's' },
] as const;

function shortNumber(value: number): string {
  return String(Number(value.toPrecision(3)));
}

/** "8/20 µs": both times in one unit, µs unless the numbers would be unreadable in it. */
export function formatWaveform(w: Waveform): string {
  const unit =
    WAVEFORM_UNITS.find(({ exponent }) => {
      const scale = 10 ** exponent;
      return w.riseS / scale >= 0.1 && w.decayS / scale < 1e5;
    }) ?? WAVEFORM_UNITS[0];
  const scale = 10 ** -unit.exponent;
  return `${shortNumber(w.riseS * scale)}/${shortNumber(w.decayS * scale)} ${unit.symbol}`;
}
