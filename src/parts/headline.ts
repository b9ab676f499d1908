import { formatQuantity } from '../units/index.js';
import { isRectifying, isTvs } from './part-kinds.js';
import type { Part } from './part-schema.js';

/** The one or two ratings that say what a part is for, by kind. */
export function headlineRatings(part: Part): string {
  if (isRectifying(part.kind)) {
    return `${formatQuantity(part.vrrmV!, 'voltage')} ${formatQuantity(part.ifAvA!, 'current')}`;
  }
  if (part.kind === 'zener') {
    return `VZ ${formatQuantity(part.vzV!, 'voltage')} ±${formatQuantity(part.vzTol!, 'ratio')} ${formatQuantity(part.pdW!, 'power')}`;
  }
  if (isTvs(part.kind)) {
    return `VRWM ${formatQuantity(part.vrwmV!, 'voltage')} ${formatQuantity(part.pppmW!, 'power')}`;
  }
  return '';
}

/** Forward drop at the lowest-temperature point, as datasheets headline it. */
export function headlineVf(part: Part): string {
  const p = [...part.vfPoints].sort((a, b) => a.tjK - b.tjK || a.ifA - b.ifA)[0];
  return p ? `${formatQuantity(p.vfV, 'voltage')} @ ${formatQuantity(p.ifA, 'current')}` : '—';
}
