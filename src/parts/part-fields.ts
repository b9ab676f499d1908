import type { QuantityKind } from '../units/index.js';
import {
  APPROVAL_STATES,
  LIFECYCLES,
  PART_KINDS,
  RATING_REFERENCE_POINTS,
} from './part-kinds.js';

/**
 * One row per stored field: its key in the domain type, its column in CSV exports,
 * the trade term shown to people, and how its text is read.
 * The order here is the canonical column order of every export.
 */
export type PartFieldType = 'text' | 'enum' | 'number' | 'vf-points' | 'ir-points';

export interface PartField {
  readonly key: string;
  readonly column: string;
  readonly label: string;
  readonly type: PartFieldType;
  readonly quantity?: QuantityKind;
  readonly values?: readonly string[];
  readonly help: string;
}

const text = (key: string, column: string, label: string, help: string): PartField => ({
  key,
  column,
  label,
  type: 'text',
  help,
});
const choice = (
  key: string,
  column: string,
  label: string,
  values: readonly string[],
  help: string,
): PartField => ({ key, column, label, type: 'enum', values, help });
const quantity = (
  key: string,
  column: string,
  label: string,
  kind: QuantityKind,
  help: string,
): PartField => ({ key, column, label, type: 'number', quantity: kind, help });

export const PART_FIELDS: readonly PartField[] = [
  text('manufacturer', 'manufacturer', 'Manufacturer', 'maker name'),
  text('partNumber', 'part_number', 'Part number', "maker's part number"),
  choice('kind', 'kind', 'Kind', PART_KINDS, 'diode kind'),
  text('package', 'package', 'Package', 'industry or JEDEC package name, e.g. SOD-123, SMA, DO-41'),
  text('description', 'description', 'Description', 'short free text'),
  choice('lifecycle', 'lifecycle', 'Lifecycle', LIFECYCLES, "maker's lifecycle state"),
  choice('approval', 'approval', 'Approval', APPROVAL_STATES, "the team's approval state"),
  text('approvalNote', 'approval_note', 'Approval note', 'condition or reason for the approval state'),
  text('secondSourceGroup', 'second_source_group', 'Second-source group', 'name shared by interchangeable parts'),
  { key: 'unitPrice', column: 'unit_price', label: 'Unit price', type: 'number', help: 'price of one part, plain number' },
  text('currency', 'currency', 'Currency', 'ISO 4217 code, e.g. EUR'),
  text('datasheetUrl', 'datasheet_url', 'Datasheet', 'http or https address'),
  text('notes', 'notes', 'Notes', 'free text'),
  quantity('vrrmV', 'vrrm_v', 'VRRM', 'voltage', 'repetitive peak reverse voltage'),
  quantity('ifAvA', 'if_av_a', 'IF(AV)', 'current', 'average forward current rating'),
  quantity('ifAvRefK', 'if_av_ref_k', 'IF(AV) at', 'temperature', 'temperature at which IF(AV) is rated'),
  choice('ifAvRef', 'if_av_ref', 'IF(AV) reference', RATING_REFERENCE_POINTS, 'where that temperature is taken'),
  quantity('ifsmA', 'ifsm_a', 'IFSM', 'current', 'non-repetitive peak surge current'),
  quantity('ifsmPulseS', 'ifsm_pulse_s', 'IFSM pulse', 'time', 'surge pulse width, e.g. 8.3 ms half-sine'),
  { key: 'vfPoints', column: 'vf_points', label: 'VF', type: 'vf-points', help: 'forward voltage points "VF @ IF @ Tj; …"' },
  { key: 'irPoints', column: 'ir_points', label: 'IR', type: 'ir-points', help: 'reverse current points "IR @ VR @ Tj; …"' },
  quantity('cjF', 'cj_f', 'Cj', 'capacitance', 'junction capacitance'),
  quantity('cjVrV', 'cj_vr_v', 'Cj at VR', 'voltage', 'reverse voltage at which Cj is given'),
  quantity('trrS', 'trr_s', 'trr', 'time', 'reverse recovery time'),
  quantity('qrrC', 'qrr_c', 'Qrr', 'charge', 'reverse recovery charge'),
  quantity('tjMaxK', 'tj_max_k', 'Tj max', 'temperature', 'maximum junction temperature'),
  quantity('rthJaKPerW', 'rth_ja_k_per_w', 'RθJA', 'thermal-resistance', 'junction to ambient'),
  quantity('rthJlKPerW', 'rth_jl_k_per_w', 'RθJL', 'thermal-resistance', 'junction to lead'),
  quantity('rthJcKPerW', 'rth_jc_k_per_w', 'RθJC', 'thermal-resistance', 'junction to case'),
  quantity('pdW', 'pd_w', 'PD', 'power', 'power dissipation rating'),
  quantity('vzV', 'vz_v', 'VZ', 'voltage', 'nominal Zener voltage at IZT'),
  quantity('vzTol', 'vz_tol', 'VZ tolerance', 'ratio', 'tolerance of VZ, e.g. 5 %'),
  quantity('iztA', 'izt_a', 'IZT', 'current', 'Zener test current'),
  quantity('zztOhm', 'zzt_ohm', 'ZZT', 'resistance', 'dynamic impedance at IZT'),
  quantity('vzTempcoPerK', 'vz_tempco_per_k', 'αVZ', 'tempco', 'temperature coefficient of VZ'),
  quantity('vrwmV', 'vrwm_v', 'VRWM', 'voltage', 'reverse stand-off voltage'),
  quantity('vbrMinV', 'vbr_min_v', 'VBR min', 'voltage', 'minimum breakdown voltage'),
  quantity('vbrMaxV', 'vbr_max_v', 'VBR max', 'voltage', 'maximum breakdown voltage'),
  quantity('vbrItA', 'vbr_it_a', 'IT', 'current', 'test current for VBR'),
  quantity('vcV', 'vc_v', 'VC', 'voltage', 'clamping voltage at IPP'),
  quantity('ippA', 'ipp_a', 'IPP', 'current', 'peak pulse current'),
  quantity('pppmW', 'pppm_w', 'PPPM', 'power', 'peak pulse power'),
  quantity('pppmRiseS', 'pppm_rise_s', 'Pulse rise', 'time', 'rise time of the rated pulse, e.g. 10 µs'),
  quantity('pppmDecayS', 'pppm_decay_s', 'Pulse decay', 'time', 'decay time to half of the rated pulse, e.g. 1000 µs'),
];

const BY_COLUMN = new Map(PART_FIELDS.map((f) => [f.column, f]));
const BY_KEY = new Map(PART_FIELDS.map((f) => [f.key, f]));

export function fieldByColumn(column: string): PartField | undefined {
  return BY_COLUMN.get(column);
}

export function fieldByKey(key: string): PartField | undefined {
  return BY_KEY.get(key);
}

export const PART_COLUMNS: readonly string[] = PART_FIELDS.map((f) => f.column);
