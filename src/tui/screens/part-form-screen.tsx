import { Box, Text } from 'ink';
import { useMemo, useState } from 'react';
import { fieldByColumn, safeText, type Part } from '../../parts/index.js';
import { FormRow, formColumns } from '../components/form-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer, useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { changedColumns, checkEdit, editValues, isRenamed, withIdentityCheck } from '../state/edit-part.js';
import { cycleOption, formReducer, initialForm } from '../state/form-state.js';
import { CHOICE_DEFAULTS, INITIAL_PART_VALUES, checkPart, partRows, shownPartIssue } from '../state/part-form.js';
import { displayWidth, wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const editCommands = (isEdit: boolean): readonly ScreenCommand[] => [
  ['select', isEdit ? 'save: the changes to the catalog' : 'save: the part to the catalog'],
  ['down', 'next field'],
  ['up', 'previous field'],
  'nextField',
  'prevField',
  ['cycleNext', 'next choice (kind, lifecycle, approval …)'],
  ['cyclePrev', 'previous choice'],
  'erase',
  'clearField',
  ['back', isEdit ? 'cancel: back to the part, nothing saved' : 'cancel'],
];
const EDITING = editCommands(false);
const EDITING_STORED = editCommands(true);
const ADDED: readonly ScreenCommand[] = [['select', 'open: the part'], ['back', 'back']];
const SAVED_EDIT: readonly ScreenCommand[] = [['select', 'back: to the part'], ['back', 'back: to the part']];

export interface PartFormScreenProps extends ScreenProps {
  /** The stored part to edit; without it the form adds a new part. */
  readonly editing?: Part;
}

interface Saved {
  readonly part: Part;
  readonly changed: readonly string[];
  readonly isApprovalChanged: boolean;
}

const labelsOf = (columns: readonly string[]) => columns.map((c) => fieldByColumn(c)?.label ?? c).join(', ');

/**
 * One part field by field (the fields its kind uses), each value checked as typed with its error
 * beside it. Adds a new part, or, given `editing`, rewrites a stored one in place.
 */
export function PartFormScreen({ editing, width, height, isActive }: PartFormScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { catalog } = useServices();
  const initial = useMemo(() => (editing ? editValues(editing) : INITIAL_PART_VALUES), [editing]);
  const [form, dispatch, getForm] = useSyncReducer(formReducer, () => initialForm(initial));
  const [saved, setSaved, getSaved] = useSyncState<Saved | null>(null);
  const [status, setStatus] = useState<{ text: string; isBad: boolean } | null>(null);
  const checkOf = (values: Readonly<Record<string, string>>) =>
    withIdentityCheck(editing ? checkEdit(values, initial, editing) : checkPart(values), values, (ref) => catalog.lookup(ref) !== null, editing);
  const check = useMemo(() => checkOf(form.values), [form.values, catalog, initial, editing]);
  const rows = useMemo(() => partRows(form.values.kind ?? ''), [form.values.kind]);
  const cursor = Math.min(form.cursor, rows.length - 1);
  const row = rows[cursor]!;
  const column = row.field.column;
  const commands = saved ? (editing ? SAVED_EDIT : ADDED) : editing ? EDITING_STORED : EDITING;

  const save = () => {
    const latest = getForm();
    const latestRows = partRows(latest.values.kind ?? '');
    dispatch({ type: 'attempt' });
    const check = checkOf(latest.values);
    if (!check.part) {
      const bad = latestRows.findIndex((r) => check.issues.has(r.field.column));
      if (bad >= 0) dispatch({ type: 'focus', index: bad });
      setStatus(null);
      return;
    }
    if (!editing) {
      const r = catalog.addPart(check.part);
      if (r.ok) setSaved({ part: r.value, changed: [], isApprovalChanged: false });
      else setStatus({ text: `✗ Not saved: ${r.message}`, isBad: true });
      return;
    }
    const changed = changedColumns(initial, latest.values);
    if (changed.length === 0) {
      setStatus({ text: 'Nothing changed: every field is as stored. Esc goes back.', isBad: false });
      return;
    }
    const r = catalog.updatePart(editing, check.part);
    if (r.ok) setSaved({ part: r.value.part, changed, isApprovalChanged: r.value.isApprovalChanged });
    else setStatus({ text: `✗ Not saved: ${r.message}`, isBad: true });
  };

  const isTyping = () => {
    const latest = getForm();
    const latestRows = partRows(latest.values.kind ?? '');
    return !getSaved() && !latestRows[Math.min(latest.cursor, latestRows.length - 1)]?.options;
  };
  useKeys({ isActive, isTyping, commands }, (command, input, key) => {
    const done = getSaved();
    const latest = getForm();
    const rows = partRows(latest.values.kind ?? '');
    const row = rows[Math.min(latest.cursor, rows.length - 1)]!;
    const column = row.field.column;
    if (done) {
      if (command === 'select' && !editing) nav.push({ name: 'part', part: done.part });
      else if (command === 'select' || command === 'back') nav.back();
      return;
    }
    // A message about the last save attempt no longer holds once the form changes.
    if (command !== 'select') setStatus(null);
    if (command === 'up' || command === 'prevField') dispatch({ type: 'move', by: -1, count: rows.length });
    else if (command === 'down' || command === 'nextField') dispatch({ type: 'move', by: 1, count: rows.length });
    else if ((command === 'cycleNext' || command === 'cyclePrev') && row.options) {
      dispatch({ type: 'set', name: column, value: cycleOption(row.options, latest.values[column] ?? '', command === 'cycleNext' ? 1 : -1) });
    } else if (command === 'erase') dispatch({ type: 'erase', name: column });
    else if (command === 'clearField') dispatch({ type: 'clear', name: column });
    else if (command === 'back') nav.back();
    else if (command === 'select') save();
    else if (command === undefined && !row.options) dispatch({ type: 'type', name: column, text: typedText(input, key) });
  });

  const issue = shownPartIssue(check, column, form.values, form.hasAttempted);
  const value = form.values[column] ?? '';
  // A value longer than its field (VF points, notes) is shown whole under the form.
  const isCut = !row.options && displayWidth(value) > formColumns(width).value - 2;
  const focus = [
    ...wrap(`${row.field.label}: ${row.field.help}`, width - 2).map((text) => ({ text, tone: theme.muted })),
    ...(isCut ? wrap(`= ${value}`, width - 2, 2).slice(0, 3).map((text) => ({ text, tone: undefined })) : []),
    ...(issue ? wrap(`✗ ${issue.message}. Expected ${issue.expected}`, width - 2, 2).slice(0, 3).map((text) => ({ text, tone: theme.bad })) : []),
  ];
  const name = (p: Part) => `${safeText(p.manufacturer)}:${safeText(p.partNumber)}`;
  const notice: { text: string; tone?: string | undefined }[] = saved
    ? [
        {
          text: editing
            ? `✓ Saved ${name(saved.part)}: ${labelsOf(saved.changed)} changed${saved.isApprovalChanged ? '; the approval change is in the trail' : ''}. Enter or Esc goes back to the part.`
            : `✓ Saved ${name(saved.part)} to the catalog. Enter opens it; Esc goes back.`,
          tone: theme.good,
        },
      ]
    : [
        ...(status ? [{ text: status.text, tone: status.isBad ? theme.bad : theme.muted }] : []),
        ...(editing && isRenamed(form.values, editing) && !check.issues.has('part_number')
          ? [{ text: `! New maker or part number: the approval trail so far stays filed under ${name(editing)}.`, tone: theme.warn }]
          : []),
      ];
  const noticeLines = notice.flatMap((n) => wrap(n.text, width - 2, 2).map((text) => ({ text, tone: n.tone })));
  const body = height - frameRows(width);
  const listRows = Math.max(3, body - 3 - focus.length - noticeLines.length);
  const title = editing ? `Catalog › ${safeText(editing.partNumber)} › edit` : 'Catalog › add a part';
  return (
    <ScreenFrame title={title} width={width} height={height} commands={commands} about="Units may be typed freely (600 V, 1 A, 150 °C: bare temperatures are °C). Points: VF @ IF @ Tj; …">
      <Text color={theme.muted} wrap="truncate-end">
        {editing ? 'Stored values as typed; change what is wrong. * marks what the kind requires.' : 'The kind decides which ratings are asked for; * marks what the kind requires.'}
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
        {noticeLines.map((l, i) => (
          <Text key={`s${i}`} color={l.tone}>
            {l.text}
          </Text>
        ))}
        {focus.map((l, i) => (
          <Text key={`f${i}`} color={l.tone}>
            {l.text}
          </Text>
        ))}
      </Box>
    </ScreenFrame>
  );
}
