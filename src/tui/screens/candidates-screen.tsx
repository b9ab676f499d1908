import { Box, Text } from 'ink';
import { useDeferredValue, useMemo } from 'react';
import { CandidateHeader, CandidateRow, candidateLayout } from '../components/candidate-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useCandidates } from '../hooks/use-candidates.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { substringSearch, usePartSearch } from '../hooks/use-part-search.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { FILTER_LABELS, SORT_LABELS, arrangeCandidates, candidateListReducer, initialCandidateList } from '../state/candidate-list.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { safeText } from '../../parts/index.js';
import { truncate, wrap } from '../text/fit.js';
import { safetyCautions } from '../views/position-doc.js';
import { VERDICT_MARK, VERDICT_WORD } from '../views/verdict.js';
import type { ScreenProps } from './screen-props.js';

export interface CandidatesScreenProps extends ScreenProps {
  readonly session: PositionSession;
}

const COMMANDS: readonly ScreenCommand[] = [
  ['select', 'open: every margin, losses, charts'],
  'assign',
  ['search', 'search: as you type; Enter or Esc ends typing'],
  'erase',
  'clearField',
  'sort',
  'filter',
  ['down', 'next part'],
  ['up', 'previous part'],
  'pageDown',
  'pageUp',
  ['back', 'back: clears the search first'],
];

