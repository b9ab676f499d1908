import { describe, expect, it } from 'vitest';
import { Derivation } from '../../src/circuits/derivation.js';
import { ifAvLimit, vrrmLimit } from '../../src/circuits/roles/common-limits.js';
import type { PartInput } from '../../src/parts/index.js';
import { marginValue, rankCandidates, type Ranking } from '../../src/selection/index.js';
import { aPart } from '../helpers/a-part.js';
import { aPosition, commercial, plainLimit } from './positions.js';

// 24 V reverse and 1 A average: VRRM ≥ 30 V and IF(AV) ≥ 1.11 A under the commercial policy.
const d = new Derivation();
const position = aPosition({}, [vrrmLimit(d, 24, commercial), ifAvLimit(d, 1, commercial)], ['schottky']);
const part = (partNumber: string, extra: Partial<PartInput> = {}) => aPart('schottky', { partNumber, vrrmV: 40, ifAvA: 3, unitPrice: 0.05, currency: 'EUR', approval: 'approved', ...extra });
const order = (r: Ranking) => r.candidates.map((c) => c.evaluation.part.partNumber);

describe('rankCandidates', () => {
  it('orders equal parts by approval: preferred > approved > conditional > pending', () => {
    const r = rankCandidates([part('P', { approval: 'pending' }), part('C', { approval: 'conditional', approvalNote: 'below 100 °C only' }), part('F', { approval: 'preferred' }), part('A')], position, commercial);
    expect(order(r)).toEqual(['F', 'A', 'C', 'P']);
    expect(r.candidates.map((c) => c.scoreParts.approval.points)).toEqual([20, 12, 5, 0]);
  });

  it('leaves banned and obsolete parts out unless asked, and says why', () => {
    const parts = [part('OK'), part('BAN', { approval: 'banned', approvalNote: 'field failures' }), part('OLD', { lifecycle: 'obsolete' })];
    const r = rankCandidates(parts, position, commercial);
    expect(order(r)).toEqual(['OK']);
    expect(r.excluded.map((x) => [x.part.partNumber, x.reason])).toEqual([
      ['BAN', 'banned: field failures (--include-banned to rank it)'],
      ['OLD', 'obsolete (--include-obsolete to rank it)'],
    ]);
    const all = rankCandidates(parts, position, commercial, { includeBanned: true, includeObsolete: true });
    expect(order(all)).toEqual(['OK', 'OLD', 'BAN']);
    expect(all.candidates[1]!.scoreParts.lifecycle).toEqual({ points: -30, reason: 'obsolete' });
  });

  it('breaks ties by maker and part number, whatever the input order', () => {
    const twins = [part('TW-B'), part('TW-A'), part('TW-C')];
    expect(order(rankCandidates(twins, position, commercial))).toEqual(['TW-A', 'TW-B', 'TW-C']);
    expect(order(rankCandidates([...twins].reverse(), position, commercial))).toEqual(['TW-A', 'TW-B', 'TW-C']);
  });

  it('puts passing parts first, then marginal, then unknown, and failures in their own list', () => {
    const withCj = { ...position, limits: [...position.limits, plainLimit('cj', 'Cj', { kind: 'rating', rating: 'cjF', relation: 'at-most' }, 1e-9, 'capacitance')] };
    const parts = [
      part('FAIL', { vrrmV: 20, cjF: 1e-12 }),
      part('UNK', { approval: 'preferred' }),
      part('MARG', { vrrmV: 28, cjF: 1e-12, approval: 'preferred' }),
      part('PASS', { cjF: 1e-12, approval: 'pending' }),
    ];
    const r = rankCandidates(parts, withCj, commercial);
    expect(r.candidates.map((c) => [c.evaluation.part.partNumber, c.evaluation.verdict])).toEqual([['PASS', 'pass'], ['MARG', 'marginal'], ['UNK', 'unknown']]);
    expect(r.failed.map((c) => c.evaluation.part.partNumber)).toEqual(['FAIL']);
    expect(r.passingCount).toBe(1);
    // Unknowns count as failures when asked: UNK joins the failed list.
    expect(rankCandidates(parts, withCj, commercial, { unknownIsFailure: true }).failed.map((c) => c.evaluation.part.partNumber)).toEqual(['UNK', 'FAIL']);
  });

  it('scores the tightest margin with diminishing returns: g(h) = h/(h + 0.25)', () => {
    expect(marginValue(0.25)).toBe(0.5);
    expect(marginValue(1)).toBe(0.8);
    expect(marginValue(-0.1)).toBeCloseTo(-0.4, 12);
    const r = rankCandidates([part('TIGHT', { vrrmV: 33 }), part('ROOMY', { vrrmV: 100 })], position, commercial);
    expect(order(r)).toEqual(['ROOMY', 'TIGHT']);
    // ROOMY: VRRM headroom 1 − 30/100 = 0.7 (tightest), IF(AV) 1 − 1.111/3 = 0.63 → tightest is IF(AV).
    const roomy = r.candidates[0]!;
    const hIf = 1 - 1 / 0.9 / 3;
    expect(roomy.scoreParts.margin.points).toBeCloseTo(Math.round((60 * marginValue(hIf) + 10 * marginValue(0.7)) * 100) / 100, 9);
    expect(roomy.scoreParts.margin.reason).toBe('tightest IF(AV) 63 % headroom, the other 1 average 70 %');
  });

  it('makes every score the sum of its visible parts, each with a reason', () => {
    const r = rankCandidates([part('A', { package: 'SMB' }), part('B', { unitPrice: 0.5 }), part('C', { unitPrice: undefined, currency: undefined })], position, commercial, { packagePreference: ['SMA', 'SMB'] });
    for (const c of r.candidates) {
      const sum = Object.values(c.scoreParts).reduce((s, t) => s + t.points, 0);
      expect(c.score).toBeCloseTo(sum, 9);
      for (const t of Object.values(c.scoreParts)) expect(t.reason.length).toBeGreaterThan(0);
    }
    const byName = Object.fromEntries(r.candidates.map((c) => [c.evaluation.part.partNumber, c.scoreParts]));
    expect(byName.A!.price).toEqual({ points: 10, reason: '0.05 EUR, the cheapest of the candidates in EUR (log scale)' });
    expect(byName.B!.price).toEqual({ points: 0, reason: '0.5 EUR, the dearest of the candidates in EUR (log scale)' });
    expect(byName.C!.price).toEqual({ points: 0, reason: 'no price in the catalog' });
    expect(byName.A!.package).toEqual({ points: 2.5, reason: 'SMB, preference 2 of 2' });
    expect(byName.B!.package).toEqual({ points: 5, reason: 'SMA, preference 1 of 2' });
  });

  it('penalises parts not recommended for new designs', () => {
    const r = rankCandidates([part('NRND', { lifecycle: 'nrnd' }), part('LIVE')], position, commercial);
    expect(order(r)).toEqual(['LIVE', 'NRND']);
    expect(r.candidates[1]!.scoreParts.lifecycle).toEqual({ points: -8, reason: 'not recommended for new designs' });
  });
});
