import type { DeratingPolicy } from '../../circuits/derating.js';
import type { SolvedPosition } from '../../circuits/role.js';
import type { Part } from '../../parts/index.js';
import { checkSubstitution, type SubstitutionCheck } from './check-substitution.js';

export interface RankedReplacement {
  readonly rank: number;
  readonly check: SubstitutionCheck;
  /** Why it sits where it does, in one line. */
  readonly basis: string;
}

const APPROVAL_ORDER: Record<string, number> = { preferred: 0, approved: 1, conditional: 2, pending: 3, banned: 4 };
const MARGIN_ORDER: Record<string, number> = { pass: 0, marginal: 1, unknown: 2, fail: 3 };

/**
 * Orders possible replacements: drop-ins first, then members of the original's second-source
 * group, then parts of the same kind; then, in a circuit, by the alternate's verdict and
 * tightest headroom; without one, by how many ratings are worse, then better. Approval, price and
 * identity break ties, so the order is always the same.
 */
export function rankReplacements(original: Part, parts: readonly Part[], circuit?: { position: SolvedPosition; policy: DeratingPolicy }): RankedReplacement[] {
  const checks = parts.map((p) => checkSubstitution(original, p, circuit));
  const count = (c: SubstitutionCheck, what: string) => c.parameters.filter((p) => p.comparison === what && p.key !== 'unitPrice').length;
  const key = (c: SubstitutionCheck): (number | string)[] => {
    const inCircuit = c.inCircuit?.alternate;
    // Parts the team declared interchangeable, then parts of the same kind, come before the rest.
    const sameGroup = Boolean(original.secondSourceGroup) && c.alternate.secondSourceGroup === original.secondSourceGroup;
    return [
      c.isDropIn ? 0 : 1,
      sameGroup ? 0 : 1,
      c.alternate.kind === original.kind ? 0 : 1,
      ...(inCircuit ? [MARGIN_ORDER[inCircuit.verdict]!, -(inCircuit.tightest?.headroom ?? -1)] : [count(c, 'worse') + count(c, 'different'), -count(c, 'better')]),
      APPROVAL_ORDER[c.alternate.approval] ?? 5,
      c.alternate.unitPrice ?? Number.POSITIVE_INFINITY,
      `${c.alternate.manufacturer}\u0000${c.alternate.partNumber}`,
    ];
  };
  const keyed = checks.map((c) => ({ c, k: key(c) }));
  keyed.sort((a, b) => {
    for (let i = 0; i < a.k.length; i++) {
      if (a.k[i] !== b.k[i]) return a.k[i]! < b.k[i]! ? -1 : 1;
    }
    return 0;
  });
  return keyed.map(({ c }, i) => ({ rank: i + 1, check: c, basis: basisOf(c, count) }));
}

function basisOf(c: SubstitutionCheck, count: (c: SubstitutionCheck, what: string) => number): string {
  const group = c.alternate.secondSourceGroup && c.alternate.secondSourceGroup === c.original.secondSourceGroup ? `, second source (${c.alternate.secondSourceGroup})` : '';
  const lead = (c.isDropIn ? 'drop-in' : 'not a drop-in') + group;
  if (c.inCircuit) {
    const t = c.inCircuit.alternate.tightest;
    return `${lead}; ${c.inCircuit.alternate.verdict} at the position${t ? `, tightest: ${t.explanation}` : ''}`;
  }
  return `${lead}; ${count(c, 'better')} better, ${count(c, 'worse')} worse, ${count(c, 'equal')} equal, ${count(c, 'unknown')} not comparable`;
}
