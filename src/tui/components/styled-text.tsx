import { Text } from 'ink';
import { safeText } from '../../parts/index.js';
import { useTheme } from '../hooks/use-theme.js';
import type { StyledLine } from '../text/styled.js';
import { colourOf } from '../theme.js';

export interface StyledTextProps {
  readonly line: StyledLine;
  /** Shown in reverse video (the selected row). @default false */
  readonly isSelected?: boolean;
}

/** One line of styled segments; tones become colours only when the theme has them. Control characters never reach the terminal. */
export function StyledText({ line, isSelected = false }: StyledTextProps) {
  const theme = useTheme();
  return (
    <Text inverse={isSelected} wrap="truncate-end">
      {line.length === 0 ? ' ' : line.map((s, i) => (
        <Text key={i} color={colourOf(theme, s.tone)} bold={s.bold ?? false}>
          {safeText(s.text)}
        </Text>
      ))}
    </Text>
  );
}
