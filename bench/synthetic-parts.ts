import type { Part, PartKind } from '../src/parts/index.js';
import {
  DESCRIPTION_EXTRAS, KIND_LETTER, KIND_PACKAGES, KIND_WEIGHTS, MAKERS, PACKAGE_SUFFIX, VARIANTS,
  type SyntheticMaker,
} from './synthetic-makers.js';

type Random = () => number;

const C = (celsius: number) => celsius + 273.15;
/** Three significant figures, without binary noise such as 1.8399999999999998e-10. */
const sig = (x: number) => Number(x.toPrecision(3));
const pick = <T>(r: Random, list: readonly T[]): T => list[Math.floor(r() * list.length)]!;
/** Earlier entries more likely: catalogs hold many more common packages and ratings than rare ones. */
const pickSkewed = <T>(r: Random, list: readonly T[]): T => list[Math.floor(r() * r() * list.length)]!;
function pickWeighted<T>(r: Random, items: readonly [T, number][]): T {
  const total = items.reduce((s, [, w]) => s + w, 0);
  let x = r() * total;
  for (const [item, w] of items) if ((x -= w) < 0) return item;
  return items[items.length - 1]![0];
}

const VOLTAGES: Record<string, readonly number[]> = {
  rectifier: [1000, 600, 400, 200, 800, 100, 50, 1200, 1600],
  'fast-recovery': [600, 1000, 400, 800, 200, 1200],
  ultrafast: [600, 200, 400, 300, 150, 100, 800, 1000],
  schottky: [40, 60, 100, 30, 20, 45, 150, 200, 50, 80],
  'sic-schottky': [650, 1200, 1700],
  signal: [100, 75, 80, 200, 250],
};
const CURRENTS = [1, 2, 3, 0.5, 5, 8, 10, 15, 20, 30, 0.2];
const ZENER_VOLTS = [5.1, 3.3, 12, 4.7, 15, 2.4, 2.7, 3, 3.6, 3.9, 4.3, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1, 10, 11, 13, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75];
const STANDOFFS = [5, 12, 24, 15, 33, 6.5, 8.5, 10, 13, 18, 20, 26, 28, 30, 36, 40, 48, 58, 64, 70, 85, 100, 130, 170, 220, 300, 440];
const PULSE_POWERS = [600, 400, 1500, 3000, 5000, 200];
const APPROVALS: [Part['approval'], number][] = [['pending', 68], ['approved', 20], ['preferred', 4], ['conditional', 5], ['banned', 3]];
const LIFECYCLES: [Part['lifecycle'], number][] = [['active', 85], ['nrnd', 10], ['obsolete', 5]];
const LABEL: Record<PartKind, string> = {
  rectifier: 'Rectifier', 'fast-recovery': 'Fast-recovery rectifier', ultrafast: 'Ultrafast rectifier',
  schottky: 'Schottky rectifier', 'sic-schottky': 'SiC Schottky diode', zener: 'Zener diode',
  'tvs-uni': 'TVS diode, unidirectional', 'tvs-bi': 'TVS diode, bidirectional', signal: 'Switching diode',
};

/** "5V1" for 5.1 V, as zener part numbers print it. */
const rkmVolts = (v: number) => (Number.isInteger(v) ? `${v}V` : String(v).replace('.', 'V'));

function partNumber(r: Random, maker: SyntheticMaker, kind: PartKind, pkg: string, main: string, current: string): string {
  const letter = KIND_LETTER[kind];
  const series = 1 + Math.floor(r() * 9);
  const suffix = PACKAGE_SUFFIX[pkg] ?? 'Z';
  const variant = pick(r, VARIANTS);
  if (maker.style === 'series') return `${maker.prefix}${letter}${current}-${main}${suffix}${variant}`;
  if (maker.style === 'dashed') return `${maker.prefix}${letter}-${current}${series}${main}-${suffix}${variant}`;
  return `${maker.prefix}${series}${main}${letter}${current}${suffix}${variant}`;
}

const commercial = (r: Random) => {
  const approval = pickWeighted(r, APPROVALS);
  return {
    lifecycle: pickWeighted(r, LIFECYCLES),
    approval,
    ...(approval === 'conditional' ? { approvalNote: 'Only where the board keeps it below 100 °C.' } : {}),
    unitPrice: Math.round((0.01 + r() * r() * 2) * 1000) / 1000,
    currency: 'EUR',
  };
};

