import { Box, Text } from 'ink';
import { useState } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import { FormRow } from '../components/form-row.js';
import { ScreenFrame } from '../components/screen-frame.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import type { DesignService } from '../services.js';
import { useSyncReducer } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { formReducer, initialForm, type FormState } from '../state/form-state.js';
import { sessionTitle, type PositionSession } from '../state/position-draft.js';
import { typedConditions } from '../state/position-form.js';
import { wrap } from '../text/fit.js';
import { safetyCautions } from '../views/position-doc.js';
import type { ScreenProps } from './screen-props.js';

export interface NewPositionFormProps extends ScreenProps {
  readonly session: PositionSession;
  readonly part: Part | null;
}

const EDIT: readonly ScreenCommand[] = [['select', 'save: write the design file'], ['down', 'next field'], ['up', 'previous field'], 'nextField', 'erase', 'clearField', ['back', 'cancel']];
const DONE: readonly ScreenCommand[] = [['select', 'home'], ['back', 'back']];
const REF = /^[A-Za-z0-9][A-Za-z0-9_.+/-]*$/;

interface Row {
  readonly name: 'file' | 'ref' | 'name' | 'notes';
  readonly label: string;
  readonly placeholder: string;
}

/** Saves a position made in the form as a new entry of a design file (a new file, or appended). */
export function NewPositionForm({ session, part, width, height, isActive }: NewPositionFormProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { designs } = useServices();
  const [form, dispatch, getForm] = useSyncReducer(formReducer, () => initialForm());
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  // Once saved, the form stands still: the file now holds the ref, which is no error.
  const [frozen, setFrozen] = useState<ReturnType<typeof assess> | null>(null);
  const view = frozen ?? assess(form, designs);
  const { rows, errors, fileNote } = view;
  const cursor = Math.min(form.cursor, rows.length - 1);
  const isDone = outcome?.ok === true;

  const save = () => {
    dispatch({ type: 'attempt' });
    const latest = getForm();
    const now = assess({ ...latest, hasAttempted: true }, designs);
    if (Object.keys(now.errors).length > 0) return;
    const v = latest.values;
    const file = (v.file ?? '').trim();
    const ref = (v.ref ?? '').trim();
    const notes = (v.notes ?? '').trim();
    const r = designs.savePosition(
      file,
      {
        ref,
        role: session.role.id,
        policy: session.policy.id,
        ...(part ? { part: `${part.manufacturer}:${part.partNumber}` } : {}),
        ...(notes ? { notes } : {}),
        conditions: typedConditions(session.role, session.draft.values),
      },
      (v.name ?? '').trim(),
    );
    if (r.ok) setFrozen(now);
    setOutcome(r.ok ? { ok: true, message: `${ref} ${r.value === 'created' ? 'written to the new file' : 'appended to'} ${designs.resolve(file)}` } : { ok: false, message: r.message });
  };

  useKeys({ isActive, isTyping: !isDone, commands: isDone ? DONE : EDIT }, (command, input, key) => {
    if (isDone) {
      if (command === 'select') nav.home();
      else if (command === 'back') nav.back();
      return;
    }
    const latest = getForm();
    const latestRows = assess(latest, designs).rows;
    const row = latestRows[Math.min(latest.cursor, latestRows.length - 1)]!;
    if (command === 'up') dispatch({ type: 'move', by: -1, count: latestRows.length });
    else if (command === 'down' || command === 'nextField') dispatch({ type: 'move', by: 1, count: latestRows.length });
    else if (command === 'erase') dispatch({ type: 'erase', name: row.name });
    else if (command === 'clearField') dispatch({ type: 'clear', name: row.name });
    else if (command === 'select') save();
    else if (command === 'back') nav.back();
    else if (command === undefined) dispatch({ type: 'type', name: row.name, text: typedText(input, key) });
  });

  const what = part ? `the position with part ${safeText(part.manufacturer)}:${safeText(part.partNumber)}` : 'the position (no part chosen yet)';
  return (
    <ScreenFrame title={`${sessionTitle(session)} › save to a design file`} width={width} height={height} commands={isDone ? DONE : EDIT} safety={safetyCautions(session)}>
      <Box flexDirection="column">
        {wrap(`Saves ${what}: role ${session.role.id}, policy ${session.policy.id} and the conditions as you typed them.`, width - 2).map((l, i) => (
          <Text key={`w${i}`} color={theme.muted}>
            {l}
          </Text>
        ))}
        <Text> </Text>
        {rows.map((r, i) => {
          const error = errors[r.name];
          const note = r.name === 'file' ? fileNote : undefined;
          return (
            <FormRow
              key={r.name}
              label={r.label}
              value={form.values[r.name] ?? ''}
              placeholder={r.placeholder}
              isFocused={!isDone && i === cursor}
              isRequired={r.name !== 'notes'}
              {...(error ? { error } : {})}
              {...(note ? { note } : {})}
              width={width}
            />
          );
        })}
        <Text> </Text>
        {outcome
          ? wrap(`${outcome.ok ? '✓ Saved:' : '✗ Not saved:'} ${outcome.message}`, width - 2, 2).map((l, i) => (
              <Text key={`o${i}`} color={outcome.ok ? theme.good : theme.bad}>
                {l}
              </Text>
            ))
          : null}
      </Box>
    </ScreenFrame>
  );
}

/** Rows, errors and what the typed file is, from the form's values. */
function assess(form: FormState, designs: DesignService) {
  const file = (form.values.file ?? '').trim();
  const ref = (form.values.ref ?? '').trim();
  const existing = file && designs.exists(file) ? designs.read(file) : null;
  const rows: Row[] = [
    { name: 'file', label: 'Design file', placeholder: 'path, e.g. designs/psu.yaml' },
    { name: 'ref', label: 'Reference', placeholder: 'e.g. D7' },
    ...(existing ? [] : [{ name: 'name' as const, label: 'Design name', placeholder: 'for a new file, e.g. PSU board' }]),
    { name: 'notes', label: 'Notes', placeholder: 'optional' },
  ];
  const errors: Partial<Record<Row['name'], string>> = {};
  if (existing && !existing.ok) errors.file = existing.message.split('\n')[0]!;
  if (ref && !REF.test(ref)) errors.ref = 'letters, digits and - _ . / + only';
  if (ref && existing?.ok && existing.value.positions.some((p) => p.ref.toUpperCase() === ref.toUpperCase())) errors.ref = `${ref} is already in the file`;
  if (form.hasAttempted) {
    if (!file) errors.file = 'required';
    if (!ref) errors.ref = 'required';
    if (!existing && !(form.values.name ?? '').trim()) errors.name = 'required for a new file';
  }
  const fileNote = !file ? undefined : existing?.ok ? `existing design "${existing.value.name}", ${existing.value.positions.length} positions: appended` : existing ? undefined : 'new file';
  return { rows, errors, existing, fileNote };
}
