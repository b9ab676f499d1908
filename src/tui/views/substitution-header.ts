import { safeText, type Part } from '../../parts/index.js';
import type { PositionSession } from '../state/position-draft.js';
import type { SubstitutionState } from '../state/substitution.js';
import type { StyledLine } from '../text/styled.js';
import { truncateStyled } from '../text/styled.js';

function partLine(label: string, part: Part | null, isBeingChosen: boolean, width: number): StyledLine {
  const head = { text: label.padEnd(11), tone: 'muted' as const };
  if (!part) return [head, { text: isBeingChosen ? 'none chosen yet — choose it below' : 'none chosen yet', tone: 'warn' }];
  const about = ` · ${safeText(part.package)} · ${part.kind} · ${part.approval}${part.lifecycle !== 'active' ? ` · ${part.lifecycle}` : ''}`;
  return truncateStyled([head, { text: `${safeText(part.manufacturer)} ${safeText(part.partNumber)}`, bold: true }, { text: about, tone: 'muted' }], width - 1);
}

/** The two parts, always in view above the comparison or the list. */
export function partsHeader(state: SubstitutionState, session: PositionSession | undefined, width: number): StyledLine[] {
  const lines = [partLine('Original', state.original, state.picking === 'original', width), partLine('Alternate', state.alternate, state.picking === 'alternate', width)];
  const assigned = session?.draft.origin?.part;
  // From a position without a part there is nothing in the circuit to replace yet.
  if (session && !assigned && !state.original) lines.push([{ text: 'The position has no part yet: choose the one you would place otherwise.', tone: 'muted' }]);
  return lines;
}
