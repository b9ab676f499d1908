import type { Part } from '../../parts/index.js';
import type { QueryIssue } from '../../selection/query/index.js';

export interface SearchHit {
  readonly part: Part;
  /** Relevance from 0 to 1: 1 for the exact part number, lower for looser matches. */
  readonly score: number;
  /** 'fuzzy' when no part matched the text exactly and the typo-tolerant search found these. */
  readonly matched: 'exact' | 'fuzzy';
}

export type SearchOutcome =
  | {
      ok: true;
      results: SearchHit[];
      /** Number of matches, given when every match was looked at; absent when there are more than were ranked. */
      total?: number;
      elapsedMs: number;
    }
  | { ok: false; issues: QueryIssue[] };

export interface SearchOptions {
  /** Most results returned. @default 50 */
  readonly limit?: number;
}

export const DEFAULT_LIMIT = 50;
