import { Box, Text } from 'ink';
import { useEffect, useState } from 'react';
import type { Design } from '../../circuits/design-file.js';
import { safeText } from '../../parts/index.js';
import { FormRow } from '../components/form-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { completePath } from '../state/path-completion.js';
import { draftFromPosition } from '../state/position-draft.js';
import { fit, truncate, wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const PATH_KEYS: readonly ScreenCommand[] = [['select', 'read: the design file'], ['nextField', 'complete: the path'], 'erase', 'clearField', ['down', 'positions: move to the list'], 'back'];
const LIST_KEYS: readonly ScreenCommand[] = [['select', 'open: the position in the form'], ['down', 'next position'], ['up', 'previous (from the top: the path)'], 'back'];

/** A design file's path, then its positions; the chosen one opens in the form, pre-filled. */
export function DesignOpenScreen({ width, height, isActive }: ScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { designs } = useServices();
  const [path, setPath, getPath] = useSyncState('');
  const [design, setDesign, getDesign] = useSyncState<Design | null>(null);
  const [isOnList, setOnList, getOnList] = useSyncState(false);
  const [cursor, setCursor, getCursor] = useSyncState(0);
  const [message, setMessage] = useState<string | null>(null);
  const [choices, setChoices] = useState<string[]>([]);

  const load = (typed: string, moveToList: boolean) => {
    const r = designs.read(typed);
    if (!r.ok) {
      setDesign(null);
      setMessage(r.message);
      return;
    }
    setDesign(r.value);
    setMessage(r.value.positions.length === 0 ? 'The design has no positions yet.' : null);
    if (moveToList && r.value.positions.length > 0) setOnList(true);
  };
  // Back from an assignment: read the file again so the positions show their new parts.
  useEffect(() => {
    if (isActive && design) load(path, false);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [isActive]);

  useKeys({ isActive, isTyping: () => !getOnList(), commands: isOnList ? LIST_KEYS : PATH_KEYS }, (command, input, key) => {
    if (command === 'back') return nav.back();
    const design = getDesign();
    const cursor = getCursor();
    if (getOnList()) {
      const count = design?.positions.length ?? 0;
      if (command === 'down') setCursor((c) => Math.min(count - 1, c + 1));
      else if (command === 'up') {
        if (cursor === 0) setOnList(false);
        else setCursor((c) => c - 1);
      } else if (command === 'select' && design) {
        const position = design.positions[cursor]!;
        const draft = draftFromPosition(design, position);
        if (draft) nav.push({ name: 'form', draft });
        else setMessage(`${position.ref}: unknown role "${position.role}"; correct it in the file.`);
      }
      return;
    }
    const path = getPath();
    if (command === 'select') load(path, true);
    else if (command === 'down' && design && design.positions.length > 0) setOnList(true);
    else if (command === 'nextField') {
      const found = designs.complete(path);
      setPath(completePath(path, found));
      setChoices(found.length > 1 ? found : []);
    } else if (command === 'erase') setPath((p) => [...p].slice(0, -1).join(''));
    else if (command === 'clearField') setPath('');
    else if (command === undefined) setPath((p) => p + typedText(input, key));
  });

  const body = height - frameRows(width);
  const messageLines = message ? wrap(message, width - 2, 2).slice(0, 6) : [];
  const choiceLine = !isOnList && choices.length > 0 ? truncate(choices.map((c) => c.slice(c.lastIndexOf('/', c.length - 2) + 1)).join('  '), width) : null;
  const header = design ? wrap(`${safeText(design.name)} · ${design.positions.length} positions${design.policy ? ` · policy ${design.policy}` : ''}`, width) : [];
  const listRows = Math.max(3, body - 5 - messageLines.length - header.length - (choiceLine ? 1 : 0));
  const isWide = width >= 110;
  return (
    <ScreenFrame title="Open a design file" width={width} height={height} commands={isOnList ? LIST_KEYS : PATH_KEYS} about="Type the path of a design file (Tab completes), Enter reads it; choose a position to open it in the form.">
      <FormRow label="Design file" value={path} placeholder="path, e.g. catalog-demo/fc-m24-tiller.yaml" isFocused={!isOnList} width={width} />
      {choiceLine ? <Text color={theme.muted}>{choiceLine}</Text> : null}
      {messageLines.map((l, i) => (
        <Text key={`m${i}`} color={theme.bad}>
          {l}
        </Text>
      ))}
      <Text> </Text>
      {design ? (
        <Box flexDirection="column">
          {header.map((l, i) => (
            <Text key={`h${i}`} bold>
              {l}
            </Text>
          ))}
          <WindowedList
            items={design.positions}
            cursor={isOnList ? cursor : -1}
            height={listRows}
            keyOf={(p) => p.ref}
            renderItem={(p, isSelected) => (
              <Text inverse={isSelected} wrap="truncate-end">
                {fit(`${isSelected ? '›' : ' '} ${p.ref}`, 7)}
                {fit(p.role, 17)}
                <Text color={isSelected ? undefined : p.part ? undefined : theme.muted}>{fit(p.part ? `part ${safeText(p.part)}` : 'no part yet', isWide ? 40 : width - 26)}</Text>
                {isWide ? <Text color={isSelected ? undefined : theme.muted}>{truncate(safeText(p.notes ?? ''), width - 66)}</Text> : null}
              </Text>
            )}
          />
        </Box>
      ) : null}
    </ScreenFrame>
  );
}
