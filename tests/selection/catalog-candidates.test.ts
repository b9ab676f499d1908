import { afterEach, describe, expect, it } from 'vitest';
import { findCandidates } from '../../src/catalog/candidates.js';
import { openCatalog, writeParts, type Catalog } from '../../src/catalog/index.js';
import type { Part } from '../../src/parts/index.js';
import { rankCandidates } from '../../src/selection/index.js';
import { aPart } from '../helpers/a-part.js';
import { C, commercial, solveRole } from './positions.js';

// A buck catch diode: VRRM ≥ 38.4 V raw (48 V derated), IF(AV) ≥ 1.01 A raw, Tj solved at 70 °C.
const buck = solveRole('buck-freewheel', { vin_min: '18 V', vin_max: '32 V', vout: '5 V', iout: '1.2 A', frequency: '400 kHz', inductance: '22 µH', ambient_max: '70 °C' });

/** 60 Schottkys spread over ratings, approvals, prices and packages; the same every run. */
function fixture(): Part[] {
  const approvals = ['preferred', 'approved', 'approved', 'conditional', 'pending', 'banned'] as const;
  return Array.from({ length: 60 }, (_, i) => {
    const vrrmV = [30, 40, 45, 60, 100][i % 5]!;
    return aPart('schottky', {
    partNumber: `TW-SK${String(i).padStart(2, '0')}`,
    vrrmV,
    ifAvA: [1, 2, 3][i % 3]!,
    approval: approvals[i % 6]!,
    ...(approvals[i % 6] === 'conditional' ? { approvalNote: 'test' } : {}),
    lifecycle: i % 11 === 0 ? 'obsolete' : i % 7 === 0 ? 'nrnd' : 'active',
    unitPrice: 0.02 + (i % 9) * 0.01,
    currency: 'EUR',
    package: ['SMA', 'SMB', 'SOD-123F'][i % 3]!,
    rthJaKPerW: 60 + (i % 4) * 40,
    tjMaxK: C(150),
    vfPoints: [{ vfV: 0.45 + (i % 5) * 0.02, ifA: 1, tjK: C(25) }, { vfV: 0.4 + (i % 5) * 0.02, ifA: 1, tjK: C(125) }],
    irPoints: [{ irA: 20e-6 * (1 + (i % 3)), vrV: vrrmV, tjK: C(25) }, { irA: 5e-3 * (1 + (i % 3)), vrV: vrrmV, tjK: C(125) }],
    cjF: 100e-12,
  });
  });
}

const open: Catalog[] = [];
afterEach(() => open.splice(0).forEach((c) => c.close()));

function catalogWith(parts: readonly Part[]): Catalog {
  const catalog = openCatalog(':memory:');
  open.push(catalog);
  writeParts(catalog, parts, { by: 'test', reason: 'fixture', at: '2026-01-01T00:00:00.000Z' });
  return catalog;
}

const names = (list: readonly { evaluation: { part: Part } }[]) => list.map((c) => c.evaluation.part.partNumber);

describe('findCandidates', () => {
  it('when complete, shows exactly the best passing parts of a full ranking of the catalog', () => {
    const parts = fixture();
    const search = findCandidates(catalogWith(parts), buck, commercial, { wanted: 5 });
    expect(search.isComplete).toBe(true);
    const full = rankCandidates(parts, buck, commercial, { priceScale: search.priceScale });
    const best = full.candidates.filter((c) => c.evaluation.verdict === 'pass').slice(0, 5);
    expect(names(search.ranking.candidates.filter((c) => c.evaluation.verdict === 'pass'))).toEqual(names(best));
    expect(search.ranking.candidates.map((c) => c.score).slice(0, best.length)).toEqual(best.map((c) => c.score));
    // Shown parts carry their explanations; the search itself evaluated fewer parts than the catalog holds.
    expect(search.ranking.candidates[0]!.evaluation.tightest?.explanation).toMatch(/headroom/);
    expect(search.evaluated).toBeLessThan(parts.length);
  });

  it('keeps only suitable kinds that meet the raw rating stress, and leaves banned and obsolete parts out unless asked', () => {
    const parts = fixture();
    const catalog = catalogWith(parts);
    const search = findCandidates(catalog, buck, commercial, { wanted: 60, maxEvaluated: 1000 });
    const seen = [...search.ranking.candidates, ...search.ranking.failed].map((c) => c.evaluation.part);
    expect(seen.every((p) => p.vrrmV! >= 38.4 && p.ifAvA! >= 1.0125 && p.approval !== 'banned' && p.lifecycle !== 'obsolete')).toBe(true);
    expect(search.prefilter).toEqual(['kind one of schottky, ultrafast', 'not banned', 'not obsolete', 'VRRM ≥ 38.4 V (raw stress)', 'IF(AV) ≥ 1.01 A (raw stress)']);
    const everything = findCandidates(catalog, buck, commercial, { wanted: 60, maxEvaluated: 1000, includeBanned: true, includeObsolete: true });
    expect(everything.evaluated).toBeGreaterThan(search.evaluated);
  });

  it('stops at maxEvaluated and says the top is not proven', () => {
    const search = findCandidates(catalogWith(fixture()), buck, commercial, { wanted: 5, maxEvaluated: 5 });
    expect(search.evaluated).toBe(5);
    expect(search.isComplete).toBe(false);
  });

  it('places a pinned part in the ranking, or says why it is left out', () => {
    const parts = fixture();
    const catalog = catalogWith(parts);
    const banned = parts.find((p) => p.approval === 'banned')!;
    const tooLow = parts.find((p) => p.vrrmV === 30 && p.approval !== 'banned' && p.lifecycle !== 'obsolete')!;
    const search = findCandidates(catalog, buck, commercial, { wanted: 3, pinned: [banned, tooLow] });
    expect(search.pinned[0]).toMatchObject({ list: 'excluded', rank: null });
    expect(search.pinned[0]!.reason).toMatch(/^banned/);
    expect(search.pinned[1]).toMatchObject({ list: 'failed' });
    expect(search.pinned[1]!.candidate!.evaluation.summary).toMatch(/^fails VRRM/);
  });
});
