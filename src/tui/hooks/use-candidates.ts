import { useEffect, useState } from 'react';
import type { CandidateSearch } from '../../catalog/candidates.js';
import type { CatalogService } from '../services.js';
import type { PositionSession } from '../state/position-draft.js';

export type CandidatesState =
  | { readonly status: 'ranking' }
  | { readonly status: 'ready'; readonly search: CandidateSearch }
  | { readonly status: 'failed'; readonly message: string };

/** Rankings already made, per solved position: going back and forth never ranks twice. */
const made = new WeakMap<PositionSession, CandidateSearch>();

/**
 * The ranked candidates of a position, read from the catalog once. The ranking runs after the
 * first frame ("ranking …") is on screen, since a large catalog takes up to about a second.
 */
export function useCandidates(session: PositionSession, catalog: CatalogService): CandidatesState {
  const cached = made.get(session);
  const [state, setState] = useState<CandidatesState>(cached ? { status: 'ready', search: cached } : { status: 'ranking' });
  useEffect(() => {
    if (state.status !== 'ranking' || !session.result.ok) return;
    const position = session.result.position;
    let isCurrent = true;
    const timer = setTimeout(() => {
      catalog.candidates(position, session.policy).then(
        (search) => {
          made.set(session, search);
          if (isCurrent) setState({ status: 'ready', search });
        },
        (error: unknown) => {
          if (isCurrent) setState({ status: 'failed', message: (error as Error).message });
        },
      );
    }, 0);
    return () => {
      isCurrent = false;
      clearTimeout(timer);
    };
  }, [session, catalog, state.status]);
  return state;
}
