import type { Caution } from '../circuits/caution.js';
import type { DeratingPolicy } from '../circuits/derating.js';
import type { Design } from '../circuits/design-file.js';
import { solvePosition } from '../circuits/solve-position.js';
import type { Part } from '../parts/index.js';
import { evaluatePart, type LimitEvaluation, type PartEvaluation } from '../selection/index.js';
import type { BomLine } from './bom.js';
import { CatalogError } from './catalog-error.js';
import { findCandidates } from './candidates.js';
import type { Catalog } from './open-catalog.js';
import { findPart } from './part-repository.js';

/** The outcome at one position; 'fail' and 'error' fail the audit, 'warn' and 'unchecked' do not. */
export type AuditStatus = 'pass' | 'warn' | 'fail' | 'unchecked';

export interface PositionAudit {
  readonly ref: string;
  readonly role: string | null;
  readonly status: AuditStatus;
  /** Where the assigned part came from. */
  readonly partSource: 'design' | 'bom' | 'none';
  readonly partReference: string | null;
  readonly part: Part | null;
  /** Every reason the position is not a plain pass, one line each. */
  readonly findings: readonly string[];
  readonly evaluation: PartEvaluation | null;
  /** The limits with the least headroom, tightest first. */
  readonly tightest: readonly LimitEvaluation[];
  readonly cautions: readonly Caution[];
  /** For a failing position: the best-ranked approved part that passes, if the catalog has one. */
  readonly suggestion: { readonly part: Part; readonly summary: string } | null;
}

export interface AuditResult {
  readonly design: string;
  readonly name: string;
  readonly positions: readonly PositionAudit[];
  readonly counts: Readonly<Record<AuditStatus, number>>;
  readonly isPassing: boolean;
}

export interface AuditOptions {
  readonly bom?: readonly BomLine[];
  readonly teamPolicies?: readonly DeratingPolicy[];
  /** Count limits the datasheet leaves unknown as failures. @default true: a gate must not pass what it cannot see */
  readonly unknownIsFailure?: boolean;
  /** Look for an approved alternative for failing positions. @default true */
  readonly suggest?: boolean;
}

const APPROVED_FOR_USE = new Set(['preferred', 'approved', 'conditional']);

function lookUp(catalog: Catalog, reference: string): { part: Part | null; problem?: string } {
  try {
    return { part: findPart(catalog, reference) };
  } catch (error) {
    if (error instanceof CatalogError) return { part: null, problem: error.message };
    throw error;
  }
}

