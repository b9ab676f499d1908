import { Text } from 'ink';
import { useTheme } from '../hooks/use-theme.js';
import { displayWidth, fit, truncate } from '../text/fit.js';

export interface FormRowProps {
  readonly label: string;
  readonly value: string;
  /** Shown dimmed when the value is empty: the default, or what to type. */
  readonly placeholder?: string;
  readonly isFocused: boolean;
  readonly isRequired?: boolean;
  /** A choice field: ←/→ cycle it, shown ‹ value ›. */
  readonly isChoice?: boolean;
  readonly error?: string;
  /** How the value was read, shown when there is no error. */
  readonly note?: string;
  readonly width: number;
}

/** Column widths of a form at a terminal width: label, value, and the rest for messages. */
export function formColumns(width: number): { label: number; value: number } {
  if (width >= 160) return { label: 30, value: 40 };
  if (width >= 110) return { label: 28, value: 30 };
  return { label: 27, value: 20 };
}

/** The end of text that is too long, so what is being typed stays visible. */
function tail(text: string, width: number): string {
  if (displayWidth(text) <= width) return text;
  const chars = [...text];
  let out = '';
  for (let i = chars.length - 1; i >= 0 && displayWidth(out) < width - 1; i--) out = chars[i] + out;
  return '…' + out;
}

/** One field: focus mark, label (* required), value or dimmed placeholder, then its error or note. */
export function FormRow({ label, value, placeholder, isFocused, isRequired = false, isChoice = false, error, note, width }: FormRowProps) {
  const theme = useTheme();
  const cols = formColumns(width);
  const shownLabel = `${isFocused ? '›' : ' '} ${fit(label, cols.label - 5)}${isRequired ? ' *' : '  '} `;
  const room = cols.value - 1;
  let valueText: string;
  let isPlaceholder = false;
  if (isChoice) {
    const inner = value || placeholder || '';
    isPlaceholder = !value;
    valueText = fit(`‹ ${truncate(inner, room - 4)} ›`, room) + ' ';
  } else if (value) {
    valueText = fit(isFocused ? tail(value, room - 1) + '▏' : truncate(value, room), room) + ' ';
  } else {
    isPlaceholder = true;
    valueText = fit((isFocused ? '▏' : '') + (placeholder ?? ''), room) + ' ';
  }
  const rest = Math.max(0, width - cols.label - cols.value - 1);
  const message = error ? `✗ ${error}` : note ? `· ${note}` : '';
  return (
    <Text wrap="truncate-end">
      <Text bold={isFocused}>{shownLabel}</Text>
      <Text color={isPlaceholder ? theme.muted : undefined} dimColor={isPlaceholder} inverse={isFocused && isChoice}>
        {valueText}
      </Text>
      <Text color={error ? theme.bad : theme.muted}>{truncate(message, rest)}</Text>
    </Text>
  );
}