/** Parts ranked for the position, a headroom bar per limit; search, sort and filter in memory. */
export function CandidatesScreen({ session, width, height, isActive }: CandidatesScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const services = useServices();
  const state = useCandidates(session, services.catalog);
  const [list, dispatch, getList] = useSyncReducer(candidateListReducer, () => initialCandidateList);
  const ranked = useMemo(() => (state.status === 'ready' ? [...state.search.ranking.candidates, ...state.search.ranking.failed] : []), [state]);
  const parts = useMemo(() => ranked.map((c) => c.evaluation.part), [ranked]);
  const query = useDeferredValue(list.query);
  const found = usePartSearch(parts, query, services.search);
  const matched = useMemo(() => (query.trim() ? new Set(found) : null), [found, query]);
  const rows = useMemo(() => arrangeCandidates(ranked, matched, list.sort, list.filter), [ranked, matched, list.sort, list.filter]);
  const problems = useMemo(() => (query.trim() ? (services.queryProblems?.(query) ?? []) : []), [query, services]);
  const safety = safetyCautions(session);
  const body = height - frameRows(width, safety);
  const selected = rows[Math.min(list.cursor, rows.length - 1)];
  const summary = selected ? wrap(`${VERDICT_MARK[selected.evaluation.verdict]} ${VERDICT_WORD[selected.evaluation.verdict]} — ${safeText(selected.evaluation.summary)}`, width - 2, 2).slice(0, 2) : [];
  const notices: string[] = [];
  if (state.status === 'ready') {
    const s = state.search;
    if (ranked.length > 0 && s.ranking.passingCount === 0) notices.push('No part passes every limit. The closest are listed: ✗ fails, ! marginal, ? cannot be judged.');
  }
  const noticeLines = notices.flatMap((n) => wrap(n, width - 2, 2));
  const listRows = Math.max(3, body - 4 - summary.length - noticeLines.length - Math.min(1, problems.length));
  const page = Math.max(1, listRows - 1);

  /** The rows as they are after every key so far, for a handler running before the next render. */
  const latestRows = () => {
    const l = getList();
    if (l.query === query && l.sort === list.sort && l.filter === list.filter) return rows;
    const hits = l.query.trim() ? new Set((services.search ?? substringSearch)(parts, l.query)) : null;
    return arrangeCandidates(ranked, hits, l.sort, l.filter);
  };

  useKeys({ isActive, isTyping: () => getList().isSearching, commands: COMMANDS }, (command, input, key) => {
    const l = getList();
    const current = latestRows();
    const count = current.length;
    const selected = current[Math.min(l.cursor, count - 1)];
    if (command === 'down') dispatch({ type: 'move', by: 1, count });
    else if (command === 'up') dispatch({ type: 'move', by: -1, count });
    else if (command === 'pageDown') dispatch({ type: 'move', by: page, count });
    else if (command === 'pageUp') dispatch({ type: 'move', by: -page, count });
    else if (l.isSearching) {
      if (command === 'select' || command === 'back') dispatch({ type: 'endSearch' });
      else if (command === 'erase') dispatch({ type: 'erase' });
      else if (command === 'clearField') dispatch({ type: 'clearSearch' });
      else if (command === undefined) dispatch({ type: 'type', text: typedText(input, key) });
    } else if (command === 'search') dispatch({ type: 'startSearch' });
    else if (command === 'sort') dispatch({ type: 'cycleSort' });
    else if (command === 'filter') dispatch({ type: 'cycleFilter' });
    else if (command === 'select' && selected) nav.push({ name: 'candidate', session, candidate: selected });
    else if (command === 'assign' && selected) nav.push({ name: 'assign', session, part: selected.evaluation.part });
    else if (command === 'back') {
      if (l.query) dispatch({ type: 'clearSearch' });
      else nav.back();
    }
  });

  const limits = ranked[0]?.evaluation.limits ?? (session.result.ok ? [] : []);
  const layout = candidateLayout(width, limits.length);
  const searchText = list.isSearching || list.query ? `/${list.query}${list.isSearching ? '▏' : ''}` : '/ to search';
  const counts =
    state.status === 'ready'
      ? `${rows.length} shown · ${state.search.ranking.passingCount} pass · ${state.search.evaluated.toLocaleString('en')} parts evaluated${state.search.isComplete ? '' : ' (stopped early)'}`
      : '';
  return (
    <ScreenFrame title={`${sessionTitle(session)} › candidates`} width={width} height={height} commands={COMMANDS} safety={safety}>
      <Text wrap="truncate-end">
        <Text bold={list.isSearching}>{searchText}</Text>
        <Text color={theme.muted}>{truncate(`  sort ${SORT_LABELS[list.sort]} · ${FILTER_LABELS[list.filter]} · ${counts}`, Math.max(0, width - searchText.length))}</Text>
      </Text>
      {problems.length > 0 ? <Text color={theme.warn}>{truncate(`? ${problems.join('; ')} (docs/search.md)`, width)}</Text> : null}
      {state.status === 'ranking' ? (
        <Text color={theme.muted}>Ranking the catalog against the position's limits…</Text>
      ) : state.status === 'failed' ? (
        <Text color={theme.bad}>{`✗ The catalog could not be ranked: ${state.message}`}</Text>
      ) : ranked.length === 0 ? (
        <Box flexDirection="column">
          {wrap('No part in the catalog meets the ratings this position needs (or is approved for use). What the catalog was asked for:', width - 2).map((l, i) => (
            <Text key={`h${i}`} color={theme.warn}>
              {l}
            </Text>
          ))}
          {state.search.prefilter.flatMap((p) => wrap(`• ${p}`, width - 2, 2)).slice(0, Math.max(1, body - 4)).map((l, i) => (
            <Text key={`p${i}`} color={theme.muted}>
              {l}
            </Text>
          ))}
        </Box>
      ) : (
        <Box flexDirection="column">
          {noticeLines.map((l, i) => (
            <Text key={`n${i}`} color={theme.warn}>
              {l}
            </Text>
          ))}
          <CandidateHeader layout={layout} limits={limits} width={width} />
          {rows.length === 0 ? (
            <Text color={theme.warn}>
              {truncate(list.query ? `Nothing matches "${list.query}". Esc clears the search.` : 'The filter hides every part; f shows more.', width)}
            </Text>
          ) : (
            <WindowedList
              items={rows}
              cursor={Math.min(list.cursor, rows.length - 1)}
              height={listRows}
              keyOf={(c) => `${c.evaluation.part.manufacturer}\u0000${c.evaluation.part.partNumber}`}
              renderItem={(c, isSelected) => <CandidateRow candidate={c} isSelected={isSelected} layout={layout} />}
            />
          )}
          {summary.map((l, i) => (
            <Text key={`s${i}`} color={theme.muted}>
              {l}
            </Text>
          ))}
        </Box>
      )}
    </ScreenFrame>
  );
}
