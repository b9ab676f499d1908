import { describe, expect, it } from 'vitest';
import { parseQuantity } from '../../../src/units/index.js';
import { changedColumns, checkEdit, editValues, editableQuantity, isRenamed, withIdentityCheck } from '../../../src/tui/state/edit-part.js';
import { checkPart } from '../../../src/tui/state/part-form.js';
import { aPart } from '../../helpers/a-part.js';

describe('the edit form of a stored part', () => {
  it('writes each value in engineering notation with its unit, as short as reads back exactly', () => {
    expect(editableQuantity(40, 'voltage')).toBe('40 V');
    expect(editableQuantity(0.5, 'voltage')).toBe('500 mV');
    expect(editableQuantity(8.3e-3, 'time')).toBe('8.3 ms');
    expect(editableQuantity(423.15, 'temperature')).toBe('150 °C');
    expect(editableQuantity(0.05, 'ratio')).toBe('5 %');
    expect(editableQuantity(1000, 'voltage')).toBe('1 kV');
    for (const [value, kind] of [[1 / 3, 'current'], [0.0123456789, 'capacitance'], [347.9, 'temperature']] as const) {
      const back = parseQuantity(editableQuantity(value, kind), kind, { bareUnit: '°C' });
      expect(back.ok && Math.abs(back.value - value) / value).toBeLessThan(1e-12);
    }
  });

  it('fills in every stored field, points as typed, catalog text without control characters', () => {
    const part = aPart('schottky', { ifsmPulseS: 8.3e-3, irPoints: [{ irA: 5e-6, vrV: 40, tjK: 398.15 }], description: 'fast \u001b[31mred\u0007 one' });
    const values = editValues(part);
    expect(values).toMatchObject({
      kind: 'schottky',
      manufacturer: 'Testwell Devices',
      part_number: 'TW-SK340A',
      vrrm_v: '40 V',
      if_av_a: '3 A',
      tj_max_k: '150 °C',
      ifsm_pulse_s: '8.3 ms',
      vf_points: '500 mV @ 3 A @ 25 °C',
      ir_points: '5 µA @ 40 V @ 125 °C',
      description: 'fast red one',
    });
    expect(values).not.toHaveProperty('cj_f');
    expect(checkPart(values).part).toMatchObject({ vrrmV: 40, tjMaxK: 423.15 });
  });

  it('keeps untouched values exactly as stored and takes the changed ones as typed', () => {
    const part = aPart('schottky', { ifAvA: 1 / 3 });
    const initial = editValues(part);
    const values = { ...initial, vrrm_v: '60 V' };
    expect(changedColumns(initial, values)).toEqual(['vrrm_v']);
    const check = checkEdit(values, initial, part);
    expect(check.part).toMatchObject({ vrrmV: 60, partNumber: 'TW-SK340A' });
    expect(check.part!.ifAvA).toBe(1 / 3);
  });

  it('reports a bad value by its column', () => {
    const part = aPart('schottky');
    const initial = editValues(part);
    const check = checkEdit({ ...initial, vrrm_v: '60 A' }, initial, part);
    expect(check.part).toBeNull();
    expect(check.issues.get('vrrm_v')?.message).toMatch(/voltage/);
  });

  it('refuses, beside the part number, a maker and part number another part has', () => {
    const part = aPart('schottky');
    const initial = editValues(part);
    const taken = (ref: string) => ref.toLowerCase() === 'testwell devices:tw-sk360a' || ref.toLowerCase() === 'testwell devices:tw-sk340a';
    const renamed = { ...initial, part_number: 'TW-SK360A' };
    expect(isRenamed(renamed, part)).toBe(true);
    const refused = withIdentityCheck(checkEdit(renamed, initial, part), renamed, taken, part);
    expect(refused.part).toBeNull();
    expect(refused.issues.get('part_number')?.message).toBe('already in the catalog: Testwell Devices:TW-SK360A is another part');
    // Its own identity is no clash, nor is a change of letter case.
    const own = { ...initial, part_number: 'tw-sk340a' };
    expect(isRenamed(own, part)).toBe(false);
    expect(withIdentityCheck(checkEdit(own, initial, part), own, taken, part).part).not.toBeNull();
  });
});
