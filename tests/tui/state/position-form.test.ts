import { describe, expect, it } from 'vitest';
import { findRole } from '../../../src/circuits/registry.js';
import type { RoleDefinition } from '../../../src/circuits/role.js';
import { initialForm } from '../../../src/tui/state/form-state.js';
import { POLICY_ROW, checkPosition, positionRows, shownError, typedConditions } from '../../../src/tui/state/position-form.js';

const role = (id: string) => findRole(id) as RoleDefinition;

describe('position form', () => {
  it('has the policy row, then one row per role input, choices with a "not given" option', () => {
    const rows = positionRows(role('transient-clamp'), ['commercial', 'industrial']);
    expect(rows[0]).toEqual({ name: POLICY_ROW, label: 'Derating policy', options: ['commercial', 'industrial'] });
    expect(rows.map((r) => r.name)).toContain('working_max');
    expect(rows.find((r) => r.name === 'polarity')?.options).toEqual(['', 'uni', 'bi']);
  });

  it('reads units as typed and says how a bare number was read', () => {
    const check = checkPosition(role('coil-freewheel'), { supply_max: '32 V', coil_resistance: '800 ohm', coil_inductance: '0.6 H', ambient_max: '70' });
    expect(check.fields.ambient_max).toEqual({ isRequired: false, note: 'no unit given; read as 70 °C' });
    expect(check.missing).toEqual([]);
    expect(check.conditions).toMatchObject({ supply_max: 32, coil_resistance: 800, ambient_max: 343.15 });
  });

  it('puts each field error beside its field, as typed', () => {
    const check = checkPosition(role('coil-freewheel'), { supply_max: '32 A', coil_resistance: '-5 Ω' });
    expect(check.fields.supply_max?.error).toMatch(/voltage/);
    expect(check.fields.coil_resistance?.error).toMatch(/positive/);
    expect(check.conditions).toBeNull();
  });

  it('marks missing required fields only after a submit was tried', () => {
    const check = checkPosition(role('coil-freewheel'), {});
    expect(check.missing).toEqual(['supply_max', 'coil_resistance', 'coil_inductance']);
    expect(shownError(check, 'supply_max', initialForm())).toBeUndefined();
    expect(shownError(check, 'supply_max', { hasAttempted: true })).toBe('required');
  });

  it('shows the role schema\'s cross-field problems under the form', () => {
    const check = checkPosition(role('rectifier'), { configuration: 'bridge', v_secondary_rms: '12 V', load_current: '1 A' });
    expect(check.formIssues).toEqual([expect.stringContaining('give capacitance')]);
    expect(check.conditions).toBeNull();
  });

  it('turns choice text into the booleans and numbers a schema wants', () => {
    const check = checkPosition(role('rectifier'), { configuration: 'bridge', v_secondary_rms: '240 V', load_current: '0.2 A', capacitance: '47 µF', is_mains_connected: 'true' });
    expect(check.conditions).toMatchObject({ is_mains_connected: true });
  });

  it('writes conditions as typed, with the unit a bare number was read in', () => {
    const out = typedConditions(role('rectifier'), { configuration: 'bridge', v_secondary_rms: '240', line_tolerance: '0.1', ambient_max: '85', is_mains_connected: 'true', capacitance: '' });
    expect(out).toEqual({ configuration: 'bridge', v_secondary_rms: '240 V', line_tolerance: 0.1, ambient_max: '85 °C', is_mains_connected: true });
  });
});
