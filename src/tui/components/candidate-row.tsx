import { Text } from 'ink';
import { safeText } from '../../parts/index.js';
import type { LimitEvaluation, RankedCandidate } from '../../selection/index.js';
import { useTheme } from '../hooks/use-theme.js';
import { fit, fitRight } from '../text/fit.js';
import { colourOf } from '../theme.js';
import { VERDICT_MARK, VERDICT_TONE, marginCell } from '../views/verdict.js';

/** Which columns fit at a width, and how wide each limit's bar is. */
export interface CandidateLayout {
  readonly partWidth: number;
  readonly makerWidth: number;
  readonly packageWidth: number;
  readonly cellWidth: number;
  readonly hasPrice: boolean;
  readonly hasApproval: boolean;
}

export function candidateLayout(width: number, limitCount: number): CandidateLayout {
  const isWide = width >= 110;
  const isWider = width >= 160;
  const partWidth = isWider ? 22 : isWide ? 20 : 16;
  const makerWidth = isWider ? 22 : isWide ? 16 : 0;
  const packageWidth = isWide ? 10 : 8;
  const hasPrice = isWide;
  const hasApproval = isWider;
  const fixed = 2 + 2 + 4 + partWidth + 1 + (makerWidth ? makerWidth + 1 : 0) + packageWidth + 1 + 6 + (hasPrice ? 10 : 0) + (hasApproval ? 12 : 0) + 1;
  const cellWidth = Math.max(3, Math.min(isWider ? 10 : 8, Math.floor((width - fixed) / Math.max(1, limitCount)) - 1));
  return { partWidth, makerWidth, packageWidth, cellWidth, hasPrice, hasApproval };
}

function leftCells(layout: CandidateLayout, texts: { mark: string; rank: string; part: string; maker: string; pkg: string }): string {
  return `${texts.mark} ${fitRight(texts.rank, 3)} ${fit(texts.part, layout.partWidth)} ${layout.makerWidth ? fit(texts.maker, layout.makerWidth) + ' ' : ''}${fit(texts.pkg, layout.packageWidth)} `;
}

/** Column names, one per limit above its bar. */
export function CandidateHeader({ layout, limits, width }: { readonly layout: CandidateLayout; readonly limits: readonly LimitEvaluation[]; readonly width: number }) {
  const theme = useTheme();
  const left = '  ' + leftCells(layout, { mark: ' ', rank: '#', part: 'Part', maker: 'Maker', pkg: 'Package' });
  const cells = limits.map((l) => fit(l.label, layout.cellWidth)).join(' ');
  const right = ` ${fitRight('Score', 5)}${layout.hasPrice ? fitRight('Price', 10) : ''}${layout.hasApproval ? ' ' + fit('Approval', 11) : ''}`;
  return (
    <Text color={theme.muted} wrap="truncate-end">
      {fit(left + cells + right, width)}
    </Text>
  );
}

export interface CandidateRowProps {
  readonly candidate: RankedCandidate;
  readonly isSelected: boolean;
  readonly layout: CandidateLayout;
}

/** One ranked part: verdict symbol, rank, part, a headroom bar per limit (tightest in bold), score. */
export function CandidateRow({ candidate, isSelected, layout }: CandidateRowProps) {
  const theme = useTheme();
  const e = candidate.evaluation;
  const p = e.part;
  const mark = `${isSelected ? '›' : ' '} ${VERDICT_MARK[e.verdict]}`;
  const left = leftCells(layout, {
    mark,
    rank: e.verdict === 'fail' ? '·' : String(candidate.rank),
    part: safeText(p.partNumber),
    maker: safeText(p.manufacturer),
    pkg: safeText(p.package),
  });
  const price = p.unitPrice !== undefined ? `${p.unitPrice}${p.currency ? ' ' + safeText(p.currency) : ''}` : '—';
  const right = ` ${fitRight(candidate.score.toFixed(0), 5)}${layout.hasPrice ? fitRight(price, 10) : ''}${layout.hasApproval ? ' ' + fit(p.approval, 11) : ''}`;
  return (
    <Text inverse={isSelected} wrap="truncate-end">
      <Text color={colourOf(theme, VERDICT_TONE[e.verdict])}>{left.slice(0, 3)}</Text>
      <Text>{left.slice(3)}</Text>
      {e.limits.map((l, i) => {
        const cell = marginCell(l, layout.cellWidth);
        return (
          <Text key={i} color={colourOf(theme, cell.tone)} bold={e.tightest === l} underline={e.tightest === l}>
            {cell.text}{' '}
          </Text>
        );
      })}
      <Text>{right}</Text>
    </Text>
  );
}
