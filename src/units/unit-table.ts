import type { QuantityKind } from './quantity-kinds.js';

/** One unit of a quantity and every way it may be spelled. */
export interface UnitSpelling {
  /** Shown in notes such as "read as 85 °C"; '' for a plain fraction. */
  label: string;
  /** Power of ten taking a value in this unit to the SI unit. */
  exponent: number;
  /** Added after scaling; only degrees Celsius → kelvin uses it. */
  offset: number;
  prefixable: boolean;
  /** Exact, case-sensitive spellings. */
  symbols: readonly string[];
  /** Spellings matched regardless of case, stored lower-case. */
  words: readonly string[];
  /** Lower-case symbols accepted only after a prefix ("220uf"), where "f" cannot be femto. */
  afterPrefix: readonly string[];
}

export interface KindUnits {
  units: readonly UnitSpelling[];
  /** The unit a bare number is read in. */
  bare: UnitSpelling;
}

function unit(label: string, spec: Partial<Omit<UnitSpelling, 'label'>>): UnitSpelling {
  return {
    label,
    exponent: spec.exponent ?? 0,
    offset: spec.offset ?? 0,
    prefixable: spec.prefixable ?? false,
    symbols: spec.symbols ?? [label],
    words: spec.words ?? [],
    afterPrefix: spec.afterPrefix ?? [],
  };
}

function single(only: UnitSpelling, ...more: UnitSpelling[]): KindUnits {
  return { units: [only, ...more], bare: only };
}

// T/°C = T/K − 273.15 (SI Brochure, 9th ed., §2.3.1).
const CELSIUS_OFFSET = 273.15;

const CELSIUS_SYMBOLS = ['°C', 'C'];
const CELSIUS_WORDS = ['°c', 'degc', 'celsius'];


/** Every "x per kelvin" spelling for one numerator: %/K, %/°C, %/C, %/degC. */
function perKelvin(numerator: string, exponent: number): UnitSpelling {
  return unit(`${numerator}/K`, {
    exponent,
    symbols: ['K', '°C', 'C'].map((denominator) => `${numerator}/${denominator}`),
    words: ['°c', 'degc'].map((denominator) => `${numerator.toLowerCase()}/${denominator}`),
  });
}

const fraction = unit('', { symbols: [] });
const perKelvinPlain = perKelvin('', 0);

export const UNIT_TABLE: Readonly<Record<QuantityKind, KindUnits>> = {
  voltage: single(unit('V', { prefixable: true, symbols: ['V', 'v'], words: ['volt', 'volts'] })),
  current: single(
    unit('A', { prefixable: true, symbols: ['A', 'a'], words: ['amp', 'amps', 'ampere', 'amperes'] }),
  ),
  resistance: single(
    unit('Ω', { prefixable: true, words: ['ohm', 'ohms'] }),
    // "100R" as printed on resistors; not prefixable ("4k7" already means 4.7 kΩ).
    unit('Ω', { symbols: ['R'] }),
  ),
  capacitance: single(
    unit('F', { prefixable: true, words: ['farad', 'farads'], afterPrefix: ['f'] }),
  ),
  inductance: single(
    unit('H', { prefixable: true, symbols: ['H', 'h'], words: ['henry', 'henries', 'henrys'] }),
  ),
  charge: single(unit('C', { prefixable: true, words: ['coulomb', 'coulombs'], afterPrefix: ['c'] })),
  energy: single(unit('J', { prefixable: true, symbols: ['J', 'j'], words: ['joule', 'joules'] })),
  power: single(unit('W', { prefixable: true, symbols: ['W', 'w'], words: ['watt', 'watts'] })),
  time: single(
    unit('s', { prefixable: true, words: ['sec', 'secs', 'second', 'seconds'] }),
  ),
  frequency: single(unit('Hz', { prefixable: true, symbols: [], words: ['hz', 'hertz'] })),
  temperature: single(
    unit('°C', { offset: CELSIUS_OFFSET, symbols: CELSIUS_SYMBOLS, words: CELSIUS_WORDS }),
    unit('K', { words: ['kelvin'] }),
  ),
  'temperature-difference': single(
    unit('K', { words: ['kelvin'] }),
    unit('°C', { symbols: CELSIUS_SYMBOLS, words: CELSIUS_WORDS }),
  ),
  'thermal-resistance': single(
    unit('K/W', { symbols: ['K/W'] }),
    unit('°C/W', { symbols: ['°C/W', 'C/W'], words: ['°c/w', 'degc/w'] }),
  ),
  ratio: {
    units: [
      unit('%', { exponent: -2, words: ['percent'] }),
      unit('ppm', { exponent: -6, symbols: [], words: ['ppm'] }),
    ],
    bare: fraction,
  },
  tempco: {
    units: [perKelvin('%', -2), perKelvin('ppm', -6), perKelvinPlain, perKelvin('1', 0)],
    bare: perKelvinPlain,
  },
};
