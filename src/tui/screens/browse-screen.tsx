import { Box, Text, useInput } from 'ink';
import { useReducer } from 'react';
import { describePart, safeText, type Part } from '../../parts/index.js';
import { WindowedList } from '../components/windowed-list.js';
import { PartRow, PartRowHeader } from '../components/part-row.js';
import { usePartSearch, type PartSearch } from '../hooks/use-part-search.js';
import { useTheme } from '../hooks/use-theme.js';
import { commandFor, helpLine } from '../keys.js';
import { browseReducer, initialBrowseState } from '../state/browse-state.js';

export interface BrowseScreenProps {
  readonly parts: readonly Part[];
  readonly catalogLabel: string;
  readonly width: number;
  readonly height: number;
  readonly onQuit: () => void;
  /** @default substringSearch */
  readonly search?: PartSearch;
}

/** Browse and search the catalog; Enter shows every rating of the selected part. */
export function BrowseScreen({ parts, catalogLabel, width, height, onQuit, search }: BrowseScreenProps) {
  const theme = useTheme();
  const [state, dispatch] = useReducer(browseReducer, initialBrowseState);
  const found = usePartSearch(parts, state.query, search);
  const page = Math.max(1, height - 7);

  useInput((input, key) => {
    const command = commandFor(input, key);
    if (command === 'quit') return onQuit();
    if (command === 'up') return dispatch({ type: 'move', by: -1, count: found.length });
    if (command === 'down') return dispatch({ type: 'move', by: 1, count: found.length });
    if (command === 'pageUp') return dispatch({ type: 'move', by: -page, count: found.length });
    if (command === 'pageDown') return dispatch({ type: 'move', by: page, count: found.length });
    if (command === 'open') return dispatch({ type: 'open', count: found.length });
    if (command === 'back') return dispatch({ type: 'back' });
    if (key.backspace || key.delete) return dispatch({ type: 'erase' });
    if (input && !key.ctrl && !key.meta) dispatch({ type: 'type', text: input });
  });

  const open = state.openIndex !== null ? found[state.openIndex] : undefined;
  return (
    <Box flexDirection="column" width={width}>
      <Text>
        <Text bold color={theme.accent}>Headroom</Text>
        <Text color={theme.muted}> · catalog {catalogLabel} · {parts.length} parts</Text>
      </Text>
      {open ? (
        <PartDetail part={open} />
      ) : (
        <>
          <Text>
            Search: {state.query}
            <Text inverse> </Text>
            <Text color={theme.muted}>  {found.length} shown</Text>
          </Text>
          {parts.length === 0 ? (
            <Text color={theme.warn}>The catalog is empty. Import parts with `headroom catalog import FILE.csv`.</Text>
          ) : found.length === 0 ? (
            <Text color={theme.warn}>Nothing matches "{safeText(state.query)}". Esc clears the search.</Text>
          ) : (
            <>
            <PartRowHeader width={width} />
            <WindowedList
              items={found}
              cursor={state.cursor}
              height={page}
              keyOf={(p) => `${p.manufacturer}\u0000${p.partNumber}`}
              renderItem={(p, isSelected) => <PartRow part={p} isSelected={isSelected} width={width} />}
            />
            </>
          )}
        </>
      )}
      <Text color={theme.muted}>
        {open ? helpLine(['back', 'quit']) : `type to search  ·  ${helpLine(['move', 'open', 'back', 'quit'])}`}
      </Text>
    </Box>
  );
}

function PartDetail({ part }: { readonly part: Part }) {
  const theme = useTheme();
  const rows = describePart(part);
  return (
    <Box flexDirection="column" marginY={1}>
      <Text bold>
        {safeText(part.manufacturer)} {safeText(part.partNumber)}
      </Text>
      {rows.map((r, i) => (
        <Text key={i}>
          <Text color={r.section === 'ratings' ? theme.accent : theme.muted}>{r.label.padEnd(20)}</Text>
          {safeText(r.value)}
        </Text>
      ))}
    </Box>
  );
}
