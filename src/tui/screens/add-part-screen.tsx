import { Box, Text } from 'ink';
import { useMemo, useState } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import { FormRow } from '../components/form-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer, useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { cycleOption, formReducer, initialForm } from '../state/form-state.js';
import { CHOICE_DEFAULTS, INITIAL_PART_VALUES, checkPart, partRows, shownPartIssue } from '../state/part-form.js';
import { wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const EDIT: readonly ScreenCommand[] = [
  ['select', 'save: the part to the catalog'],
  ['down', 'next field'],
  ['up', 'previous field'],
  'nextField',
  'prevField',
  ['cycleNext', 'next choice (kind, lifecycle, approval …)'],
  ['cyclePrev', 'previous choice'],
  'erase',
  'clearField',
  ['back', 'cancel'],
];
const DONE: readonly ScreenCommand[] = [['select', 'open: the part'], ['back', 'back']];

/** A new part typed field by field (the fields its kind uses), checked as typed; Enter saves it. */
export function AddPartScreen({ width, height, isActive }: ScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { catalog } = useServices();
  const [form, dispatch, getForm] = useSyncReducer(formReducer, () => initialForm(INITIAL_PART_VALUES));
  const [saved, setSaved, getSaved] = useSyncState<Part | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const rows = useMemo(() => partRows(form.values.kind ?? ''), [form.values.kind]);
  const check = useMemo(() => checkPart(form.values), [form.values]);
  const cursor = Math.min(form.cursor, rows.length - 1);
  const row = rows[cursor]!;
  const column = row.field.column;

  const isTyping = () => {
    const latest = getForm();
    const latestRows = partRows(latest.values.kind ?? '');
    return !getSaved() && !latestRows[Math.min(latest.cursor, latestRows.length - 1)]?.options;
  };
  useKeys({ isActive, isTyping, commands: saved ? DONE : EDIT }, (command, input, key) => {
    const saved = getSaved();
    const latest = getForm();
    const rows = partRows(latest.values.kind ?? '');
    const row = rows[Math.min(latest.cursor, rows.length - 1)]!;
    const column = row.field.column;
    if (saved) {
      if (command === 'select') nav.push({ name: 'part', part: saved });
      else if (command === 'back') nav.back();
      return;
    }
    if (command === 'up' || command === 'prevField') dispatch({ type: 'move', by: -1, count: rows.length });
    else if (command === 'down' || command === 'nextField') dispatch({ type: 'move', by: 1, count: rows.length });
    else if ((command === 'cycleNext' || command === 'cyclePrev') && row.options) {
      dispatch({ type: 'set', name: column, value: cycleOption(row.options, latest.values[column] ?? '', command === 'cycleNext' ? 1 : -1) });
    } else if (command === 'erase') dispatch({ type: 'erase', name: column });
    else if (command === 'clearField') dispatch({ type: 'clear', name: column });
    else if (command === 'back') nav.back();
    else if (command === 'select') {
      dispatch({ type: 'attempt' });
      const check = checkPart(latest.values);
      if (!check.part) {
        const bad = rows.findIndex((r) => check.issues.has(r.field.column));
        if (bad >= 0) dispatch({ type: 'focus', index: bad });
        return;
      }
      const r = catalog.addPart(check.part);
      if (r.ok) setSaved(r.value);
      else setFailure(r.message);
    } else if (command === undefined && !row.options) dispatch({ type: 'type', name: column, text: typedText(input, key) });
  });

  const issue = shownPartIssue(check, column, form.values, form.hasAttempted);
  const focus = [
    ...wrap(`${row.field.label}: ${row.field.help}`, width - 2),
    ...(issue ? wrap(`✗ ${issue.message}. Expected ${issue.expected}`, width - 2, 2).slice(0, 3) : []),
  ];
  const status = saved
    ? wrap(`✓ Saved ${safeText(saved.manufacturer)}:${safeText(saved.partNumber)} to the catalog. Enter opens it; Esc goes back.`, width - 2, 2)
    : failure
      ? wrap(`✗ Not saved: ${failure}`, width - 2, 2)
      : [];
  const body = height - frameRows(width);
  const listRows = Math.max(3, body - 3 - focus.length - status.length);
  return (
    <ScreenFrame title="Catalog › add a part" width={width} height={height} commands={saved ? DONE : EDIT} about="Units may be typed freely (600 V, 1 A, 150 °C: bare temperatures are °C). Points: VF @ IF @ Tj; …">
      <Text color={theme.muted} wrap="truncate-end">
        The kind decides which ratings are asked for; * marks what the kind requires.
      </Text>
      <WindowedList
        items={rows}
        cursor={saved ? -1 : cursor}
        height={listRows}
        keyOf={(r) => r.field.column}
        renderItem={(r, isFocused) => {
          const problem = shownPartIssue(check, r.field.column, form.values, form.hasAttempted);
          return (
            <FormRow
              label={r.field.label}
              value={form.values[r.field.column] ?? ''}
              placeholder={r.options ? (CHOICE_DEFAULTS[r.field.column] ?? 'not set') : r.isRequired ? 'required' : ''}
              isFocused={isFocused}
              isRequired={r.isRequired}
              isChoice={r.options !== undefined}
              {...(problem ? { error: problem.message } : {})}
              width={width}
            />
          );
        }}
      />
      <Box flexDirection="column">
        {status.map((l, i) => (
          <Text key={`s${i}`} color={saved ? theme.good : theme.bad}>
            {l}
          </Text>
        ))}
        {focus.map((l, i) => (
          <Text key={`f${i}`} color={l.startsWith('✗') || (i > 0 && issue) ? theme.bad : theme.muted}>
            {l}
          </Text>
        ))}
      </Box>
    </ScreenFrame>
  );
}
