import { Box } from 'ink';
import { useMemo, useState } from 'react';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { ScrollView, maxOffset } from '../components/scroll-view.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import type { ScreenCommand } from '../keys.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { derivationLines, positionSummary, safetyCautions, sessionSteps } from '../views/position-doc.js';
import type { ScreenProps } from './screen-props.js';

export interface PositionScreenProps extends ScreenProps {
  readonly session: PositionSession;
}

/** Two columns from this width: limits on the left, the derivation on the right. */
const TWO_COLUMNS = 160;

/** The solved position: operating point, limits with reasons, cautions and the derivation. */
export function PositionScreen({ session, width, height, isActive }: PositionScreenProps) {
  const nav = useNavigator();
  const [offset, setOffset] = useState(0);
  const isSolved = session.result.ok;
  const isNew = session.draft.origin === null;
  const commands: ScreenCommand[] = [
    ...(isSolved ? ([['select', 'candidates: rank the catalog']] as const) : []),
    ['down', 'scroll down'],
    ['up', 'scroll up'],
    'pageDown',
    'pageUp',
    ...(isNew ? (['write'] as const) : []),
    'edit',
    ['back', 'back: to the form'],
  ];
  const safety = safetyCautions(session);
  const isTwo = width >= TWO_COLUMNS;
  const leftWidth = isTwo ? Math.floor(width / 2) - 1 : width;
  const rightWidth = isTwo ? width - leftWidth - 2 : width;
  const summary = useMemo(() => positionSummary(session, leftWidth), [session, leftWidth]);
  const steps = useMemo(() => derivationLines(sessionSteps(session), rightWidth), [session, rightWidth]);
  const single = useMemo(() => [...summary, [], ...steps], [summary, steps]);
  const body = height - frameRows(width, safety, true);
  // Side by side, both columns scroll together until the shorter one has shown its end.
  const scrolled = isTwo ? (steps.length >= summary.length ? steps : summary) : single;
  const last = maxOffset(scrolled.length, body);
  const leftOffset = Math.min(offset, maxOffset(summary.length, body));
  const page = Math.max(1, body - 3);

  useKeys({ isActive, commands }, (command) => {
    const by = command === 'down' ? 1 : command === 'up' ? -1 : command === 'pageDown' ? page : command === 'pageUp' ? -page : 0;
    if (by !== 0) setOffset((o) => Math.min(last, Math.max(0, o + by)));
    else if (command === 'select' && isSolved) nav.push({ name: 'candidates', session });
    else if (command === 'write' && isNew) nav.push({ name: 'assign', session, part: null });
    else if (command === 'edit' || command === 'back') nav.back();
  });

  return (
    <ScreenFrame
      title={sessionTitle(session)}
      width={width}
      height={height}
      commands={commands}
      safety={safety}
      isSafetyFull
      about="The limits every part must meet at this position, each with its reason; the derivation shows every formula with its numbers and source."
    >
      {isTwo ? (
        <Box flexDirection="row">
          <Box width={leftWidth} marginRight={2} flexDirection="column">
            <ScrollView lines={summary} offset={leftOffset} height={body} />
          </Box>
          <Box width={rightWidth} flexDirection="column">
            <ScrollView lines={steps} offset={offset} height={body} />
          </Box>
        </Box>
      ) : (
        <ScrollView lines={single} offset={offset} height={body} />
      )}
    </ScreenFrame>
  );
}
