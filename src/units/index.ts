export { describeKind, QUANTITY_KINDS, type KindDescription, type QuantityKind } from './quantity-kinds.js';
export type { UnitIssue } from './unit-issue.js';
export { parseQuantity, type ParseQuantityOptions, type QuantityResult } from './parse-quantity.js';
export { formatQuantity, type FormatQuantityOptions } from './format-quantity.js';
export { formatWaveform, parseWaveform, type Waveform, type WaveformResult } from './waveform.js';
// quantitySchema (zod) is imported from './quantity-schema.js' by the modules that validate input,
// so showing a quantity never loads the validation library.
