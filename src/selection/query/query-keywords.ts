import {
  APPROVAL_STATES,
  LIFECYCLES,
  PART_KINDS,
  TVS_KINDS,
  findPackage,
  packageKey,
  type ApprovalState,
  type Lifecycle,
  type PartKind,
} from '../../parts/index.js';

/** Letters and digits, lower case: "Fast-Recovery" and "fastrecovery" are one word. */
const wordKey = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, '');

const KIND_WORDS = new Map<string, readonly PartKind[]>([
  ...PART_KINDS.map((k) => [wordKey(k), [k]] as [string, PartKind[]]),
  ['tvs', TVS_KINDS],
  ['sic', ['sic-schottky']],
]);

/** Spellings accepted after `kind=`, for messages. */
export const KIND_SPELLINGS: readonly string[] = [...PART_KINDS, 'tvs', 'sic'];

export function kindsNamed(text: string): readonly PartKind[] | undefined {
  return KIND_WORDS.get(wordKey(text));
}

export function approvalNamed(text: string): ApprovalState | undefined {
  return APPROVAL_STATES.find((s) => s === text.toLowerCase());
}

export function lifecycleNamed(text: string): Lifecycle | undefined {
  return LIFECYCLES.find((s) => s === text.toLowerCase());
}

/** Canonical name of a package the program knows, in any spelling ("sod123", "DO-214AC"). */
export function packageNamed(text: string): string | undefined {
  return packageKey(text) === '' ? undefined : findPackage(text)?.name;
}

export type Keyword =
  | { type: 'kind'; values: readonly PartKind[] }
  | { type: 'package'; values: readonly string[] }
  | { type: 'approval'; values: readonly ApprovalState[] }
  | { type: 'lifecycle'; values: readonly Lifecycle[] };

/** A bare word that is exactly a kind, a known package or a state acts as that filter. */
export function keywordFilter(word: string): Keyword | undefined {
  const kinds = kindsNamed(word);
  if (kinds) return { type: 'kind', values: kinds };
  const pkg = packageNamed(word);
  if (pkg) return { type: 'package', values: [pkg] };
  const approval = approvalNamed(word);
  if (approval) return { type: 'approval', values: [approval] };
  const lifecycle = lifecycleNamed(word);
  if (lifecycle) return { type: 'lifecycle', values: [lifecycle] };
  return undefined;
}