/** Checks every position of a design: the part exists, is approved for use and meets every limit. */
export function auditDesign(catalog: Catalog, design: Design, options: AuditOptions = {}): AuditResult {
  const unknownIsFailure = options.unknownIsFailure ?? true;
  const bomByRef = new Map<string, BomLine>();
  for (const line of options.bom ?? []) for (const ref of line.refs) bomByRef.set(ref.toUpperCase(), line);
  const positions: PositionAudit[] = [];
  // Boards repeat positions (every relay gets the same freewheel): search once per distinct position.
  const suggestions = new Map<string, PositionAudit['suggestion']>();
  for (const position of design.positions) {
    const findings: string[] = [];
    const bom = bomByRef.get(position.ref.toUpperCase());
    bomByRef.delete(position.ref.toUpperCase());
    const bomRef = bom ? (bom.manufacturer ? `${bom.manufacturer}:${bom.partNumber}` : bom.partNumber) : null;
    if (bom && position.part && lookUp(catalog, position.part).part?.partNumber.toLowerCase() !== bom.partNumber.toLowerCase()) {
      findings.push(`the BOM (line ${bom.line}) has ${bomRef} where the design assigns ${position.part}; the BOM is checked`);
    }
    const partReference = bomRef ?? position.part ?? null;
    const partSource = bomRef ? 'bom' : position.part ? 'design' : 'none';
    const solved = solvePosition(design, position, options.teamPolicies ?? []);
    const base = { ref: position.ref, role: position.role, partSource, partReference } as const;
    if (!solved.ok) {
      positions.push({ ...base, status: 'fail', part: null, findings: [...findings, ...solved.issues.map((i) => `line ${i.line} ${i.field}: ${i.message}`)], evaluation: null, tightest: [], cautions: [], suggestion: null });
      continue;
    }
    if (!solved.result.ok) {
      positions.push({ ...base, status: 'fail', part: null, findings: [...findings, `no feasible design: ${solved.result.infeasible.reason}`], evaluation: null, tightest: [], cautions: [], suggestion: null });
      continue;
    }
    const solvedPosition = solved.result.position;
    const { part, problem } = partReference ? lookUp(catalog, partReference) : { part: null, problem: 'no part assigned (neither a part: key in the design nor a BOM line)' };
    let status: AuditStatus = 'pass';
    let evaluation: PartEvaluation | null = null;
    if (!part) {
      status = 'fail';
      findings.push(problem!);
    } else {
      if (part.approval === 'banned' || part.approval === 'pending') {
        status = 'fail';
        findings.push(`${part.partNumber} is not approved for use: ${part.approval}${part.approvalNote ? ` (${part.approvalNote})` : ''}`);
      } else if (part.approval === 'conditional') {
        findings.push(`${part.partNumber} is approved on a condition: ${part.approvalNote ?? '(none stated)'}; check it holds here`);
        if (status === 'pass') status = 'warn';
      }
      if (part.lifecycle === 'obsolete') {
        status = 'fail';
        findings.push(`${part.partNumber} is obsolete`);
      } else if (part.lifecycle === 'nrnd') {
        findings.push(`${part.partNumber} is not recommended for new designs`);
        if (status === 'pass') status = 'warn';
      }
      evaluation = evaluatePart(part, solvedPosition, solved.policy, { unknownIsFailure });
      for (const l of evaluation.limits) {
        if (l.verdict === 'fail' || (l.verdict === 'marginal' && l.isHard) || (l.verdict === 'unknown' && l.isHard && unknownIsFailure)) {
          status = 'fail';
          findings.push(l.explanation);
        } else if (l.verdict !== 'pass') {
          if (status === 'pass') status = 'warn';
          findings.push(l.explanation);
        }
      }
    }
    const tightest = (evaluation?.limits ?? []).filter((l) => l.headroom !== null && l.scoresMargin).sort((a, b) => a.headroom! - b.headroom!).slice(0, 3);
    let suggestion: PositionAudit['suggestion'] = null;
    if (status === 'fail' && options.suggest !== false) {
      const key = JSON.stringify([position.role, position.conditions, position.rthJa ?? null, solved.policy.id]);
      if (!suggestions.has(key)) suggestions.set(key, suggest(catalog, solvedPosition, solved.policy, null));
      const found = suggestions.get(key)!;
      suggestion = found && found.part.partNumber !== part?.partNumber ? found : null;
    }
    positions.push({ ...base, status, part, findings, evaluation, tightest, cautions: solvedPosition.cautions, suggestion });
  }
  // BOM lines for designators the design does not describe: nothing to check them against.
  for (const [ref, line] of bomByRef) {
    positions.push({
      ref,
      role: null,
      status: 'unchecked',
      partSource: 'bom',
      partReference: line.manufacturer ? `${line.manufacturer}:${line.partNumber}` : line.partNumber,
      part: lookUp(catalog, line.manufacturer ? `${line.manufacturer}:${line.partNumber}` : line.partNumber).part,
      findings: [`in the BOM (line ${line.line}) but the design gives no conditions for ${ref}: it cannot be checked`],
      evaluation: null,
      tightest: [],
      cautions: [],
      suggestion: null,
    });
  }
  const counts = { pass: 0, warn: 0, fail: 0, unchecked: 0 };
  for (const p of positions) counts[p.status]++;
  return { design: design.file, name: design.name, positions, counts, isPassing: counts.fail === 0 };
}

function suggest(catalog: Catalog, position: Parameters<typeof findCandidates>[1], policy: DeratingPolicy, current: Part | null): PositionAudit['suggestion'] {
  const search = findCandidates(catalog, position, policy, { wanted: 5 });
  const best = search.ranking.candidates.find(
    (c) => c.evaluation.verdict === 'pass' && APPROVED_FOR_USE.has(c.evaluation.part.approval) && c.evaluation.part.approval !== 'conditional' && c.evaluation.part.partNumber !== current?.partNumber,
  );
  return best ? { part: best.evaluation.part, summary: best.evaluation.tightest?.explanation ?? best.evaluation.summary } : null;
}
