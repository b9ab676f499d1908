import { Box, Text } from 'ink';
import { useMemo } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import type { RankedReplacement } from '../../selection/substitution/index.js';
import { PartRow, PartRowHeader } from '../components/part-row.js';
import { ReplacementHeader, ReplacementRow } from '../components/replacement-row.js';
import { WindowedList, windowStart } from '../components/windowed-list.js';
import { useTheme } from '../hooks/use-theme.js';
import type { PickPager } from '../state/pick-pager.js';
import type { SubstitutionState } from '../state/substitution.js';
import { truncate, wrap } from '../text/fit.js';

export interface SubstitutePickerProps {
  readonly state: SubstitutionState;
  /** The search text as last rendered (deferred while typing). */
  readonly query: string;
  readonly pager: PickPager;
  readonly rows: number;
  readonly width: number;
  /** How many ranked replacements there are before any search. */
  readonly considered: number;
}

const isRanked = (s: SubstitutionState) => s.picking === 'alternate' && s.source === 'replacements';

/** List rows left in `body` once the picker's own lines are placed. */
export function pickerRows(body: number, state: SubstitutionState): number {
  return Math.max(3, body - 2 - 1 - (state.notice ? 1 : 0) - 1 - 2 - (isRanked(state) ? 2 : 0));
}

function intro(state: SubstitutionState, total: number): [string, string] {
  if (state.picking === 'original') return ['Choose the original: the part to be replaced · whole catalog', 'Then the alternate, from the original\'s ranked replacements.'];
  if (!state.original) return ['Choose the alternate · whole catalog', ''];
  if (isRanked(state)) {
    return [`Choose the alternate · ranked replacements of the original (${total})`, 'Tab: whole catalog · same package and compatible kind, not banned or obsolete'];
  }
  return ['Choose the alternate · whole catalog', 'Tab: back to the original\'s ranked replacements'];
}

/** The list a part is chosen from, with its search line; ranked replacements show why each ranks where it does. */
export function SubstitutePicker({ state, query, pager, rows, width, considered }: SubstitutePickerProps) {
  const theme = useTheme();
  const probe = useMemo(() => pager(query, 0, 1), [pager, query]);
  const total = probe.total;
  const cursor = Math.min(state.list.cursor, Math.max(0, total - 1));
  const start = windowStart(cursor, rows, total);
  const page = useMemo(() => pager(query, start, rows), [pager, query, start, rows]);
  const [first, second] = intro(state, considered);
  const searchText = state.list.isSearching || state.list.query ? `/${state.list.query}${state.list.isSearching ? '▏' : ''}` : '/ to search';
  const selected = page.replacements?.[cursor - start];
  const empty = query
    ? `Nothing matches "${safeText(state.list.query)}". Esc clears the search.`
    : isRanked(state)
      ? 'No other part in the catalog has the same package and a compatible kind. Tab lists the whole catalog.'
      : 'The catalog is empty.';
  return (
    <Box flexDirection="column">
      <Text bold wrap="truncate-end">{first}</Text>
      <Text color={theme.muted} wrap="truncate-end">{second || ' '}</Text>
      <Text wrap="truncate-end">
        <Text bold={state.list.isSearching}>{searchText}</Text>
        <Text color={theme.muted}>{`  ${total.toLocaleString('en')} shown`}</Text>
      </Text>
      {state.notice ? <Text color={theme.warn}>{truncate(`! ${state.notice}`, width - 1)}</Text> : null}
      {total === 0 ? (
        <Text color={theme.warn}>{truncate(empty, width - 1)}</Text>
      ) : (
        <>
          {page.replacements ? <ReplacementHeader width={width} /> : <PartRowHeader width={width} />}
          <WindowedList
            items={(page.replacements ?? page.parts) as readonly (RankedReplacement | Part)[]}
            offset={start}
            total={total}
            cursor={cursor}
            height={rows}
            keyOf={(_item, i) => String(i)}
            renderItem={(item, isSelected) =>
              'check' in item ? <ReplacementRow replacement={item} isSelected={isSelected} width={width} /> : <PartRow part={item} isSelected={isSelected} width={width} />
            }
          />
          {selected
            ? wrap(safeText(selected.basis), width - 2, 2)
                .slice(0, 2)
                .map((l, i) => (
                  <Text key={i} color={theme.muted}>
                    {l}
                  </Text>
                ))
            : null}
        </>
      )}
    </Box>
  );
}
