import { formatQuantity } from '../units/index.js';

/** The rating fields the cross-checks read; every variant of the part schema has them. */
export interface RatingsToCheck {
  readonly kind: string;
  readonly approval?: string;
  readonly approvalNote?: string | undefined;
  readonly unitPrice?: number | undefined;
  readonly currency?: string | undefined;
  readonly vrrmV?: number | undefined;
  readonly ifAvA?: number | undefined;
  readonly ifsmA?: number | undefined;
  readonly irPoints?: readonly { vrV: number }[];
  readonly vrwmV?: number | undefined;
  readonly vbrMinV?: number | undefined;
  readonly vbrMaxV?: number | undefined;
  readonly vcV?: number | undefined;
  readonly pppmRiseS?: number | undefined;
  readonly pppmDecayS?: number | undefined;
}

export interface ConsistencyIssue {
  readonly field: string;
  readonly message: string;
}

const v = (x: number) => formatQuantity(x, 'voltage');

/** Relations between ratings that a single field cannot check. */
export function checkPartConsistency(p: RatingsToCheck): ConsistencyIssue[] {
  const issues: ConsistencyIssue[] = [];
  const add = (field: string, message: string) => issues.push({ field, message });

  if (p.approval === 'conditional' && !p.approvalNote?.trim()) {
    add('approvalNote', 'a conditional approval needs its condition in approval_note');
  }
  if (p.unitPrice !== undefined && p.currency === undefined) {
    add('currency', 'a unit price needs its currency, such as EUR');
  }
  if (p.ifAvA !== undefined && p.ifsmA !== undefined && p.ifsmA < p.ifAvA) {
    add('ifsmA', 'IFSM must not be below IF(AV): a surge rating is a peak, not an average');
  }
  if (p.vrrmV !== undefined) {
    // Leakage measured above the rated blocking voltage would be a typing error.
    const over = (p.irPoints ?? []).find((pt) => pt.vrV > p.vrrmV! * 1.0001);
    if (over) add('irPoints', `an IR point is at VR ${v(over.vrV)}, above VRRM ${v(p.vrrmV)}`);
  }
  if (p.vbrMinV !== undefined && p.vbrMaxV !== undefined && p.vbrMaxV < p.vbrMinV) {
    add('vbrMaxV', `VBR max ${v(p.vbrMaxV)} is below VBR min ${v(p.vbrMinV)}`);
  }
  if (p.vrwmV !== undefined && p.vbrMinV !== undefined && p.vrwmV >= p.vbrMinV) {
    add('vrwmV', `VRWM ${v(p.vrwmV)} must be below VBR min ${v(p.vbrMinV)}`);
  }
  const vbrTop = p.vbrMaxV ?? p.vbrMinV;
  if (p.vcV !== undefined && vbrTop !== undefined && p.vcV <= vbrTop) {
    add('vcV', `VC ${v(p.vcV)} must be above VBR ${v(vbrTop)}: the clamp voltage includes the dynamic drop`);
  }
  if (p.pppmRiseS !== undefined && p.pppmDecayS !== undefined && p.pppmRiseS >= p.pppmDecayS) {
    add('pppmDecayS', 'the pulse decay time must be longer than its rise time (for example 10/1000 µs)');
  }
  return issues;
}
