import type { QuantityKind } from '../../units/index.js';

/** A filter field people type: `vrrm>=40V`, `kind=zener`. Names are lower case; aliases read the same. */
export type QueryField = NumberField | ChoiceField;

export interface NumberField {
  readonly type: 'number';
  readonly name: string;
  readonly aliases: readonly string[];
  /** Part key compared; `vf` reads the headline forward voltage instead (see match-part.ts). */
  readonly key: string;
  /** undefined: a plain number (price). */
  readonly quantity?: QuantityKind;
  /** Unit of a bare number where the quantity's own default would surprise: °C, %. */
  readonly bareUnit?: string;
  readonly help: string;
}

export interface ChoiceField {
  readonly type: 'choice';
  readonly name: 'kind' | 'package' | 'maker' | 'approval' | 'lifecycle' | 'group';
  readonly aliases: readonly string[];
  readonly help: string;
}

const num = (name: string, key: string, quantity: QuantityKind | undefined, help: string, more: Partial<NumberField> = {}): NumberField => ({
  type: 'number',
  name,
  aliases: [],
  key,
  ...(quantity ? { quantity } : {}),
  help,
  ...more,
});
const choice = (name: ChoiceField['name'], aliases: string[], help: string): ChoiceField => ({ type: 'choice', name, aliases, help });

export const QUERY_FIELDS: readonly QueryField[] = [
  num('vrrm', 'vrrmV', 'voltage', 'repetitive peak reverse voltage'),
  num('if', 'ifAvA', 'current', 'average forward current IF(AV)', { aliases: ['ifav', 'io'] }),
  num('ifsm', 'ifsmA', 'current', 'surge current'),
  num('vf', 'vfPoints', 'voltage', 'forward voltage at the lowest listed temperature and highest listed current'),
  num('trr', 'trrS', 'time', 'reverse recovery time'),
  num('qrr', 'qrrC', 'charge', 'reverse recovery charge'),
  num('cj', 'cjF', 'capacitance', 'junction capacitance'),
  num('tj', 'tjMaxK', 'temperature', 'maximum junction temperature; bare numbers in °C', { aliases: ['tjmax'], bareUnit: '°C' }),
  num('pd', 'pdW', 'power', 'power dissipation'),
  num('vz', 'vzV', 'voltage', 'Zener voltage'),
  num('tol', 'vzTol', 'ratio', 'Zener voltage tolerance; bare numbers in %', { aliases: ['vztol'], bareUnit: '%' }),
  num('vrwm', 'vrwmV', 'voltage', 'TVS stand-off voltage'),
  num('vbr', 'vbrMinV', 'voltage', 'TVS minimum breakdown voltage'),
  num('vc', 'vcV', 'voltage', 'TVS clamping voltage'),
  num('ipp', 'ippA', 'current', 'TVS peak pulse current'),
  num('pppm', 'pppmW', 'power', 'TVS peak pulse power', { aliases: ['ppp'] }),
  num('price', 'unitPrice', undefined, 'unit price, any currency, plain number'),
  choice('kind', [], 'diode kind: rectifier, schottky, zener, tvs, …'),
  choice('package', ['pkg'], 'package, any spelling: sod123, DO-214AC'),
  choice('maker', ['mfr', 'manufacturer'], 'part of the maker name'),
  choice('approval', [], "the team's approval state"),
  choice('lifecycle', [], "the maker's lifecycle state"),
  choice('group', [], 'second-source group'),
];

const BY_NAME = new Map<string, QueryField>();
for (const field of QUERY_FIELDS) for (const name of [field.name, ...field.aliases]) BY_NAME.set(name, field);

export function findQueryField(name: string): QueryField | undefined {
  return BY_NAME.get(name.toLowerCase());
}

export const QUERY_FIELD_NAMES: readonly string[] = QUERY_FIELDS.map((f) => f.name);
