import { Box, Text } from 'ink';
import { useMemo, useState } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import { FormRow } from '../components/form-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { StyledText } from '../components/styled-text.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer, useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { approvalRows, checkApproval } from '../state/approval-form.js';
import { cycleOption, formReducer, initialForm } from '../state/form-state.js';
import { wrap } from '../text/fit.js';
import { partDoc } from '../views/part-doc.js';
import type { ScreenProps } from './screen-props.js';

export interface ApprovalScreenProps extends ScreenProps {
  readonly part: Part;
}

const COMMANDS: readonly ScreenCommand[] = [
  ['select', 'save: the change'],
  ['cycleNext', 'next state'],
  ['cyclePrev', 'previous state'],
  ['down', 'next field'],
  ['up', 'previous field'],
  'erase',
  'clearField',
  ['back', 'back: to the part'],
];

/** Changes a part's approval state with a reason (and the condition of a conditional approval). */
export function ApprovalScreen({ part: given, width, height, isActive }: ApprovalScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { catalog, user } = useServices();
  const [form, dispatch, getForm] = useSyncReducer(formReducer, () => initialForm({ state: given.approval, condition: given.approvalNote ?? '' }));
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const [part, setPart, getPart] = useSyncState(given);
  const rows = approvalRows(form.values.state ?? part.approval);
  const cursor = Math.min(form.cursor, rows.length - 1);
  const row = rows[cursor]!;
  const check = checkApproval(form.values, part.approval);
  const history = useMemo(() => catalog.history(part), [catalog, part]);
  const trail = useMemo(() => {
    const lines = partDoc(part, history, width);
    return lines.slice(lines.findIndex((l) => l[0]?.text.startsWith('APPROVAL TRAIL')));
  }, [part, history, width]);

  useKeys({ isActive, isTyping: () => !approvalRows(getForm().values.state ?? '')[getForm().cursor]?.options, commands: COMMANDS }, (command, input, key) => {
    const latest = getForm();
    const rows = approvalRows(latest.values.state ?? given.approval);
    const row = rows[Math.min(latest.cursor, rows.length - 1)]!;
    const part = getPart();
    const check = checkApproval(latest.values, part.approval);
    if (command === 'up') dispatch({ type: 'move', by: -1, count: rows.length });
    else if (command === 'down' || command === 'nextField') dispatch({ type: 'move', by: 1, count: rows.length });
    else if ((command === 'cycleNext' || command === 'cyclePrev') && row.options) {
      dispatch({ type: 'set', name: row.name, value: cycleOption(row.options, latest.values[row.name] ?? '', command === 'cycleNext' ? 1 : -1) });
    } else if (command === 'erase') dispatch({ type: 'erase', name: row.name });
    else if (command === 'clearField') dispatch({ type: 'clear', name: row.name });
    else if (command === 'back') nav.back();
    else if (command === 'select') {
      dispatch({ type: 'attempt' });
      if (!check.ok) return;
      const r = catalog.changeApproval(part, check.change);
      setOutcome(r.ok ? { ok: true, message: `${safeText(part.partNumber)} is now ${r.value.approval}${r.value.approvalNote ? ` (${safeText(r.value.approvalNote)})` : ''}, recorded as changed by ${user}.` } : { ok: false, message: r.message });
      if (r.ok) setPart(r.value);
    } else if (command === undefined && !row.options) dispatch({ type: 'type', name: row.name, text: typedText(input, key) });
  });

  const body = height - frameRows(width);
  const intro = wrap(`${safeText(part.manufacturer)} ${safeText(part.partNumber)} is ${part.approval}${part.approvalNote ? ` (${safeText(part.approvalNote)})` : ''}. Every change is kept in its trail with your reason.`, width - 2);
  const outcomeLines = outcome ? wrap(`${outcome.ok ? '✓' : '✗'} ${outcome.message}`, width - 2, 2) : [];
  const focusError = form.hasAttempted && !check.ok ? check.errors[row.name] : undefined;
  const errorLines = focusError ? wrap(`✗ ${focusError}`, width - 2, 2) : [];
  const trailRows = Math.max(0, body - intro.length - rows.length - outcomeLines.length - errorLines.length - 2);
  return (
    <ScreenFrame title={`Catalog › ${safeText(part.partNumber)} › approval`} width={width} height={height} commands={COMMANDS}>
      <Box flexDirection="column">
        {intro.map((l, i) => (
          <Text key={`i${i}`} color={theme.muted}>
            {l}
          </Text>
        ))}
        <Text> </Text>
        {rows.map((r, i) => {
          const error = form.hasAttempted && !check.ok ? check.errors[r.name] : undefined;
          return (
            <FormRow
              key={r.name}
              label={r.label}
              value={form.values[r.name] ?? ''}
              placeholder={r.name === 'reason' ? 'required, e.g. "qualified on the FC-M24 board"' : 'required for conditional'}
              isFocused={i === cursor}
              isChoice={r.options !== undefined}
              isRequired
              {...(error ? { error } : {})}
              width={width}
            />
          );
        })}
        {errorLines.map((l, i) => (
          <Text key={`e${i}`} color={theme.bad}>
            {l}
          </Text>
        ))}
        {outcomeLines.map((l, i) => (
          <Text key={`o${i}`} color={outcome?.ok ? theme.good : theme.bad}>
            {l}
          </Text>
        ))}
        <Text> </Text>
        {[...trail.slice(0, 1), ...trail.slice(1).slice(-Math.max(0, trailRows - 1))].slice(0, trailRows).map((line, i) => (
          <StyledText key={`t${i}`} line={line} />
        ))}
      </Box>
    </ScreenFrame>
  );
}
