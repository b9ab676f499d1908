import { Box, Text } from 'ink';
import { useDeferredValue, useMemo, useRef } from 'react';
import type { Part } from '../../parts/index.js';
import { checkSubstitution, rankReplacements, type RankedReplacement } from '../../selection/substitution/index.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { ScrollView, maxOffset } from '../components/scroll-view.js';
import { StyledText } from '../components/styled-text.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer } from '../hooks/use-sync-state.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { catalogPickPager, replacementPager } from '../state/pick-pager.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { initialSubstitution, substitutionReducer, type SubstitutionState } from '../state/substitution.js';
import { truncateStyled } from '../text/styled.js';
import { safetyCautions } from '../views/position-doc.js';
import { contextDoc, ratingsDoc, verdictLine } from '../views/substitution-doc.js';
import type { ScreenProps } from './screen-props.js';
import { SubstitutePicker, pickerRows } from './substitute-picker.js';
import { partsHeader } from '../views/substitution-header.js';

export interface SubstituteScreenProps extends ScreenProps {
  readonly original: Part | null;
  readonly alternate: Part | null;
  /** The position both parts are judged at, when opened from one of its candidates. */
  readonly session?: PositionSession;
}

/** Two columns from this width: the ratings on the left, fit, circuit and cautions on the right. */
const TWO_COLUMNS = 160;
const MOVES = ['home', 'end', 'pageUp', 'pageDown', 'up', 'down'] as const;

function compareCommands(hasSession: boolean): ScreenCommand[] {
  return [
    ['select', 'alternate: choose another one (ranked replacements or the catalog)'],
    'chooseOriginal',
    'exchange',
    ...(hasSession ? [['assign', 'assign: write the alternate into the design file'] as const] : []),
    ['down', 'scroll down'],
    ['up', 'scroll up'],
    'pageDown',
    'pageUp',
    'home',
    'end',
    ['back', 'back'],
  ];
}

function pickCommands(state: SubstitutionState): ScreenCommand[] {
  const slot = state.picking === 'original' ? 'original (the part to be replaced)' : 'alternate';
  return [
    ['select', `choose: the highlighted part as the ${slot}`],
    ['search', 'search: as you type; Enter or Esc ends typing'],
    ...(state.picking === 'alternate' && state.original ? [['nextField', 'list: ranked replacements or the whole catalog'] as const, 'chooseOriginal' as const] : []),
    'erase',
    'clearField',
    ['down', 'next part'],
    ['up', 'previous part'],
    'pageDown',
    'pageUp',
    'home',
    'end',
    ['back', 'back: clears the search first'],
  ];
}

/**
 * Is the alternate a safe drop-in for the original? The verdict with its reasons, rating by rating
 * (which way is better for each), package and kind, both parts at the position when there is one,
 * and cautions. Either part is chosen from the original's ranked replacements or the catalog.
 */
