import { Box, Text } from 'ink';
import { useState } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import { ScreenFrame } from '../components/screen-frame.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useTheme } from '../hooks/use-theme.js';
import type { ScreenCommand } from '../keys.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { wrap } from '../text/fit.js';
import { safetyCautions } from '../views/position-doc.js';
import { NewPositionForm } from './new-position-form.js';
import type { ScreenProps } from './screen-props.js';

export interface AssignScreenProps extends ScreenProps {
  readonly session: PositionSession;
  /** The part chosen; null saves the position without one. */
  readonly part: Part | null;
}

/** "MAKER:PART", the form a design file's `part:` takes. */
export const partReference = (part: Part) => `${part.manufacturer}:${part.partNumber}`;

const CONFIRM: readonly ScreenCommand[] = [['select', 'write: part into the design file'], ['back', 'cancel']];
const DONE: readonly ScreenCommand[] = [['select', 'done: back to the design'], ['back', 'back: to the part']];

/** Writes the chosen part into the position's design file, or saves a new position in one. */
export function AssignScreen(props: AssignScreenProps) {
  if (props.session.draft.origin === null) return <NewPositionForm {...props} />;
  return <AssignToDesign {...props} />;
}

function AssignToDesign({ session, part, width, height, isActive }: AssignScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { designs } = useServices();
  const origin = session.draft.origin!;
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const isDone = outcome?.ok === true;
  const reference = part ? partReference(part) : '';
  useKeys({ isActive, commands: isDone ? DONE : CONFIRM }, (command) => {
    if (command === 'back') return nav.back();
    if (command !== 'select') return;
    if (isDone) return nav.backTo('open-design');
    if (!part) return;
    const r = designs.assignPart(origin.path, origin.ref, reference);
    setOutcome(r.ok ? { ok: true, message: `${origin.ref} in ${r.value} now reads  part: ${reference}` } : { ok: false, message: r.message });
  });
  const rows: [string, string][] = [
    ['Design file', origin.path],
    ['Position', `${origin.ref} · ${session.role.title}`],
    ['Part', safeText(reference)],
    ['Replaces', origin.part ? safeText(origin.part) : '(no part assigned yet)'],
  ];
  const lines = rows.flatMap(([label, value]) => wrap(`${label.padEnd(13)}${value}`, width - 2, 13));
  return (
    <ScreenFrame title={`${sessionTitle(session)} › assign`} width={width} height={height} commands={isDone ? DONE : CONFIRM} safety={safetyCautions(session)}>
      <Box flexDirection="column" paddingLeft={1}>
        {lines.map((line, i) => (
          <Text key={i}>{line}</Text>
        ))}
        <Text> </Text>
        {outcome === null
          ? wrap('Enter writes `part:` into this position and saves the file. Everything else in the file, comments included, stays as it is.', width - 2).map((l, i) => (
              <Text key={`h${i}`} color={theme.muted}>
                {l}
              </Text>
            ))
          : wrap(`${outcome.ok ? '✓ Saved.' : '✗ Not saved:'} ${outcome.message}`, width - 2, 2).map((l, i) => (
              <Text key={`o${i}`} color={outcome.ok ? theme.good : theme.bad}>
                {l}
              </Text>
            ))}
      </Box>
    </ScreenFrame>
  );
}
