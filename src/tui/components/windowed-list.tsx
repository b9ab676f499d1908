import { Box, Text } from 'ink';
import type { ReactNode } from 'react';
import { useTheme } from '../hooks/use-theme.js';

export interface WindowedListProps<T> {
  readonly items: readonly T[];
  readonly cursor: number;
  /** Rows visible at once, not counting the two indicator rows. */
  readonly height: number;
  readonly renderItem: (item: T, isSelected: boolean, index: number) => ReactNode;
  readonly keyOf: (item: T, index: number) => string;
  /** Items before the first one given (the list is a page of a longer one). @default 0 */
  readonly offset?: number;
  /** Length of the whole list when `items` is a page of it. @default items.length */
  readonly total?: number;
}

/** Where a window of `rows` starts so the cursor stays in view, near the middle. */
export function windowStart(cursor: number, rows: number, total: number): number {
  return Math.min(Math.max(0, cursor - Math.floor(rows / 2)), Math.max(0, total - rows));
}

/** Shows only the rows around the cursor, with ▲/▼ and counts when more lie above or below. */
export function WindowedList<T>({ items, cursor, height, renderItem, keyOf, offset, total }: WindowedListProps<T>) {
  const theme = useTheme();
  const rows = Math.max(1, height);
  const all = total ?? items.length;
  const start = offset ?? windowStart(cursor, rows, all);
  const visible = offset === undefined ? items.slice(start, start + rows) : items.slice(0, rows);
  return (
    <Box flexDirection="column">
      <Text color={theme.muted}>{start > 0 ? `▲ ${start} more` : ' '}</Text>
      {visible.map((item, i) => (
        <Box key={keyOf(item, start + i)}>{renderItem(item, start + i === cursor, start + i)}</Box>
      ))}
      <Text color={theme.muted}>{start + rows < all ? `▼ ${all - start - rows} more` : ' '}</Text>
    </Box>
  );
}
