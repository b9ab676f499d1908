import type { PartKind } from '../src/parts/index.js';

/** Invented makers, each with its own part-number prefix and numbering style. */
export interface SyntheticMaker {
  readonly name: string;
  readonly prefix: string;
  readonly style: 'series' | 'dashed' | 'compact';
  /** Relative share of the catalog: a few big makers and a long tail, as in real distributor data. */
  readonly weight: number;
}

const NAMES: readonly [string, string][] = [
  ['Brackwater Semiconductor', 'BW'], ['Ketterby Components', 'KT'], ['Velmora Power', 'VP'],
  ['Ashgrove Devices', 'AG'], ['Corvale Microsystems', 'CV'], ['Dunmere Electronics', 'DM'],
  ['Elsworth Silicon', 'ES'], ['Farrowdale Semiconductor', 'FD'], ['Glenholt Components', 'GH'],
  ['Harwick Power Devices', 'HW'], ['Islaby Electronics', 'IS'], ['Jorvane Semiconductor', 'JV'],
  ['Kelmarsh Devices', 'KM'], ['Lindqvale Components', 'LQ'], ['Marrowick Silicon', 'MW'],
  ['Nethercombe Power', 'NC'], ['Orrinbay Electronics', 'OB'], ['Pellworth Semiconductor', 'PW'],
  ['Quarrenden Devices', 'QD'], ['Redmarsh Components', 'RM'], ['Saltcote Silicon', 'SC'],
  ['Thornbury Vale Electronics', 'TV'], ['Ulverdale Power', 'UD'], ['Vantrey Semiconductor', 'VT'],
  ['Wexcombe Devices', 'WX'], ['Yarrowfield Components', 'YF'], ['Zennor Cove Silicon', 'ZC'],
  ['Amberlow Electronics', 'AL'], ['Bellhaven Devices', 'BH'], ['Caddowmere Power', 'CM'],
  ['Drakeholm Semiconductor', 'DH'], ['Eastwold Components', 'EW'], ['Fennick Silicon', 'FN'],
  ['Gorsebrook Electronics', 'GB'], ['Hollinsway Devices', 'HS'], ['Ivybridge Lane Power', 'IL'],
];

const STYLES: SyntheticMaker['style'][] = ['series', 'dashed', 'compact'];

export const MAKERS: readonly SyntheticMaker[] = NAMES.map(([name, prefix], i) => ({
  name,
  prefix,
  style: STYLES[i % 3]!,
  weight: 1 / (1 + i * 0.35),
}));

/** Share of each kind in a broad diode catalog. */
export const KIND_WEIGHTS: readonly [PartKind, number][] = [
  ['rectifier', 20], ['fast-recovery', 8], ['ultrafast', 12], ['schottky', 22], ['sic-schottky', 3],
  ['zener', 15], ['tvs-uni', 9], ['tvs-bi', 6], ['signal', 5],
];

/** Packages each kind comes in, most common first; the letter ends dashed part numbers. */
export const KIND_PACKAGES: Record<PartKind, readonly string[]> = {
  rectifier: ['DO-41', 'SMA', 'SMB', 'DO-201AD', 'SOD-123F', 'DO-15', 'MELF', 'TO-220AC'],
  'fast-recovery': ['DO-41', 'SMA', 'SMB', 'DO-201AD', 'DO-15', 'TO-220AC'],
  ultrafast: ['SMA', 'SOD-123F', 'SMB', 'DO-41', 'TO-220AC', 'TO-252', 'SMC', 'TO-247'],
  schottky: ['SMA', 'SOD-123', 'SOD-123F', 'SMB', 'SOD-323', 'SMC', 'TO-252', 'TO-220AB', 'TO-263', 'DO-41'],
  'sic-schottky': ['TO-220AC', 'TO-247', 'TO-252', 'TO-263'],
  zener: ['SOD-123', 'SOD-323', 'SOD-523', 'SOD-80', 'DO-35', 'SOT-23', 'SMA', 'SMB'],
  'tvs-uni': ['SMA', 'SMB', 'SMC', 'DO-201AD', 'DO-15', 'SOD-123F'],
  'tvs-bi': ['SMA', 'SMB', 'SMC', 'DO-201AD', 'DO-15'],
  signal: ['SOD-123', 'SOD-323', 'SOD-523', 'SOT-23', 'DO-35'],
};

export const KIND_LETTER: Record<PartKind, string> = {
  rectifier: 'R', 'fast-recovery': 'F', ultrafast: 'U', schottky: 'S', 'sic-schottky': 'C',
  zener: 'Z', 'tvs-uni': 'P', 'tvs-bi': 'P', signal: 'D',
};

export const PACKAGE_SUFFIX: Record<string, string> = {
  'DO-41': 'L', SMA: 'A', SMB: 'B', SMC: 'C', 'DO-201AD': 'H', 'SOD-123F': 'F', 'SOD-123': 'W',
  'DO-15': 'G', MELF: 'K', 'TO-220AC': 'T', 'TO-220AB': 'TD', 'TO-252': 'D', 'TO-263': 'D2',
  'TO-247': 'X', 'SOD-323': 'WS', 'SOD-523': 'WT', 'SOD-80': 'M', 'DO-35': 'N', 'SOT-23': 'Q',
};

/** Ordering options that make otherwise equal parts distinct (reel, automotive, lead-free). */
export const VARIANTS: readonly string[] = ['', '', '', '-TR', '-E3', 'G', '-Q', '-HF', '-13', 'R', '-AU', 'HE'];

export const DESCRIPTION_EXTRAS: readonly string[] = [
  '', '', '', '', 'automotive', 'low leakage', 'glass passivated', 'high surge', 'soft recovery',
  'low profile', 'halogen free', 'high temperature',
];
