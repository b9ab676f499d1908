import { Box, Text } from 'ink';
import { useTheme } from '../hooks/use-theme.js';
import type { StyledLine } from '../text/styled.js';
import { StyledText } from './styled-text.js';

export interface ScrollViewProps {
  readonly lines: readonly StyledLine[];
  /** First line shown; clamped so the view is never emptier than it must be. */
  readonly offset: number;
  /** Rows available, indicators included. */
  readonly height: number;
}

/** The largest useful offset for `count` lines in `height` rows. */
export function maxOffset(count: number, height: number): number {
  return count <= height ? 0 : count - Math.max(1, height - 2);
}

/** A window over lines with "▲ n above" / "▼ n below" when there is more. */
export function ScrollView({ lines, offset, height }: ScrollViewProps) {
  const theme = useTheme();
  const rows = Math.max(1, height);
  if (lines.length <= rows) {
    return (
      <Box flexDirection="column">
        {lines.map((line, i) => (
          <StyledText key={i} line={line} />
        ))}
      </Box>
    );
  }
  const body = Math.max(1, rows - 2);
  const start = Math.min(Math.max(0, offset), lines.length - body);
  const below = lines.length - start - body;
  return (
    <Box flexDirection="column">
      <Text color={theme.muted}>{start > 0 ? `▲ ${start} more above` : ' '}</Text>
      {lines.slice(start, start + body).map((line, i) => (
        <StyledText key={start + i} line={line} />
      ))}
      <Text color={theme.muted}>{below > 0 ? `▼ ${below} more below (↓/PgDn)` : ' '}</Text>
    </Box>
  );
}
