import { Text } from 'ink';
import { headlineRatings, safeText, type Part } from '../../parts/index.js';

import { useTheme } from '../hooks/use-theme.js';

export interface PartRowProps {
  readonly part: Part;
  readonly isSelected: boolean;
  /** Terminal columns available for the row. */
  readonly width: number;
}

const fit = (text: string, width: number) => {
  const chars = [...safeText(text)];
  return chars.length > width ? chars.slice(0, Math.max(0, width - 1)).join('') + '…' : chars.join('').padEnd(width);
};

function rowCells(texts: { number: string; maker: string; kind: string; pkg: string; ratings: string; approval: string }, width: number): string {
  const isWide = width >= 110;
  return [
    fit(texts.number, 18),
    ...(isWide ? [fit(texts.maker, 22)] : []),
    fit(texts.kind, 13),
    fit(texts.pkg, 9),
    fit(texts.ratings, isWide ? 30 : 22),
    fit(texts.approval, 11),
  ].join(' ');
}

/** Column names above the rows, aligned with them. */
export function PartRowHeader({ width }: { readonly width: number }) {
  const theme = useTheme();
  const cells = rowCells({ number: 'Part number', maker: 'Manufacturer', kind: 'Kind', pkg: 'Package', ratings: 'Ratings', approval: 'Approval' }, width);
  return <Text color={theme.muted}>{fit(`  ${cells}`, Math.max(10, width - 1))}</Text>;
}

/** One catalog part on one line; the maker column only appears when the terminal is wide enough. */
export function PartRow({ part, isSelected, width }: PartRowProps) {
  const theme = useTheme();
  const cells = rowCells(
    { number: part.partNumber, maker: part.manufacturer, kind: part.kind, pkg: part.package, ratings: headlineRatings(part), approval: part.approval },
    width,
  );
  const line = fit(`${isSelected ? '›' : ' '} ${cells}`, Math.max(10, width - 1));
  return (
    <Text inverse={isSelected} color={part.approval === 'banned' ? theme.bad : undefined}>
      {line}
    </Text>
  );
}
