import { Text } from 'ink';
import { safeText } from '../../parts/index.js';
import type { RankedReplacement } from '../../selection/substitution/index.js';
import { useTheme } from '../hooks/use-theme.js';
import { fit } from '../text/fit.js';

export interface ReplacementRowProps {
  readonly replacement: RankedReplacement;
  readonly isSelected: boolean;
  readonly width: number;
}

function cells(texts: { rank: string; mark: string; number: string; maker: string; approval: string; basis: string }, width: number): string {
  const isWide = width >= 110;
  return [fit(texts.rank, 3), fit(texts.mark, 1), fit(texts.number, 18), ...(isWide ? [fit(texts.maker, 22)] : []), fit(texts.approval, 11), texts.basis].join(' ');
}

/** Column names above the ranked replacements, aligned with the rows. */
export function ReplacementHeader({ width }: { readonly width: number }) {
  const theme = useTheme();
  const line = cells({ rank: '#', mark: ' ', number: 'Part number', maker: 'Manufacturer', approval: 'Approval', basis: 'Why it ranks here' }, width);
  return <Text color={theme.muted}>{fit(`  ${line}`, Math.max(10, width - 1))}</Text>;
}

/** One possible replacement: rank, ✓ drop-in or ✗ not, the part, its approval and the ranking's reason. */
export function ReplacementRow({ replacement, isSelected, width }: ReplacementRowProps) {
  const theme = useTheme();
  const c = replacement.check;
  const line = cells(
    {
      rank: String(replacement.rank),
      mark: c.isDropIn ? '✓' : '✗',
      number: safeText(c.alternate.partNumber),
      maker: safeText(c.alternate.manufacturer),
      approval: c.alternate.approval,
      basis: safeText(replacement.basis),
    },
    width,
  );
  return (
    <Text inverse={isSelected} color={c.isDropIn ? theme.good : undefined}>
      {fit(`${isSelected ? '›' : ' '} ${line}`, Math.max(10, width - 1))}
    </Text>
  );
}
