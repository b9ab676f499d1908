import type { Part, PartInput } from '../../src/parts/index.js';
import { partSchema } from '../../src/parts/part-schema.js';

const BASES: Record<string, PartInput> = {
  schottky: {
    manufacturer: 'Testwell Devices',
    partNumber: 'TW-SK340A',
    kind: 'schottky',
    package: 'SMA',
    vrrmV: 40,
    ifAvA: 3,
    tjMaxK: 423.15,
    vfPoints: [{ vfV: 0.5, ifA: 3, tjK: 298.15 }],
  },
  zener: {
    manufacturer: 'Testwell Devices',
    partNumber: 'TW-Z5V1',
    kind: 'zener',
    package: 'SOD-123',
    vzV: 5.1,
    vzTol: 0.05,
    iztA: 0.005,
    pdW: 0.5,
    tjMaxK: 423.15,
  },
  tvs: {
    manufacturer: 'Testwell Devices',
    partNumber: 'TW-T33U',
    kind: 'tvs-uni',
    package: 'SMB',
    vrwmV: 33,
    vbrMinV: 36.7,
    vbrMaxV: 40.6,
    vcV: 53.3,
    ippA: 11.3,
    pppmW: 600,
    pppmRiseS: 10e-6,
    pppmDecayS: 1000e-6,
    tjMaxK: 423.15,
  },
};

/** A valid invented part of a kind family, with any fields overridden. */
export function aPart(family: 'schottky' | 'zener' | 'tvs' = 'schottky', overrides: Partial<PartInput> = {}): Part {
  return partSchema.parse({ ...BASES[family], ...overrides });
}
