import type { ApprovalState, Lifecycle, PartKind } from '../../parts/index.js';

/** Where a term sits in the typed text, so a UI can underline it. `end` is exclusive. */
export interface TermSpan {
  readonly term: string;
  readonly start: number;
  readonly end: number;
}

/** Free text: must appear in the part number, maker, package, kind or description. */
export interface QueryWord extends TermSpan {
  /** Letters and digits only, as compared: "KTR-1A" → "KTR1A" (see search-text.ts). */
  readonly text: string;
  readonly isNegated: boolean;
}

/** A numeric field inside an interval; a bound left out is open. SI units. */
export interface NumberFilter extends TermSpan {
  readonly type: 'number';
  readonly field: string;
  readonly key: string;
  readonly min?: number;
  readonly max?: number;
  readonly isMinExclusive: boolean;
  readonly isMaxExclusive: boolean;
  readonly isNegated: boolean;
}

/** One of several values; several values mean any of them. */
export type ChoiceFilter = TermSpan & { readonly isNegated: boolean } & (
    | { readonly type: 'kind'; readonly values: readonly PartKind[] }
    | { readonly type: 'approval'; readonly values: readonly ApprovalState[] }
    | { readonly type: 'lifecycle'; readonly values: readonly Lifecycle[] }
    /** Canonical package names (or the text as typed for a package the program does not know). */
    | { readonly type: 'package'; readonly values: readonly string[] }
    /** Squashed, lower case; a part matches when its squashed maker name contains one. */
    | { readonly type: 'maker'; readonly values: readonly string[] }
    /** Second-source group names, compared ignoring case. */
    | { readonly type: 'group'; readonly values: readonly string[] }
  );

export type QueryFilter = NumberFilter | ChoiceFilter;

export interface SearchQuery {
  readonly words: readonly QueryWord[];
  readonly filters: readonly QueryFilter[];
}

export type QueryIssueCode =
  | 'unknown-field'
  | 'missing-field'
  | 'bad-operator'
  | 'bad-value'
  | 'empty-range'
  | 'unclosed-quote'
  | 'empty-term';

export interface QueryIssue extends TermSpan {
  readonly code: QueryIssueCode;
  readonly message: string;
}

export type ParseQueryResult = { ok: true; query: SearchQuery } | { ok: false; issues: QueryIssue[] };
