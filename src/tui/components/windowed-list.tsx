import { Box, Text } from 'ink';
import type { ReactNode } from 'react';
import { useTheme } from '../hooks/use-theme.js';

export interface WindowedListProps<T> {
  readonly items: readonly T[];
  readonly cursor: number;
  /** Rows visible at once. */
  readonly height: number;
  readonly renderItem: (item: T, isSelected: boolean) => ReactNode;
  readonly keyOf: (item: T) => string;
}

/** Shows only the rows around the cursor, with ▲/▼ when more lie above or below. */
export function WindowedList<T>({ items, cursor, height, renderItem, keyOf }: WindowedListProps<T>) {
  const theme = useTheme();
  const rows = Math.max(1, height);
  const start = Math.min(Math.max(0, cursor - Math.floor(rows / 2)), Math.max(0, items.length - rows));
  const visible = items.slice(start, start + rows);
  return (
    <Box flexDirection="column">
      <Text color={theme.muted}>{start > 0 ? `▲ ${start} more` : ' '}</Text>
      {visible.map((item, i) => (
        <Box key={keyOf(item)}>{renderItem(item, start + i === cursor)}</Box>
      ))}
      <Text color={theme.muted}>{start + rows < items.length ? `▼ ${items.length - start - rows} more` : ' '}</Text>
    </Box>
  );
}
