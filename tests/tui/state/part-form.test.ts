import { describe, expect, it } from 'vitest';
import { checkPart, partRows, shownPartIssue } from '../../../src/tui/state/part-form.js';

const columns = (kind: string) => partRows(kind).map((r) => r.field.column);

describe('part form', () => {
  it('asks for the ratings the kind uses, marking the required ones', () => {
    expect(columns('schottky')).toContain('vrrm_v');
    expect(columns('schottky')).not.toContain('vz_v');
    expect(columns('zener')).toContain('vz_v');
    expect(columns('tvs-uni')).toContain('pppm_w');
    const required = partRows('zener').filter((r) => r.isRequired).map((r) => r.field.column);
    expect(required).toEqual(expect.arrayContaining(['manufacturer', 'part_number', 'package', 'vz_v', 'vz_tol', 'izt_a', 'pd_w', 'tj_max_k']));
  });

  it('decodes typed values with units, bare temperatures in °C', () => {
    const check = checkPart({
      kind: 'schottky', manufacturer: 'Testwell', part_number: 'TW-1', package: 'SMA', vrrm_v: '40 V', if_av_a: '3 A', tj_max_k: '150', vf_points: '0.5 V @ 3 A @ 25',
    });
    expect(check.issues.size).toBe(0);
    expect(check.part).toMatchObject({ vrrmV: 40, tjMaxK: 423.15, vfPoints: [{ vfV: 0.5, ifA: 3, tjK: 298.15 }] });
  });

  it('reports each bad field by its column, shown once typed or after a save attempt', () => {
    const values = { kind: 'schottky', manufacturer: 'T', part_number: 'X', package: 'SMA', vrrm_v: '40 A' };
    const check = checkPart(values);
    expect(check.part).toBeNull();
    expect(shownPartIssue(check, 'vrrm_v', values, false)?.message).toMatch(/voltage/);
    expect(shownPartIssue(check, 'tj_max_k', values, false)).toBeUndefined();
    expect(shownPartIssue(check, 'tj_max_k', values, true)?.message).toBeTruthy();
  });
});
