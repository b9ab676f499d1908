import { findPackage, isRectifying, isTvs, KIND_LABELS, type Part } from '../../parts/index.js';

export interface FitCheck {
  readonly isCompatible: boolean;
  /** One line each: what matches, what does not, what must be checked by hand. */
  readonly notes: readonly string[];
}

/** Packages whose single-diode pin-out varies between makers and is not in the catalog. */
const PINOUT_VARIES = new Set(['SOT-23', 'TO-252', 'TO-263', 'TO-220AB']);

/** Can the alternate sit on the original's footprint, doing the same job? */
export function checkFit(original: Part, alternate: Part): FitCheck {
  const notes: string[] = [];
  let isCompatible = true;
  if (original.package === alternate.package) {
    notes.push(`same package, ${original.package}`);
    if (PINOUT_VARIES.has(original.package)) notes.push(`${original.package} single-diode pin-outs differ between makers and are not in the catalog: check which pins carry anode and cathode`);
  } else {
    isCompatible = false;
    const a = findPackage(original.package);
    const b = findPackage(alternate.package);
    const terminals = a && b && a.terminals !== b.terminals ? ` (${a.terminals} against ${b.terminals} terminals)` : '';
    notes.push(`different package: ${original.package} against ${alternate.package}${terminals}; the footprint must change`);
  }
  if (original.kind === alternate.kind) {
    notes.push(`same kind, ${KIND_LABELS[original.kind]}`);
  } else if (isRectifying(original.kind) && isRectifying(alternate.kind)) {
    notes.push(`different kind: ${KIND_LABELS[original.kind]} against ${KIND_LABELS[alternate.kind]}; recovery and leakage behave differently, so check it in the circuit`);
  } else if (isTvs(original.kind) && isTvs(alternate.kind)) {
    isCompatible = false;
    notes.push(`different polarity: ${KIND_LABELS[original.kind]} against ${KIND_LABELS[alternate.kind]}`);
  } else {
    isCompatible = false;
    notes.push(`a ${KIND_LABELS[alternate.kind]} cannot do the job of a ${KIND_LABELS[original.kind]}`);
  }
  return { isCompatible, notes };
}
