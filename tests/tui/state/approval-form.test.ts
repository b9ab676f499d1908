import { describe, expect, it } from 'vitest';
import { approvalRows, checkApproval } from '../../../src/tui/state/approval-form.js';

describe('approval form', () => {
  it('asks for a condition only for a conditional approval', () => {
    expect(approvalRows('approved').map((r) => r.name)).toEqual(['state', 'reason']);
    expect(approvalRows('conditional').map((r) => r.name)).toEqual(['state', 'condition', 'reason']);
  });

  it('needs a reason, and a condition when conditional', () => {
    expect(checkApproval({ state: 'conditional' }, 'pending')).toEqual({
      ok: false,
      errors: { condition: expect.stringContaining('condition'), reason: expect.stringContaining('required') },
    });
    expect(checkApproval({ state: 'conditional', condition: 'below 60 °C', reason: 'lab test' }, 'pending')).toEqual({
      ok: true,
      change: { state: 'conditional', condition: 'below 60 °C', reason: 'lab test' },
    });
    expect(checkApproval({ state: 'banned', condition: 'left over', reason: 'field failures' }, 'approved')).toEqual({ ok: true, change: { state: 'banned', reason: 'field failures' } });
  });
});
