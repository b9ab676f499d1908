import { describe, expect, it } from 'vitest';
import { estimateForwardVoltage, type ForwardVoltagePoint } from '../../src/physics/index.js';
import { expectRelClose } from './expect-close.js';

const T25 = 298.15;
const T75 = 348.15;
const T100 = 373.15;
const T125 = 398.15;

/** A 1 A rectifier shaped like a typical 1 A glass-passivated rectifier datasheet: two points at 25 °C and one hot point (values for the test). */
const rectifier: readonly ForwardVoltagePoint[] = [
  { vfV: 0.8, ifA: 0.1, tjK: T25 },
  { vfV: 0.93, ifA: 1, tjK: T25 },
  { vfV: 0.78, ifA: 1, tjK: T125 },
];

/** VT at 125 °C from the exact SI constants, for the single-point log law below. */
const VT_125 = (1.380649e-23 * T125) / 1.602176634e-19;

describe('estimateForwardVoltage', () => {
  it.each([
    { name: 'a datasheet point as is', ifA: 1, tjK: T25, vfV: 0.93, referenceTjK: T25, tempcoVPerK: null, isExtrapolated: false },
    // √(0.1·1) is halfway in log(I): 0.80 + 0.13/2
    { name: 'log-law midpoint between two points', ifA: Math.sqrt(0.1), tjK: T25, vfV: 0.865, referenceTjK: T25, tempcoVPerK: null, isExtrapolated: false },
    // one decade above 1 A: +130 mV
    { name: 'log-law extrapolation one decade up', ifA: 10, tjK: T25, vfV: 1.06, referenceTjK: T25, tempcoVPerK: null, isExtrapolated: true },
    // points' own tempco (0.78 − 0.93)/100 K = −1.5 mV/K; 50 K above 25 °C (tie on distance: the 25 °C group has more points)
    { name: "the points' own tempco at 75 °C", ifA: 1, tjK: T75, vfV: 0.93 - 0.0015 * 50, referenceTjK: T25, tempcoVPerK: -0.0015, isExtrapolated: false },
    { name: 'the hot datasheet point', ifA: 1, tjK: T125, vfV: 0.78, referenceTjK: T125, tempcoVPerK: null, isExtrapolated: false },
    // single hot point: default n = 2, 2·VT·ln(0.1)
    { name: 'one hot point with the default n = 2', ifA: 0.1, tjK: T125, vfV: 0.78 + 2 * VT_125 * Math.log(0.1), referenceTjK: T125, tempcoVPerK: null, isExtrapolated: true },
    // 0.1 A at 25 °C is 0.80 V, tempco from the 1 A pair
    { name: '0.1 A at 75 °C', ifA: 0.1, tjK: T75, vfV: 0.8 - 0.0015 * 50, referenceTjK: T25, tempcoVPerK: -0.0015, isExtrapolated: false },
  ])('$name', ({ ifA, tjK, vfV, referenceTjK, tempcoVPerK, isExtrapolated }) => {
    const estimate = estimateForwardVoltage(rectifier, ifA, tjK);
    expect(estimate.ok).toBe(true);
    if (!estimate.ok) return;
    expectRelClose(estimate.value, vfV, 1e-12);
    expect(estimate).toMatchObject({ referenceTjK, isExtrapolated });
    if (tempcoVPerK === null) expect(estimate.tempcoVPerK).toBeNull();
    else expectRelClose(estimate.tempcoVPerK ?? Number.NaN, tempcoVPerK, 1e-9);
  });

  it('says how it estimated', () => {
    const atPoint = estimateForwardVoltage(rectifier, 1, T25);
    const hot = estimateForwardVoltage(rectifier, 2, T75);
    expect(atPoint.ok && atPoint.method).toContain('datasheet point 930 mV at 1 A, 25 °C');
    expect(hot.ok && hot.method).toContain('130 mV/decade');
    expect(hot.ok && hot.method).toContain("points' own tempco -1.5 mV/K");
    expect(hot.ok && hot.method).toContain('ignores series resistance');
  });

  it('falls back to −2 mV/K with a single temperature (Sedra & Smith, diode temperature dependence [published])', () => {
    const estimate = estimateForwardVoltage([{ vfV: 0.55, ifA: 1, tjK: T25 }], 1, T100);
    expect(estimate).toMatchObject({ ok: true, tempcoVPerK: -0.002, isExtrapolated: true });
    if (!estimate.ok) return;
    expectRelClose(estimate.value, 0.55 - 0.002 * 75, 1e-12);
    expect(estimate.method).toContain('default tempco -2 mV/K (Sedra & Smith');
  });

  it('honours the default ideality and tempco options', () => {
    const estimate = estimateForwardVoltage([{ vfV: 0.4, ifA: 0.1, tjK: 300 }], 1, 310, {
      defaultIdeality: 1,
      defaultTempcoVPerK: -0.001,
    });
    expect(estimate.ok).toBe(true);
    if (!estimate.ok) return;
    // n = 1 at 300 K: 59.5 mV per decade (Sedra & Smith), then −1 mV/K × 10 K
    expectRelClose(estimate.value, 0.4 + 0.025852 * Math.LN10 - 0.01, 1e-5);
  });

  it('takes the tempco from the same-current pair nearest the requested current', () => {
    const points: ForwardVoltagePoint[] = [
      { vfV: 0.7, ifA: 0.1, tjK: T25 },
      { vfV: 0.9, ifA: 1, tjK: T25 },
      { vfV: 0.5, ifA: 0.1, tjK: T125 },
      { vfV: 0.8, ifA: 1, tjK: T125 },
    ];
    const estimate = estimateForwardVoltage(points, 0.5, T25 + 40);
    expect(estimate.ok).toBe(true);
    if (!estimate.ok) return;
    expectRelClose(estimate.tempcoVPerK ?? Number.NaN, -0.001, 1e-9);
    expectRelClose(estimate.value, 0.7 + 0.2 * Math.log(5) / Math.LN10 - 0.001 * 40, 1e-12);
  });

  it.each([
    { name: 'no points', points: [], code: 'no-points' },
    {
      name: 'VF falling with current',
      points: [
        { vfV: 0.9, ifA: 0.1, tjK: T25 },
        { vfV: 0.8, ifA: 1, tjK: T25 },
      ],
      code: 'inconsistent-points',
    },
  ])('reports $name as a value', ({ points, code }) => {
    expect(estimateForwardVoltage(points, 0.5, T25)).toMatchObject({ ok: false, code });
  });

  it('throws on a non-positive current (programmer error)', () => {
    expect(() => estimateForwardVoltage(rectifier, 0, T25)).toThrow(RangeError);
  });
});
