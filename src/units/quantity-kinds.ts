export type QuantityKind =
  | 'voltage'
  | 'current'
  | 'resistance'
  | 'capacitance'
  | 'inductance'
  | 'charge'
  | 'energy'
  | 'power'
  | 'time'
  | 'frequency'
  | 'temperature'
  | 'temperature-difference'
  | 'thermal-resistance'
  | 'ratio'
  | 'tempco';

export interface KindDescription {
  /** With its article, ready for "expected a current". */
  noun: string;
  /** The unit values are shown in (°C for temperature, % for ratio), not necessarily SI. */
  unit: string;
  /** Accepted spellings, shown to the user in error messages. */
  examples: string[];
}

const DESCRIPTIONS: Readonly<Record<QuantityKind, KindDescription>> = {
  voltage: { noun: 'a voltage', unit: 'V', examples: ['600 V', '2 kV', '5V1'] },
  current: { noun: 'a current', unit: 'A', examples: ['1.5 A', '500 mA', '4m7'] },
  resistance: { noun: 'a resistance', unit: 'Ω', examples: ['10 kΩ', '4k7', 'R47'] },
  capacitance: { noun: 'a capacitance', unit: 'F', examples: ['220 µF', '150 pF', '4n7'] },
  inductance: { noun: 'an inductance', unit: 'H', examples: ['10 µH', '2.2 mH', '4u7'] },
  charge: { noun: 'a charge', unit: 'C', examples: ['3 nC', '50 µC'] },
  energy: { noun: 'an energy', unit: 'J', examples: ['45 mJ', '1.2 J'] },
  power: { noun: 'a power', unit: 'W', examples: ['600 W', '1.5 kW', '500 mW'] },
  time: { noun: 'a time', unit: 's', examples: ['8.3 ms', '10 µs', '1 s'] },
  frequency: { noun: 'a frequency', unit: 'Hz', examples: ['50 Hz', '100 kHz', '2 MHz'] },
  temperature: { noun: 'a temperature', unit: '°C', examples: ['85 °C', '-40 °C', '300 K'] },
  'temperature-difference': {
    noun: 'a temperature difference',
    unit: 'K',
    examples: ['10 K', '40 °C'],
  },
  'thermal-resistance': {
    noun: 'a thermal resistance',
    unit: '°C/W',
    examples: ['62 °C/W', '62 K/W'],
  },
  ratio: { noun: 'a ratio', unit: '%', examples: ['5 %', '0.8'] },
  tempco: {
    noun: 'a temperature coefficient',
    unit: '%/K',
    examples: ['0.06 %/K', '600 ppm/K', '6e-4 /K'],
  },
};

export const QUANTITY_KINDS: readonly QuantityKind[] = Object.keys(DESCRIPTIONS) as QuantityKind[];

export function describeKind(kind: QuantityKind): KindDescription {
  const description = DESCRIPTIONS[kind];
  return { noun: description.noun, unit: description.unit, examples: [...description.examples] };
}

/** The accepted form, e.g. 'a current such as "1.5 A", "500 mA" or "4m7"'. */
export function expectedForm(kind: QuantityKind): string {
  const { noun, examples } = DESCRIPTIONS[kind];
  return `${noun} such as ${listExamples(examples)}`;
}

export function listExamples(examples: readonly string[]): string {
  const quoted = examples.map((example) => `"${example}"`);
  if (quoted.length <= 1) return quoted.join('');
  return `${quoted.slice(0, -1).join(', ')} or ${quoted[quoted.length - 1]}`;
}
