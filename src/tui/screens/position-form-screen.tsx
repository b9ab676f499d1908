import { Box, Text } from 'ink';
import { useMemo, useState } from 'react';
import { findRole } from '../../circuits/registry.js';
import type { RoleDefinition } from '../../circuits/role.js';
import { FormRow } from '../components/form-row.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { WindowedList } from '../components/windowed-list.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncReducer } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import { typedText, type ScreenCommand } from '../keys.js';
import { cycleOption, formReducer, initialForm } from '../state/form-state.js';
import { policyChoices, type PositionDraft } from '../state/position-draft.js';
import { POLICY_ROW, checkPosition, positionRows, shownError, type PositionRow } from '../state/position-form.js';
import { truncate, wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

const COMMANDS: readonly ScreenCommand[] = [
  ['select', 'solve: limits and derivation'],
  ['down', 'next field'],
  ['up', 'previous field'],
  'nextField',
  'prevField',
  ['cycleNext', 'next choice (choice fields ‹ ›)'],
  ['cyclePrev', 'previous choice'],
  'erase',
  'clearField',
  ['back', 'back: to the roles'],
];

export interface PositionFormScreenProps extends ScreenProps {
  readonly draft: PositionDraft;
}

function placeholderOf(row: PositionRow, isRequired: boolean): string {
  const input = row.input;
  if (!input) return '';
  if (input.default !== undefined) return `default ${input.default}`;
  if (isRequired) return row.options ? 'choose with ←/→' : 'required';
  return row.options ? 'not set' : 'optional';
}

/** The conditions of a position, one field per role input, checked as typed; Enter solves. */
export function PositionFormScreen({ draft, width, height, isActive }: PositionFormScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const { catalog } = useServices();
  const role = findRole(draft.roleId) as RoleDefinition;
  const policies = useMemo(() => policyChoices(catalog.teamPolicies()), [catalog]);
  const rows = useMemo(() => positionRows(role, policies.map((p) => p.id)), [role, policies]);
  const [form, dispatch, getForm] = useSyncReducer(formReducer, () => initialForm({ ...draft.values, [POLICY_ROW]: draft.policyId }));
  const [solveError, setSolveError] = useState<string | null>(null);
  const check = useMemo(() => checkPosition(role, form.values), [role, form.values]);
  const row = rows[form.cursor]!;
  const policy = policies.find((p) => p.id === form.values[POLICY_ROW]) ?? policies[0]!;
  // Once the conditions are complete the position is solved quietly, so a hazardous one shows
  // its safety caution here too, before Enter.
  const safety = useMemo(() => {
    if (check.conditions === null) return [];
    try {
      const r = role.solve(check.conditions as never, policy);
      return r.ok ? r.position.cautions.filter((c) => c.level === 'safety') : [];
    } catch {
      return [];
    }
  }, [check, role, policy]);

  const submit = () => {
    const latest = getForm();
    const check = checkPosition(role, latest.values);
    const policy = policies.find((p) => p.id === latest.values[POLICY_ROW]) ?? policies[0]!;
    if (check.conditions === null) {
      dispatch({ type: 'attempt' });
      const bad = rows.findIndex((r) => check.fields[r.name]?.error || check.missing.includes(r.name));
      if (bad >= 0) dispatch({ type: 'focus', index: bad });
      return;
    }
    try {
      const values = Object.fromEntries(Object.entries(latest.values).filter(([k]) => k !== POLICY_ROW));
      const result = role.solve(check.conditions as never, policy);
      setSolveError(null);
      nav.push({ name: 'position', session: { draft: { ...draft, values, policyId: policy.id }, role, policy, result } });
    } catch (error) {
      setSolveError(`the role could not be solved: ${(error as Error).message}`);
    }
  };

  useKeys({ isActive, isTyping: () => !rows[getForm().cursor]?.options, commands: COMMANDS }, (command, input, key) => {
    const latest = getForm();
    const row = rows[latest.cursor]!;
    if (command === 'up' || command === 'prevField') dispatch({ type: 'move', by: -1, count: rows.length });
    else if (command === 'down' || command === 'nextField') dispatch({ type: 'move', by: 1, count: rows.length });
    else if ((command === 'cycleNext' || command === 'cyclePrev') && row.options) {
      dispatch({ type: 'set', name: row.name, value: cycleOption(row.options, latest.values[row.name] ?? '', command === 'cycleNext' ? 1 : -1) });
    } else if (command === 'erase') dispatch({ type: 'erase', name: row.name });
    else if (command === 'clearField') dispatch({ type: 'clear', name: row.name });
    else if (command === 'select') submit();
    else if (command === 'back') nav.back();
    else if (command === undefined && !row.options) dispatch({ type: 'type', name: row.name, text: typedText(input, key) });
  });

  const showIssues = form.hasAttempted || check.missing.length === 0;
  const issues = [...(showIssues ? check.formIssues : []), ...(solveError ? [solveError] : [])].flatMap((t) => wrap(`✗ ${t}`, width - 2, 2));
  const error = shownError(check, row.name, form);
  const about = row.name === POLICY_ROW ? `${policy.name}: ${policy.description}` : `${row.input!.help}`;
  const errorLines = error ? wrap(`✗ ${error}`, width - 2, 2).slice(0, 2) : [];
  const aboutLines = wrap(about, width - 2).slice(0, 4 - errorLines.length);
  const body = height - frameRows(width, safety);
  const listRows = Math.max(3, body - 3 - issues.length - errorLines.length - aboutLines.length);
  const title = draft.origin ? `${draft.origin.ref} › ${role.title}` : `New position › ${role.title}`;

  return (
    <ScreenFrame title={title} width={width} height={height} commands={COMMANDS} safety={safety} about="Type values with any unit (12 V, 1k5, 85 °C); ←/→ cycle choice fields; * marks required fields.">
      <Text color={theme.muted} wrap="truncate-end">
        {truncate(`${role.summary}`, width)}
      </Text>
      <WindowedList
        items={rows}
        cursor={form.cursor}
        height={listRows}
        keyOf={(r) => r.name}
        renderItem={(r, isFocused) => {
          const field = check.fields[r.name];
          const isPolicy = r.name === POLICY_ROW;
          const fieldError = shownError(check, r.name, form);
          return (
            <FormRow
              label={r.label}
              value={form.values[r.name] ?? ''}
              placeholder={placeholderOf(r, field?.isRequired ?? false)}
              isFocused={isFocused}
              isRequired={field?.isRequired ?? false}
              isChoice={r.options !== undefined}
              {...(fieldError ? { error: fieldError } : {})}
              {...(field?.note ? { note: field.note } : isPolicy ? { note: policy.name } : {})}
              width={width}
            />
          );
        }}
      />
      <Box flexDirection="column">
        {issues.map((line, i) => (
          <Text key={`i${i}`} color={theme.bad}>
            {line}
          </Text>
        ))}
        {errorLines.map((line, i) => (
          <Text key={`e${i}`} color={theme.bad}>
            {line}
          </Text>
        ))}
        {aboutLines.map((line, i) => (
          <Text key={`a${i}`} color={theme.muted}>
            {line}
          </Text>
        ))}
      </Box>
    </ScreenFrame>
  );
}
