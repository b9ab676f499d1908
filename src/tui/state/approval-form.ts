import { APPROVAL_STATES, type ApprovalState } from '../../parts/index.js';

export interface ApprovalRow {
  readonly name: 'state' | 'condition' | 'reason';
  readonly label: string;
  readonly options?: readonly string[];
}

/** The condition row appears only for a conditional approval. */
export function approvalRows(state: string): ApprovalRow[] {
  return [
    { name: 'state', label: 'New state', options: APPROVAL_STATES },
    ...(state === 'conditional' ? [{ name: 'condition' as const, label: 'Condition' }] : []),
    { name: 'reason', label: 'Reason' },
  ];
}

export type ApprovalCheck =
  | { ok: true; change: { state: ApprovalState; condition?: string; reason: string } }
  | { ok: false; errors: Readonly<Record<string, string>> };

export function checkApproval(values: Readonly<Record<string, string>>, current: ApprovalState): ApprovalCheck {
  const state = (values.state ?? current) as ApprovalState;
  const condition = (values.condition ?? '').trim();
  const reason = (values.reason ?? '').trim();
  const errors: Record<string, string> = {};
  if (!(APPROVAL_STATES as readonly string[]).includes(state)) errors.state = `one of ${APPROVAL_STATES.join(', ')}`;
  if (state === 'conditional' && !condition) errors.condition = 'a conditional approval needs its condition, e.g. "only below 60 °C ambient"';
  if (!reason) errors.reason = 'required: why the state changes (kept in the approval trail)';
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, change: { state, ...(state === 'conditional' ? { condition } : {}), reason } };
}
