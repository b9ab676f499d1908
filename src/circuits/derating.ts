
/**
 * A derating policy: how much of each rating a design may use. Policies are data so a team
 * can define its own; each factor names its source, or says it is common practice.
 */
export interface DeratingFactor {
  /** Fraction of the rating that may be used (0 < value ≤ 1). */
  readonly value: number;
  readonly source: string;
}

export interface DeratingPolicy {
  readonly id: string;
  readonly name: string;
  readonly description: string;
  readonly factors: {
    /** Worst reverse voltage ≤ factor × VRRM (or × VRWM's margin for TVS stand-off). */
    readonly vrrm: DeratingFactor;
    readonly ifAv: DeratingFactor;
    readonly ifsm: DeratingFactor;
    /** Zener and other steady dissipation ratings. */
    readonly pd: DeratingFactor;
    /** TVS peak pulse power. */
    readonly pppm: DeratingFactor;
  };
  /** Junction temperature ceiling: the lower of an absolute ceiling and Tj max less a margin. */
  readonly tj: {
    readonly ceilingK?: number;
    readonly marginBelowMaxK: number;
    readonly source: string;
  };
}

const C = 273.15;
const PRACTICE = 'common practice';

export const BUILT_IN_POLICIES: readonly DeratingPolicy[] = [
  {
    id: 'commercial',
    name: 'Commercial',
    description: 'Consumer and light commercial products: usual trade margins.',
    factors: {
      vrrm: { value: 0.8, source: `${PRACTICE} (VR ≤ 80 % of VRRM)` },
      ifAv: { value: 0.9, source: PRACTICE },
      ifsm: { value: 0.8, source: PRACTICE },
      pd: { value: 0.8, source: PRACTICE },
      pppm: { value: 0.8, source: PRACTICE },
    },
    tj: { marginBelowMaxK: 25, source: `${PRACTICE} (Tj at least 25 °C below Tj max)` },
  },
  {
    id: 'industrial',
    name: 'Industrial',
    description: 'Long-life industrial equipment: Reliability Analysis Center benign-environment limits.',
    factors: {
      vrrm: { value: 0.8, source: 'Reliability Analysis Center, Electronic Derating for Optimum Performance, diodes: VR 80 % (benign)' },
      ifAv: { value: 0.9, source: 'Reliability Analysis Center, Electronic Derating for Optimum Performance, diodes: IF 90 %' },
      ifsm: { value: 0.7, source: PRACTICE },
      pd: { value: 0.7, source: PRACTICE },
      pppm: { value: 0.7, source: PRACTICE },
    },
    tj: {
      ceilingK: 115 + C,
      marginBelowMaxK: 25,
      source: 'Reliability Analysis Center, Electronic Derating for Optimum Performance, diodes: Tj 115 °C (benign)',
    },
  },
  {
    id: 'high-reliability',
    name: 'High reliability',
    description: 'Space, medical and safety-critical work: NASA EEE-INST-002 diode derating.',
    factors: {
      vrrm: { value: 0.7, source: 'NASA EEE-INST-002, diodes: PIV 70 % (from memory)' },
      ifAv: { value: 0.5, source: 'NASA EEE-INST-002, diodes: average forward current 50 % (from memory)' },
      ifsm: { value: 0.5, source: 'NASA EEE-INST-002, diodes: surge current 50 % (from memory)' },
      pd: { value: 0.5, source: 'NASA EEE-INST-002, Zener power 50 % (from memory)' },
      pppm: { value: 0.5, source: 'NASA EEE-INST-002, transient suppressor peak pulse power 50 % (from memory)' },
    },
    tj: {
      ceilingK: 125 + C,
      marginBelowMaxK: 40,
      source: 'NASA EEE-INST-002, diodes: Tj ≤ 125 °C or Tj max − 40 °C, whichever is lower (from memory)',
    },
  },
];

export const DEFAULT_POLICY_ID = 'commercial';

/** The Tj a part may reach under a policy. */
export function tjCeilingK(policy: DeratingPolicy, tjMaxK: number): number {
  const byMargin = tjMaxK - policy.tj.marginBelowMaxK;
  return policy.tj.ceilingK === undefined ? byMargin : Math.min(policy.tj.ceilingK, byMargin);
}

export function findPolicy(id: string, extra: readonly DeratingPolicy[] = []): DeratingPolicy | undefined {
  return [...extra, ...BUILT_IN_POLICIES].find((p) => p.id === id);
}
