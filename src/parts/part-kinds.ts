/** Diode kinds the catalog knows. The values are stored and exported, so they never change. */
export const PART_KINDS = [
  'rectifier',
  'fast-recovery',
  'ultrafast',
  'schottky',
  'sic-schottky',
  'zener',
  'tvs-uni',
  'tvs-bi',
  'signal',
] as const;
export type PartKind = (typeof PART_KINDS)[number];

/** Rectifying kinds block in reverse and must stay below breakdown; the others work in breakdown. */
export const RECTIFYING_KINDS = [
  'rectifier',
  'fast-recovery',
  'ultrafast',
  'schottky',
  'sic-schottky',
  'signal',
] as const satisfies readonly PartKind[];
export type RectifyingKind = (typeof RECTIFYING_KINDS)[number];

export const TVS_KINDS = ['tvs-uni', 'tvs-bi'] as const satisfies readonly PartKind[];

export const KIND_LABELS: Record<PartKind, string> = {
  rectifier: 'standard rectifier',
  'fast-recovery': 'fast-recovery rectifier',
  ultrafast: 'ultrafast rectifier',
  schottky: 'Schottky',
  'sic-schottky': 'SiC Schottky',
  zener: 'Zener',
  'tvs-uni': 'TVS, unidirectional',
  'tvs-bi': 'TVS, bidirectional',
  signal: 'small-signal switching',
};

export function isRectifying(kind: PartKind): kind is RectifyingKind {
  return (RECTIFYING_KINDS as readonly PartKind[]).includes(kind);
}

export function isTvs(kind: PartKind): boolean {
  return kind === 'tvs-uni' || kind === 'tvs-bi';
}

/**
 * Ratings a part of each kind must give (part-schema.ts enforces them; tests/parts hold the two
 * together). A plain list, so ranking can rely on them without building the validation schemas.
 */
const REQUIRED_RATINGS = {
  rectifying: ['vrrmV', 'ifAvA', 'tjMaxK', 'vfPoints'],
  zener: ['vzV', 'vzTol', 'iztA', 'pdW', 'tjMaxK'],
  tvs: ['vrwmV', 'vbrMinV', 'vcV', 'ippA', 'pppmW', 'pppmRiseS', 'pppmDecayS', 'tjMaxK'],
} as const;

export function requiredRatings(kind: PartKind): readonly string[] {
  return isRectifying(kind) ? REQUIRED_RATINGS.rectifying : kind === 'zener' ? REQUIRED_RATINGS.zener : REQUIRED_RATINGS.tvs;
}

/** Junction family, which decides the leakage and recovery models. */
export function junctionFamily(kind: PartKind): 'pn' | 'schottky' | 'sic' {
  if (kind === 'schottky') return 'schottky';
  if (kind === 'sic-schottky') return 'sic';
  return 'pn';
}

export const LIFECYCLES = ['active', 'nrnd', 'obsolete'] as const;
export type Lifecycle = (typeof LIFECYCLES)[number];
export const LIFECYCLE_LABELS: Record<Lifecycle, string> = {
  active: 'active',
  nrnd: 'not recommended for new designs',
  obsolete: 'obsolete',
};

/** The team's own approval states, separate from the maker's lifecycle. */
export const APPROVAL_STATES = ['preferred', 'approved', 'conditional', 'pending', 'banned'] as const;
export type ApprovalState = (typeof APPROVAL_STATES)[number];
export const APPROVAL_LABELS: Record<ApprovalState, string> = {
  preferred: 'preferred',
  approved: 'approved',
  conditional: 'approved with a condition',
  pending: 'pending review',
  banned: 'banned',
};

export const RATING_REFERENCE_POINTS = ['ambient', 'lead', 'case'] as const;
export type RatingReferencePoint = (typeof RATING_REFERENCE_POINTS)[number];
