import { describe, expect, it } from 'vitest';
import { listTeamPolicies, openCatalog, saveTeamPolicy } from '../../src/catalog/index.js';
import { BUILT_IN_POLICIES, findPolicy, tjCeilingK } from '../../src/circuits/derating.js';

const ours = {
  id: 'our-automotive',
  name: 'Our automotive rules',
  factors: {
    vrrm: { value: 0.75, source: 'our design rule DR-12' },
    ifAv: { value: 0.8, source: 'our design rule DR-12' },
    ifsm: { value: 0.6, source: 'common practice' },
    pd: { value: 0.6, source: 'common practice' },
    pppm: { value: 0.6, source: 'common practice' },
  },
  tj: { ceilingK: 398.15, marginBelowMaxK: 30, source: 'our design rule DR-12' },
};

describe('derating policies', () => {
  it('has three built-in policies, each factor with a source', () => {
    expect(BUILT_IN_POLICIES.map((p) => p.id)).toEqual(['commercial', 'industrial', 'high-reliability']);
    for (const p of BUILT_IN_POLICIES) {
      for (const f of Object.values(p.factors)) {
        expect(f.value).toBeGreaterThan(0);
        expect(f.value).toBeLessThanOrEqual(1);
        expect(f.source.length).toBeGreaterThan(5);
      }
    }
  });

  it('caps Tj at the lower of the ceiling and Tj max less the margin', () => {
    // NASA EEE-INST-002 (from memory): Tj ≤ 125 °C or Tj max − 40 °C, whichever is lower.
    const hirel = findPolicy('high-reliability')!;
    expect(tjCeilingK(hirel, 423.15)).toBeCloseTo(383.15, 9); // 150 °C part → 110 °C
    expect(tjCeilingK(hirel, 473.15)).toBeCloseTo(398.15, 9); // 200 °C part → 125 °C
    expect(tjCeilingK(findPolicy('commercial')!, 423.15)).toBeCloseTo(398.15, 9);
  });

  it('stores a team policy, replaces it by id, and refuses bad ones and built-in ids', () => {
    const catalog = openCatalog(':memory:');
    expect(saveTeamPolicy(catalog, ours, 'ce')).toMatchObject({ ok: true, isNew: true });
    expect(saveTeamPolicy(catalog, { ...ours, name: 'Renamed' }, 'ce')).toMatchObject({ ok: true, isNew: false });
    expect(listTeamPolicies(catalog).map((p) => p.name)).toEqual(['Renamed']);
    expect(saveTeamPolicy(catalog, { ...ours, id: 'commercial' }, 'ce')).toEqual({ ok: false, issues: ['id: "commercial" is a built-in policy; choose another id'] });
    const bad = saveTeamPolicy(catalog, { ...ours, factors: { ...ours.factors, vrrm: { value: 1.5, source: 'x' } } }, 'ce');
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.issues[0]).toMatch(/^factors\.vrrm\.value:/);
    expect(findPolicy('our-automotive', listTeamPolicies(catalog))?.factors.vrrm.value).toBe(0.75);
    catalog.close();
  });
});
