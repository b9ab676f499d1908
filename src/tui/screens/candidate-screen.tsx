import { useMemo, useState } from 'react';
import type { RankedCandidate } from '../../selection/index.js';
import { safeText } from '../../parts/index.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { ScrollView, maxOffset } from '../components/scroll-view.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import type { ScreenCommand } from '../keys.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { samePart } from '../state/substitution.js';
import { candidateDoc } from '../views/candidate-doc.js';
import { safetyCautions } from '../views/position-doc.js';
import type { ScreenProps } from './screen-props.js';

export interface CandidateScreenProps extends ScreenProps {
  readonly session: PositionSession;
  readonly candidate: RankedCandidate;
}

const COMMANDS: readonly ScreenCommand[] = [
  'assign',
  ['substitute', 'replace: compare with the part the position has now (or one you choose), both in this circuit'],
  ['down', 'scroll down'],
  ['up', 'scroll up'],
  'pageDown',
  'pageUp',
  'home',
  'end',
  ['back', 'back: to the candidates'],
];

/** One part at the position: every margin explained, the heat balance, charts against ambient, all ratings. */
export function CandidateScreen({ session, candidate, width, height, isActive }: CandidateScreenProps) {
  const nav = useNavigator();
  const { catalog } = useServices();
  const [offset, setOffset] = useState(0);
  const lines = useMemo(() => candidateDoc(candidate, session, Math.min(width, 120)), [candidate, session, width]);
  const safety = safetyCautions(session);
  const body = height - frameRows(width, safety);
  const last = maxOffset(lines.length, body);
  const page = Math.max(1, body - 3);
  useKeys({ isActive, commands: COMMANDS }, (command) => {
    const by = { down: 1, up: -1, pageDown: page, pageUp: -page, home: -Infinity, end: Infinity }[command as string] ?? 0;
    if (by !== 0) setOffset((o) => Math.min(last, Math.max(0, o + by)));
    else if (command === 'assign') nav.push({ name: 'assign', session, part: candidate.evaluation.part });
    else if (command === 'substitute') {
      const part = candidate.evaluation.part;
      const assigned = session.draft.origin?.part ? catalog.lookup(session.draft.origin.part) : null;
      // The candidate is the part already there: list what could replace it at this position.
      if (assigned && samePart(assigned, part)) nav.push({ name: 'substitute', original: assigned, alternate: null, session });
      else nav.push({ name: 'substitute', original: assigned, alternate: part, session });
    } else if (command === 'back') nav.back();
  });
  const part = candidate.evaluation.part;
  return (
    <ScreenFrame title={`${sessionTitle(session)} › ${safeText(part.partNumber)}`} width={width} height={height} commands={COMMANDS} safety={safety}>
      <ScrollView lines={lines} offset={offset} height={body} />
    </ScreenFrame>
  );
}
