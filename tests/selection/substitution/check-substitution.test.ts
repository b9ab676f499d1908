import { describe, expect, it } from 'vitest';
import { readDesignText } from '../../../src/circuits/design-file.js';
import { solvePosition } from '../../../src/circuits/solve-position.js';
import { checkSubstitution, compareRatings, rankReplacements } from '../../../src/selection/substitution/index.js';
import { aPart } from '../../helpers/a-part.js';

const original = aPart('schottky', {
  ifsmA: 80,
  tjMaxK: 423.15,
  cjF: 250e-12,
  vfPoints: [{ vfV: 0.5, ifA: 3, tjK: 298.15 }],
  irPoints: [{ irA: 20e-3, vrV: 40, tjK: 398.15 }],
});

describe('comparing an alternate with the original', () => {
  it('knows the better direction of each rating', () => {
    const alternate = aPart('schottky', {
      manufacturer: 'Other Works',
      partNumber: 'OW-1',
      vrrmV: 60, // higher VRRM: better
      ifsmA: 60, // lower IFSM: worse
      tjMaxK: 423.15, // equal
      cjF: 200e-12, // lower Cj: better
      vfPoints: [{ vfV: 0.55, ifA: 3, tjK: 298.15 }], // higher VF: worse
      irPoints: [{ irA: 5e-3, vrV: 60, tjK: 398.15 }], // lower leakage: better
    });
    const rows = Object.fromEntries(compareRatings(original, alternate).map((r) => [r.label, r.comparison]));
    expect(rows).toEqual({ VRRM: 'better', 'IF(AV)': 'equal', IFSM: 'worse', VF: 'worse', IR: 'better', 'Tj max': 'equal', Cj: 'better' });
  });

  it('needs a Zener voltage to match rather than be higher', () => {
    const z = aPart('zener');
    const other = aPart('zener', { manufacturer: 'Other Works', vzV: 5.6 });
    expect(compareRatings(z, other).find((r) => r.label === 'VZ')).toMatchObject({ comparison: 'different', original: '5.10 V', alternate: '5.60 V' });
    expect(checkSubstitution(z, other).isDropIn).toBe(false);
  });

  it('is a drop-in without a circuit only when no rating is worse', () => {
    const better = aPart('schottky', { ...original, manufacturer: 'Other Works', vrrmV: 60, ifsmA: 100, cjF: 200e-12, irPoints: [{ irA: 10e-3, vrV: 40, tjK: 398.15 }] });
    const check = checkSubstitution(original, better);
    expect(check.isDropIn).toBe(true);
    expect(check.reasons).toEqual(['equal or better in every rating both datasheets give']);
  });

  it('refuses a different package, a TVS of the other polarity and a part of another family', () => {
    const sod = aPart('schottky', { ...original, manufacturer: 'Other Works', package: 'SOD-123F' });
    expect(checkSubstitution(original, sod)).toMatchObject({ isDropIn: false, fit: { isCompatible: false } });
    expect(checkSubstitution(original, sod).reasons[0]).toBe('different package: SMA against SOD-123F; the footprint must change');
    const uni = aPart('tvs');
    const bi = aPart('tvs', { manufacturer: 'Other Works', kind: 'tvs-bi' });
    expect(checkSubstitution(uni, bi).fit.notes).toContain('different polarity: TVS, unidirectional against TVS, bidirectional');
    expect(checkSubstitution(original, aPart('zener', { package: 'SMA' })).fit.isCompatible).toBe(false);
  });

  it('judges both parts in a circuit and decides by the alternate meeting the limits', () => {
    const design = readDesignText(
      'd.yaml',
      ['format: headroom-design', 'version: 1', 'name: t', 'positions:', '  - ref: D4', '    role: buck-freewheel', '    conditions:', '      vin_min: 9 V', '      vin_max: 16 V', '      vout: 5 V', '      iout: 1 A', '      frequency: 200 kHz', '      ambient_max: 50 °C'].join('\n'),
    );
    if (!design.ok) throw new Error('fixture');
    const solved = solvePosition(design.design, design.design.positions[0]!);
    if (!solved.ok || !solved.result.ok) throw new Error('fixture');
    const circuit = { position: solved.result.position, policy: solved.policy };
    const weak = aPart('schottky', { ...original, manufacturer: 'Other Works', vrrmV: 15, irPoints: [] }); // below the 16 V input
    const check = checkSubstitution(original, weak, circuit);
    expect(check.isDropIn).toBe(false);
    expect(check.inCircuit?.alternate.verdict).toBe('fail');
    expect(check.reasons[0]).toMatch(/^the alternate is fail at the position: /);
    const strong = aPart('schottky', { ...original, manufacturer: 'Other Works', rthJaKPerW: 80 });
    expect(checkSubstitution(original, strong, circuit).isDropIn).toBe(true);
  });

  it('ranks declared second sources and same-kind parts first, deterministically', () => {
    const grouped = { ...original, secondSourceGroup: 'G' };
    const a = aPart('schottky', { ...original, manufacturer: 'B Works', partNumber: 'B-1', vrrmV: 30, irPoints: [] });
    const b = aPart('schottky', { ...original, manufacturer: 'A Works', partNumber: 'A-1', vrrmV: 30, irPoints: [], secondSourceGroup: 'G' });
    const c = aPart('schottky', { ...original, manufacturer: 'C Works', partNumber: 'C-1', kind: 'ultrafast', vrrmV: 30, irPoints: [], trrS: 25e-9 });
    const ranked = rankReplacements(grouped, [c, a, b]).map((r) => r.check.alternate.partNumber);
    expect(ranked).toEqual(['A-1', 'B-1', 'C-1']);
  });
});
