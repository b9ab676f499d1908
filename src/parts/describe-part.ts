import { formatQuantity, formatWaveform } from '../units/index.js';
import { APPROVAL_LABELS, KIND_LABELS, LIFECYCLE_LABELS } from './part-kinds.js';
import { PART_FIELDS } from './part-fields.js';
import type { Part } from './part-schema.js';

export interface DescribedRow {
  readonly label: string;
  readonly value: string;
  readonly section: 'identity' | 'ratings';
}

const T = (k: number) => formatQuantity(k, 'temperature');

// These appear beside the rating they condition rather than on rows of their own.
const CONDITION_KEYS = new Set(['ifAvRefK', 'ifAvRef', 'ifsmPulseS', 'cjVrV', 'iztA', 'vbrItA', 'ippA', 'pppmRiseS', 'pppmDecayS']);

function conditions(part: Part): Record<string, string | undefined> {
  return {
    ifAvA: part.ifAvRefK !== undefined ? `at ${T(part.ifAvRefK)} ${part.ifAvRef ?? ''}`.trim() : undefined,
    ifsmA: part.ifsmPulseS !== undefined ? `${formatQuantity(part.ifsmPulseS, 'time')} pulse` : undefined,
    cjF: part.cjVrV !== undefined ? `at VR ${formatQuantity(part.cjVrV, 'voltage')}` : undefined,
    vzV: part.iztA !== undefined ? `at IZT ${formatQuantity(part.iztA, 'current')}` : undefined,
    vbrMinV: part.vbrItA !== undefined ? `at IT ${formatQuantity(part.vbrItA, 'current')}` : undefined,
    vcV: part.ippA !== undefined ? `at IPP ${formatQuantity(part.ippA, 'current')}` : undefined,
    pppmW:
      part.pppmRiseS !== undefined && part.pppmDecayS !== undefined
        ? `${formatWaveform({ riseS: part.pppmRiseS, decayS: part.pppmDecayS })} pulse`
        : undefined,
  };
}

/** Every stored fact of a part as label/value rows, each rating with its test condition. */
export function describePart(part: Part): DescribedRow[] {
  const rows: DescribedRow[] = [];
  const id = (label: string, value: string) => rows.push({ label, value, section: 'identity' });
  const rating = (label: string, value: string) => rows.push({ label, value, section: 'ratings' });
  id('Kind', KIND_LABELS[part.kind]);
  id('Package', part.package);
  if (part.description) id('Description', part.description);
  id('Lifecycle', LIFECYCLE_LABELS[part.lifecycle]);
  id('Approval', APPROVAL_LABELS[part.approval] + (part.approvalNote ? ` — ${part.approvalNote}` : ''));
  if (part.secondSourceGroup) id('Second-source group', part.secondSourceGroup);
  if (part.unitPrice !== undefined) id('Unit price', `${part.unitPrice} ${part.currency ?? ''}`.trim());
  if (part.datasheetUrl) id('Datasheet', part.datasheetUrl);
  if (part.notes) id('Notes', part.notes);

  const withCondition = conditions(part);
  const record = part as unknown as Record<string, unknown>;
  const firstRating = PART_FIELDS.findIndex((f) => f.key === 'vrrmV');
  for (const field of PART_FIELDS.slice(firstRating)) {
    // IPP stands on its own only when no VC is given to carry it as a condition.
    if (CONDITION_KEYS.has(field.key) && !(field.key === 'ippA' && part.vcV === undefined)) continue;
    const value = record[field.key];
    if (field.type === 'vf-points') {
      for (const p of part.vfPoints) {
        rating('VF', `${formatQuantity(p.vfV, 'voltage')} at ${formatQuantity(p.ifA, 'current')}, Tj ${T(p.tjK)}`);
      }
    } else if (field.type === 'ir-points') {
      for (const p of part.irPoints) {
        rating('IR', `${formatQuantity(p.irA, 'current')} at ${formatQuantity(p.vrV, 'voltage')}, Tj ${T(p.tjK)}`);
      }
    } else if (typeof value === 'number' && field.quantity) {
      const condition = withCondition[field.key];
      rating(field.label, formatQuantity(value, field.quantity) + (condition ? ` ${condition}` : ''));
    }
  }
  return rows;
}
