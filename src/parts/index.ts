export * from './part-kinds.js';
export * from './packages.js';
// Types only: the zod schemas are built when a module that validates parts imports part-schema.js,
// not by everything that shows or ranks parts (start-up, bench/README.md).
export type { IrPoint, Part, PartInput, VfPoint } from './part-schema.js';
export * from './part-fields.js';
export * from './describe-part.js';
export * from './safe-text.js';
export * from './headline.js';
export * from './part-differences.js';
export * from './diff-parts.js';
