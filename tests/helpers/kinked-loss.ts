import { compileLoss } from '../../src/selection/loss-function.js';

/** The invented VF and leakage laws of a kinked loss: offsets, and the step each breakpoint adds. */
export interface KinkedShape {
  readonly vf0V: number;
  readonly vfKinkV: number;
  readonly ir0A: number;
  readonly lnIrKink: number;
}

/**
 * A compiled loss with kinks at the breakpoints, as the datasheet estimates have: VF falls
 * (or rises) linearly with temperature, leakage grows exponentially, each breakpoint passed adds a
 * step. For property tests of the solvers that use the loss bounds; not a model of any part.
 */
export function kinkedLoss(
  shape: KinkedShape,
  vfBreaks: number[],
  irBreaks: number[],
  avgA: number,
  ripple: number,
  tempcoVPerK: number,
  lnSlope: number,
  switchingW: number,
) {
  const kinks = (t: number, at: number[]) => at.filter((b) => b < t).length;
  return compileLoss({
    conduction: {
      avgA, conductingA: avgA, peakA: avgA * (1 + ripple), rmsA: avgA * (1 + ripple / 3),
      vfAt: (ifA, t) => shape.vf0V + 0.05 * Math.log(ifA) + tempcoVPerK * (t - 300) + shape.vfKinkV * kinks(t, vfBreaks), breakpoints: vfBreaks,
    },
    reverse: { vrV: 40, duty: 0.6, lnIrAt: (t) => Math.log(shape.ir0A) + lnSlope * (t - 300) - shape.lnIrKink * kinks(t, irBreaks), breakpoints: irBreaks },
    switchingW,
  });
}
