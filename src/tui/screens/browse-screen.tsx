import { Text } from 'ink';
import { useDeferredValue, useMemo } from 'react';
import { safeText } from '../../parts/index.js';
import { PartRow, PartRowHeader } from '../components/part-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList, windowStart } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { browseReducer, initialBrowseState } from '../state/browse-state.js';
import { truncate } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const COMMANDS: readonly ScreenCommand[] = [
  ['select', 'open: ratings, approval trail'],
  ['search', 'search: as you type; Enter or Esc ends typing'],
  'erase',
  'clearField',
  'addPart',
  ['down', 'next part'],
  ['up', 'previous part'],
  'pageDown',
  'pageUp',
  'home',
  'end',
  ['back', 'back: clears the search first'],
];

/**
 * Browse and search the whole catalog. Only the visible page is read: large catalogs page
 * through SQLite (services' pager), so 100 k parts never enter the interface's state.
 */
export function BrowseScreen({ width, height, isActive }: ScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { catalog, queryProblems } = useServices();
  const [state, dispatch, getState] = useSyncReducer(browseReducer, () => initialBrowseState);
  const query = useDeferredValue(state.query);
  const problems = useMemo(() => (query.trim() ? (queryProblems?.(query) ?? []) : []), [query, queryProblems]);
  const body = height - frameRows(width);
  const rows = Math.max(1, body - 4 - Math.min(1, problems.length));
  const pager = catalog.pager();
  const probe = useMemo(() => pager(query, state.cursor, 1), [pager, query, state.cursor]);
  const total = probe.total;
  const cursor = Math.min(state.cursor, Math.max(0, total - 1));
  const start = windowStart(cursor, rows, total);
  const page = useMemo(() => pager(query, start, rows), [pager, query, start, rows]);
  const count = catalog.count();

  useKeys({ isActive, isTyping: () => getState().isSearching, commands: COMMANDS }, (command, input, key) => {
    const latest = getState();
    const latestTotal = latest.query === query ? total : pager(latest.query, latest.cursor, 1).total;
    const move = (by: number) => dispatch({ type: 'move', by, count: latestTotal });
    if (command === 'down') move(1);
    else if (command === 'up') move(-1);
    else if (command === 'pageDown') move(rows);
    else if (command === 'pageUp') move(-rows);
    else if (command === 'home') move(-Infinity);
    else if (command === 'end') move(Infinity);
    else if (latest.isSearching) {
      if (command === 'select' || command === 'back') dispatch({ type: 'endSearch' });
      else if (command === 'erase') dispatch({ type: 'erase' });
      else if (command === 'clearField') dispatch({ type: 'clearSearch' });
      else if (command === undefined) dispatch({ type: 'type', text: typedText(input, key) });
    } else if (command === 'search') dispatch({ type: 'startSearch' });
    else if (command === 'addPart') nav.push({ name: 'add-part' });
    else if (command === 'select') {
      const part = pager(latest.query, Math.min(latest.cursor, latestTotal - 1), 1).parts[0];
      if (part) nav.push({ name: 'part', part });
    } else if (command === 'back') {
      if (latest.query) dispatch({ type: 'clearSearch' });
      else nav.back();
    }
  });

  const searchText = state.isSearching || state.query ? `/${state.query}${state.isSearching ? '▏' : ''}` : '/ to search';
  return (
    <ScreenFrame title={`Catalog ${catalog.label}`} width={width} height={height} commands={COMMANDS}>
      <Text wrap="truncate-end">
        <Text bold={state.isSearching}>{searchText}</Text>
        <Text color={theme.muted}>
          {`  ${total.toLocaleString('en')}${probe.isTotalCapped ? '+' : ''} shown of ${count.toLocaleString('en')} parts`}
        </Text>
      </Text>
      {problems.length > 0 ? <Text color={theme.warn}>{truncate(`? ${problems.join('; ')} (docs/search.md)`, width)}</Text> : null}
      {count === 0 ? (
        <Text color={theme.warn}>{truncate('The catalog is empty. Press n to add a part, or import: headroom catalog import FILE.csv', width)}</Text>
      ) : total === 0 ? (
        <Text color={theme.warn}>{truncate(`Nothing matches "${safeText(state.query)}". Esc clears the search.`, width)}</Text>
      ) : (
        <>
          <PartRowHeader width={width} />
          <WindowedList
            items={page.parts}
            offset={start}
            total={total}
            cursor={cursor}
            height={rows}
            keyOf={(p) => `${p.manufacturer}\u0000${p.partNumber}`}
            renderItem={(p, isSelected) => <PartRow part={p} isSelected={isSelected} width={width} />}
          />
        </>
      )}
    </ScreenFrame>
  );
}
