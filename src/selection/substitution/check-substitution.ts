import type { DeratingPolicy } from '../../circuits/derating.js';
import type { SolvedPosition } from '../../circuits/role.js';
import type { Part } from '../../parts/index.js';
import { evaluatePart } from '../evaluate-part.js';
import type { PartEvaluation } from '../evaluation.js';
import { compareRatings, type ParameterComparison } from './compare-ratings.js';
import { checkFit, type FitCheck } from './package-fit.js';

export interface InCircuit {
  readonly original: PartEvaluation;
  readonly alternate: PartEvaluation;
}

export interface SubstitutionCheck {
  readonly original: Part;
  readonly alternate: Part;
  readonly fit: FitCheck;
  readonly parameters: readonly ParameterComparison[];
  /** Present when a design position was given: both parts judged against its limits. */
  readonly inCircuit?: InCircuit;
  /** Safe to place without redoing the design. */
  readonly isDropIn: boolean;
  /** Why, or why not, in one line each. */
  readonly reasons: readonly string[];
}

// Price is a buying matter, not a reason a part cannot replace another.
const NOT_TECHNICAL = new Set(['unitPrice']);

/**
 * Compares an alternate part with the original, rating by rating, and — given a design position —
 * judges both against its limits. Without a position, a drop-in must be worse in no rating;
 * with one, it must fit the package and pass the position's limits.
 */
export function checkSubstitution(original: Part, alternate: Part, circuit?: { position: SolvedPosition; policy: DeratingPolicy }): SubstitutionCheck {
  const fit = checkFit(original, alternate);
  const parameters = compareRatings(original, alternate);
  const reasons: string[] = [];
  if (!fit.isCompatible) reasons.push(...fit.notes.filter((n) => n.startsWith('different') || n.startsWith('a ')));
  if (alternate.approval === 'banned') reasons.push(`the alternate is banned${alternate.approvalNote ? `: ${alternate.approvalNote}` : ''}`);
  let isDropIn = fit.isCompatible && alternate.approval !== 'banned';
  let inCircuit: InCircuit | undefined;
  if (circuit) {
    inCircuit = {
      original: evaluatePart(original, circuit.position, circuit.policy),
      alternate: evaluatePart(alternate, circuit.position, circuit.policy),
    };
    const v = inCircuit.alternate.verdict;
    if (v === 'pass') reasons.push('the alternate meets every limit of the position');
    else {
      isDropIn = false;
      reasons.push(`the alternate is ${v} at the position: ${inCircuit.alternate.summary}`);
    }
  } else {
    const worse = parameters.filter((p) => p.comparison === 'worse' && !NOT_TECHNICAL.has(p.key));
    const unknown = parameters.filter((p) => p.comparison === 'unknown' && !NOT_TECHNICAL.has(p.key));
    const different = parameters.filter((p) => p.comparison === 'different');
    if (worse.length > 0) reasons.push(`worse in ${worse.map((p) => p.label).join(', ')}: without a design position that is not a safe drop-in (give --design and --ref)`);
    if (different.length > 0) reasons.push(`${different.map((p) => p.label).join(', ')} must match and do${different.length === 1 ? 'es' : ''} not`);
    if (unknown.length > 0) reasons.push(`not comparable for lack of data: ${unknown.map((p) => p.label).join(', ')}`);
    if (worse.length > 0 || different.length > 0 || unknown.length > 0) isDropIn = false;
    else if (isDropIn) reasons.push('equal or better in every rating both datasheets give');
  }
  return { original, alternate, fit, parameters, ...(inCircuit ? { inCircuit } : {}), isDropIn, reasons };
}