function rectifying(r: Random, maker: SyntheticMaker, kind: PartKind): Part {
  const pkg = pickSkewed(r, KIND_PACKAGES[kind]);
  const vrrmV = pickSkewed(r, VOLTAGES[kind]!);
  const ifAvA = kind === 'signal' ? 0.2 : pickSkewed(r, CURRENTS);
  const vf = kind === 'schottky' ? 0.35 + r() * 0.4 : kind === 'sic-schottky' ? 1.4 + r() * 0.3 : 0.8 + r() * 0.9;
  const trr = kind === 'ultrafast' ? 20 + Math.floor(r() * 60) : kind === 'fast-recovery' ? 150 + Math.floor(r() * 350) : kind === 'signal' ? 4 : undefined;
  const extra = pick(r, DESCRIPTION_EXTRAS);
  return {
    manufacturer: maker.name,
    partNumber: partNumber(r, maker, kind, pkg, String(vrrmV), String(ifAvA).replace('.', 'P')),
    kind, package: pkg,
    description: `${LABEL[kind]} ${vrrmV} V ${ifAvA} A, ${pkg}${extra ? ', ' + extra : ''}`,
    ...commercial(r),
    vrrmV, ifAvA, ifAvRefK: C(75 + Math.floor(r() * 50)), ifAvRef: 'lead',
    ifsmA: Math.round(ifAvA * (20 + r() * 20)), ifsmPulseS: 8.3e-3,
    vfPoints: [{ vfV: Math.round(vf * 100) / 100, ifA: ifAvA, tjK: C(25) }, { vfV: Math.round(vf * 88) / 100, ifA: ifAvA, tjK: C(125) }],
    irPoints: [{ irA: 5e-6, vrV: vrrmV, tjK: C(25) }],
    cjF: sig(Math.round(5 + r() * 300) * 1e-12), cjVrV: 4,
    ...(trr !== undefined ? { trrS: sig(trr * 1e-9) } : {}),
    tjMaxK: C(kind === 'schottky' ? pick(r, [125, 150, 175]) : pick(r, [150, 175])),
    rthJaKPerW: Math.round(40 + r() * 200),
  } as Part;
}

function zener(r: Random, maker: SyntheticMaker): Part {
  const pkg = pickSkewed(r, KIND_PACKAGES.zener);
  const vzV = pickSkewed(r, ZENER_VOLTS);
  const vzTol = pick(r, [0.05, 0.02, 0.01, 0.05]);
  const pdW = pick(r, [0.5, 0.3, 0.2, 1, 1.5, 3]);
  const tolLetter = vzTol === 0.05 ? 'B' : vzTol === 0.02 ? 'C' : 'D';
  return {
    manufacturer: maker.name,
    partNumber: partNumber(r, maker, 'zener', pkg, rkmVolts(vzV) + tolLetter, String(pdW).replace('.', 'P')),
    kind: 'zener', package: pkg,
    description: `${LABEL.zener} ${vzV} V ±${vzTol * 100} % ${pdW} W, ${pkg}`,
    ...commercial(r),
    vzV, vzTol, iztA: 0.005, pdW, zztOhm: Math.round(5 + r() * 80), tjMaxK: C(150),
    vfPoints: [], irPoints: [],
  } as Part;
}

function tvs(r: Random, maker: SyntheticMaker, kind: PartKind): Part {
  const pkg = pickSkewed(r, KIND_PACKAGES[kind]);
  const vrwmV = pickSkewed(r, STANDOFFS);
  const pppmW = pickSkewed(r, PULSE_POWERS);
  const vbrMinV = Math.round(vrwmV * 111) / 100;
  const vbrMaxV = Math.round(vbrMinV * 110) / 100;
  const vcV = Math.round(vbrMaxV * (130 + r() * 30)) / 100;
  const bi = kind === 'tvs-bi' ? 'CA' : 'A';
  return {
    manufacturer: maker.name,
    partNumber: partNumber(r, maker, kind, pkg, `${vrwmV}${bi}`.replace('.', 'P'), String(pppmW / 100)),
    kind, package: pkg,
    description: `${LABEL[kind]} ${vrwmV} V ${pppmW} W, ${pkg}`,
    ...commercial(r),
    vrwmV, vbrMinV, vbrMaxV, vbrItA: 0.001, vcV, ippA: Math.round((pppmW / vcV) * 100) / 100,
    pppmW, pppmRiseS: 10e-6, pppmDecayS: 1000e-6, tjMaxK: C(150),
    vfPoints: [], irPoints: [],
  } as Part;
}

const MAKER_WEIGHTS = MAKERS.map((m) => [m, m.weight] as [SyntheticMaker, number]);

/** One invented part; the caller keeps part numbers unique. */
export function syntheticPart(r: Random): Part {
  const maker = pickWeighted(r, MAKER_WEIGHTS);
  const kind = pickWeighted(r, KIND_WEIGHTS);
  if (kind === 'zener') return zener(r, maker);
  if (kind === 'tvs-uni' || kind === 'tvs-bi') return tvs(r, maker, kind);
  return rectifying(r, maker, kind);
}

/** `count` parts with distinct maker and part number, the same for the same seed. */
export function* syntheticParts(count: number, random: Random): Generator<Part> {
  const seen = new Set<string>();
  let made = 0;
  while (made < count) {
    const part = syntheticPart(random);
    const identity = `${part.manufacturer}\u0000${part.partNumber}`.toLowerCase();
    if (seen.has(identity)) continue;
    seen.add(identity);
    made++;
    yield part;
  }
}
