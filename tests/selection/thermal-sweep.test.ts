import { describe, expect, it } from 'vitest';
import { thermalSweep } from '../../src/selection/index.js';
import { aPart } from '../helpers/a-part.js';
import { C, aPosition, commercial, tjLimit } from './positions.js';

describe('thermalSweep', () => {
  it('a constant loss gives Tj = Ta + RθJA·P at every ambient: a straight line 25 K above it (diode-formulas §9)', () => {
    const part = aPart('schottky', {
      kind: 'rectifier', rthJaKPerW: 50, tjMaxK: C(150), irPoints: [],
      vfPoints: [{ vfV: 0.5, ifA: 1, tjK: C(25) }, { vfV: 0.5, ifA: 1, tjK: C(125) }],
    });
    const dc = aPosition({ forwardAvgA: 1, forwardRmsA: 1, forwardDuty: 1, reverseDuty: 0 }, [tjLimit()]);
    const sweep = thermalSweep(part, dc, commercial, C(0), C(100), 4);
    if (!sweep.ok) throw new Error(sweep.reason);
    expect(sweep.points.map((p) => p.ambientK)).toEqual([C(0), C(25), C(50), C(75), C(100)]);
    for (const p of sweep.points) expect(p.tjK).toBeCloseTo(p.ambientK + 25, 9);
    expect(sweep.points.every((p) => p.losses?.totalW === 0.5 && p.leakageA === null && !p.isRunaway)).toBe(true);
    expect(sweep.ceilingK).toBeCloseTo(C(125), 9);
  });

  it('marks the ambients where a leaky Schottky runs away, with IR rising until then', () => {
    const leaky = aPart('schottky', {
      rthJaKPerW: 100, tjMaxK: C(150),
      irPoints: [{ irA: 1e-3, vrV: 40, tjK: C(25) }, { irA: 0.1, vrV: 40, tjK: C(125) }],
    });
    const blocking = aPosition({ reversePeakV: 40, reverseWorkingV: 40, reverseDuty: 1 }, [tjLimit()]);
    const sweep = thermalSweep(leaky, blocking, commercial, C(0), C(100), 10);
    if (!sweep.ok) throw new Error(sweep.reason);
    const runaway = sweep.points.filter((p) => p.isRunaway);
    expect(runaway.length).toBeGreaterThan(0);
    expect(runaway.every((p) => p.tjK === null && p.leakageA === null)).toBe(true);
    expect(sweep.points[sweep.points.length - 1]!.isRunaway).toBe(true);
    const stable = sweep.points.filter((p) => !p.isRunaway);
    for (let i = 1; i < stable.length; i++) expect(stable[i]!.leakageA!).toBeGreaterThan(stable[i - 1]!.leakageA!);
  });

  it('says why it cannot sweep a part without RθJA', () => {
    const sweep = thermalSweep(aPart('schottky'), aPosition({ forwardAvgA: 1 }, [tjLimit()]), commercial, C(0), C(100), 4);
    expect(sweep).toEqual({ ok: false, reason: 'no RθJA: neither the position (rth_ja) nor the catalog gives one' });
  });
});
