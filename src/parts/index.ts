export * from './part-kinds.js';
export * from './packages.js';
export * from './part-schema.js';
export * from './part-fields.js';
export * from './describe-part.js';
export * from './safe-text.js';
export * from './headline.js';