export function SubstituteScreen({ original, alternate, session, width, height, isActive }: SubstituteScreenProps) {
  const nav = useNavigator();
  const { catalog, search } = useServices();
  const [state, dispatch, getState] = useSyncReducer(substitutionReducer, () => initialSubstitution(original, alternate));
  const circuit = useMemo(() => (session?.result.ok ? { position: session.result.position, policy: session.policy } : undefined), [session]);
  const check = useMemo(() => (state.original && state.alternate ? checkSubstitution(state.original, state.alternate, circuit) : null), [state.original, state.alternate, circuit]);
  // Ranked once per original: a burst of keys may ask for the list before the next render.
  const rankings = useRef(new Map<Part, readonly RankedReplacement[]>());
  const rankedFor = (o: Part) => {
    let r = rankings.current.get(o);
    if (!r) rankings.current.set(o, (r = rankReplacements(o, catalog.replacements(o), circuit)));
    return r;
  };
  const isRanked = (s: SubstitutionState) => s.picking === 'alternate' && s.source === 'replacements' && s.original !== null;
  const pagerOf = (s: SubstitutionState) => (isRanked(s) ? replacementPager(rankedFor(s.original!), search) : catalogPickPager(catalog.pager()));
  const pager = useMemo(() => pagerOf(state), [state.source, state.picking, state.original, search, catalog]);
  const considered = isRanked(state) ? rankedFor(state.original!).length : 0;
  const query = useDeferredValue(state.list.query);

  const safety = session ? safetyCautions(session) : [];
  const header = partsHeader(state, session, width);
  const body = height - frameRows(width, safety) - header.length;
  const isTwo = width >= TWO_COLUMNS;
  const leftWidth = isTwo ? Math.floor(width / 2) - 1 : Math.min(width, 140);
  const where = session ? sessionTitle(session) : '';
  const left = useMemo(() => (check ? ratingsDoc(check, leftWidth) : []), [check, leftWidth]);
  const right = useMemo(() => (check ? contextDoc(check, isTwo ? width - leftWidth - 2 : leftWidth, where) : []), [check, isTwo, width, leftWidth, where]);
  const single = useMemo(() => [...left, [], ...right], [left, right]);
  const docRows = body - 1;
  const scrolled = isTwo ? (left.length >= right.length ? left : right) : single;
  const lastOffset = maxOffset(scrolled.length, docRows);
  const listRows = pickerRows(body, state);

  const commands = state.picking ? pickCommands(state) : compareCommands(session !== undefined);
  useKeys({ isActive, isTyping: () => getState().picking !== null && getState().list.isSearching, commands }, (command, input, key) => {
    const s = getState();
    if (!s.picking) {
      const page = Math.max(1, docRows - 3);
      const by = { down: 1, up: -1, pageDown: page, pageUp: -page, home: -Infinity, end: Infinity }[command as string];
      if (by !== undefined) dispatch({ type: 'scroll', by, max: lastOffset });
      else if (command === 'select') dispatch({ type: 'pick', slot: 'alternate' });
      else if (command === 'chooseOriginal') dispatch({ type: 'pick', slot: 'original' });
      else if (command === 'exchange') dispatch({ type: 'exchange' });
      else if (command === 'assign' && session && s.alternate) nav.push({ name: 'assign', session, part: s.alternate });
      else if (command === 'back') nav.back();
      return;
    }
    // The list as it is after every key so far (a burst may have changed source or query).
    const latest = s.source === state.source && s.picking === state.picking && s.original === state.original ? pager : pagerOf(s);
    const total = latest(s.list.query, 0, 1).total;
    const step = { down: 1, up: -1, pageDown: listRows, pageUp: -listRows, home: -Infinity, end: Infinity } as const;
    if ((MOVES as readonly string[]).includes(command ?? '')) dispatch({ type: 'list', action: { type: 'move', by: step[command as (typeof MOVES)[number]], count: total } });
    else if (s.list.isSearching) {
      if (command === 'select' || command === 'back') dispatch({ type: 'list', action: { type: 'endSearch' } });
      else if (command === 'erase') dispatch({ type: 'list', action: { type: 'erase' } });
      else if (command === 'clearField') dispatch({ type: 'list', action: { type: 'clearSearch' } });
      else if (command === undefined) dispatch({ type: 'list', action: { type: 'type', text: typedText(input, key) } });
    } else if (command === 'search') dispatch({ type: 'list', action: { type: 'startSearch' } });
    else if (command === 'erase') dispatch({ type: 'list', action: { type: 'erase' } });
    else if (command === 'clearField') dispatch({ type: 'list', action: { type: 'clearSearch' } });
    else if (command === 'nextField') dispatch({ type: 'toggleSource' });
    else if (command === 'chooseOriginal') dispatch({ type: 'pick', slot: 'original' });
    else if (command === 'select') {
      const part = latest(s.list.query, Math.min(s.list.cursor, Math.max(0, total - 1)), 1).parts[0];
      if (part) dispatch({ type: 'choose', part });
    } else if (command === 'back') {
      if (s.list.query) dispatch({ type: 'list', action: { type: 'clearSearch' } });
      else if (s.original && s.alternate) dispatch({ type: 'closePick' });
      else nav.back();
    }
  });

  const title = session ? `${sessionTitle(session)} › substitute` : 'Substitute';
  return (
    <ScreenFrame
      title={title}
      width={width}
      height={height}
      commands={commands}
      safety={safety}
      about="Is the alternate a safe drop-in for the original? Marks: ✓ better (or matches where a value must match) · ~ same · ✗ worse or differs · ? unknown (the catalog lacks the value) · · price, not a reason either way. Bars in the circuit section are headroom per limit."
    >
      {header.map((line, i) => (
        <StyledText key={`h${i}`} line={line} />
      ))}
      {state.picking ? (
        <SubstitutePicker state={state} query={query} pager={pager} rows={listRows} width={width} considered={considered} />
      ) : check ? (
        <>
          <StyledText line={truncateStyled(verdictLine(check), width - 1)} />
          {isTwo ? (
            <Box flexDirection="row">
              <Box width={leftWidth} marginRight={2} flexDirection="column">
                <ScrollView lines={left} offset={Math.min(state.offset, maxOffset(left.length, docRows))} height={docRows} />
              </Box>
              <Box width={width - leftWidth - 2} flexDirection="column">
                <ScrollView lines={right} offset={Math.min(state.offset, maxOffset(right.length, docRows))} height={docRows} />
              </Box>
            </Box>
          ) : (
            <ScrollView lines={single} offset={state.offset} height={docRows} />
          )}
        </>
      ) : (
        <Text>Nothing to compare yet.</Text>
      )}
    </ScreenFrame>
  );
}
