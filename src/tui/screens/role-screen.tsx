import { Box, Text } from 'ink';
import { ROLES } from '../../circuits/registry.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import type { ScreenCommand } from '../keys.js';
import { emptyDraft } from '../state/position-draft.js';
import { fit, wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const COMMANDS: readonly ScreenCommand[] = [['up', 'previous role'], ['down', 'next role'], ['select', 'choose: fill in its conditions'], 'back'];

/** Which circuit role the diode plays: a list with the selected role's summary and inputs below. */
export function RoleScreen({ width, height, isActive }: ScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const [cursor, setCursor, getCursor] = useSyncState(0);
  useKeys({ isActive, commands: COMMANDS }, (command) => {
    if (command === 'up') setCursor((c) => Math.max(0, c - 1));
    else if (command === 'down') setCursor((c) => Math.min(ROLES.length - 1, c + 1));
    else if (command === 'select') nav.push({ name: 'form', draft: emptyDraft(ROLES[getCursor()]!.id) });
    else if (command === 'back') nav.back();
  });
  const role = ROLES[cursor]!;
  const body = height - frameRows(width);
  const listRows = Math.min(ROLES.length, Math.max(3, body - 8));
  const summary = wrap(role.summary, width - 4);
  const inputs = wrap(`Conditions: ${role.inputs.map((i) => i.label).join(', ')}`, width - 4);
  const detail = [...summary, ...inputs].slice(0, Math.max(1, body - listRows - 3));
  return (
    <ScreenFrame title="New position › choose the circuit role" width={width} height={height} commands={COMMANDS}>
      <WindowedList
        items={ROLES}
        cursor={cursor}
        height={listRows}
        keyOf={(r) => r.id}
        renderItem={(r, isSelected) => (
          <Text inverse={isSelected} wrap="truncate-end">
            {fit(`${isSelected ? '›' : ' '} ${r.title}`, Math.min(40, width - 18) - 1)}{' '}
            <Text color={isSelected ? undefined : theme.muted}>{r.id}</Text>
          </Text>
        )}
      />
      <Box flexDirection="column" paddingLeft={2}>
        {detail.map((line, i) => (
          <Text key={i} color={i < summary.length ? undefined : theme.muted}>
            {line}
          </Text>
        ))}
      </Box>
    </ScreenFrame>
  );
}
