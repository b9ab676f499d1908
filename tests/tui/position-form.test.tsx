import { describe, expect, it } from 'vitest';
import { PositionFormScreen } from '../../src/tui/screens/position-form-screen.js';
import { emptyDraft } from '../../src/tui/state/position-draft.js';
import { renderScreen } from './support/render-app.js';
import { KEY, press, type, widestLine } from '../helpers/render-tui.js';
import { coilParts } from './support/tui-fixtures.js';
import { testServices } from './support/tui-services.js';

const form = (roleId: 'coil-freewheel' | 'rectifier' | 'transient-clamp' = 'coil-freewheel', columns = 80) =>
  renderScreen(<PositionFormScreen draft={emptyDraft(roleId)} width={columns} height={24} isActive />, testServices(coilParts), { columns });

describe('the position form', () => {
  it('shows one field per input, required ones starred, defaults as placeholders', () => {
    const { lastFrame } = form();
    expect(lastFrame()).toMatch(/Derating policy\s+‹ commercial ›/);
    expect(lastFrame()).toMatch(/Coil resistance\s+\*\s+required/);
    expect(lastFrame()).toMatch(/Diode forward drop\s+default 0.7 V/);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });

  it('checks each field as typed and puts the error beside it', async () => {
    const { lastFrame, stdin } = form();
    await press(stdin, KEY.down);
    await type(stdin, '32 A');
    expect(lastFrame()).toMatch(/32 A▏\s+✗ .*voltage/);
    await press(stdin, KEY.backspace);
    await type(stdin, 'V');
    expect(lastFrame()).not.toContain('✗');
  });

  it('says how a bare number was read', async () => {
    const { lastFrame, stdin } = form();
    for (let i = 0; i < 11; i++) await press(stdin, KEY.down);
    await type(stdin, '70');
    expect(lastFrame()).toContain('read as 70 °C');
  });

  it('marks missing required fields on Enter and does not solve', async () => {
    const { lastFrame, stdin, routes } = form();
    await press(stdin, KEY.enter);
    expect(lastFrame()).toMatch(/required\s+✗ required/);
    expect(routes).toEqual([]);
  });

  it('shows the schema\'s cross-field errors under the form', async () => {
    const { lastFrame, stdin } = form('rectifier');
    await press(stdin, KEY.down, KEY.right, KEY.right, KEY.right, KEY.down);
    expect(lastFrame()).toMatch(/Configuration\s+\*\s+‹ bridge ›/);
    await type(stdin, '12 V');
    await press(stdin, KEY.down, KEY.down, KEY.down);
    await type(stdin, '1 A');
    await press(stdin, KEY.enter);
    expect(lastFrame()).toContain('✗ Filter capacitor: give capacitance (the filter capacitor) or ripple_max');
  });

  it('cycles choices with ←/→, including "not set"', async () => {
    const { lastFrame, stdin } = form('transient-clamp');
    for (let i = 0; i < 4; i++) await press(stdin, KEY.down);
    expect(lastFrame()).toMatch(/Surge preset\s+‹ not set ›/);
    await press(stdin, KEY.right);
    expect(lastFrame()).toMatch(/Surge preset\s+‹ iec/);
    await press(stdin, KEY.left);
    expect(lastFrame()).toMatch(/Surge preset\s+‹ not set ›/);
  });

  it('solves with Enter once the form is complete', async () => {
    const { stdin, routes } = form();
    await press(stdin, KEY.down);
    await type(stdin, '32 V');
    await press(stdin, KEY.down);
    await type(stdin, '800 Ω');
    await press(stdin, KEY.down);
    await type(stdin, '600 mH');
    await press(stdin, KEY.enter);
    expect(routes).toHaveLength(1);
    const route = routes[0] as { name: string; session: { result: { ok: boolean }; draft: { values: Record<string, string> } } };
    expect(route.name).toBe('position');
    expect(route.session.result.ok).toBe(true);
    expect(route.session.draft.values).toEqual({ supply_max: '32 V', coil_resistance: '800 Ω', coil_inductance: '600 mH' });
  });

  it('keeps very long input visible at its end and within the width', async () => {
    const { lastFrame, stdin } = form();
    await press(stdin, KEY.down);
    await type(stdin, '3'.repeat(40) + ' V');
    expect(lastFrame()).toMatch(/…3+ V▏/);
    expect(widestLine(lastFrame())).toBeLessThanOrEqual(80);
  });
});
