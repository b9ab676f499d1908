export { describeKind, QUANTITY_KINDS, type KindDescription, type QuantityKind } from './quantity-kinds.js';
export type { UnitIssue } from './unit-issue.js';
export { parseQuantity, type ParseQuantityOptions, type QuantityResult } from './parse-quantity.js';
export { formatQuantity, type FormatQuantityOptions } from './format-quantity.js';
export { formatWaveform, parseWaveform, type Waveform, type WaveformResult } from './waveform.js';
export { quantitySchema, type QuantitySchemaOptions } from './quantity-schema.js';
