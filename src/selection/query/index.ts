export * from './query-types.js';
export * from './query-fields.js';
export * from './query-keywords.js';
export * from './parse-query.js';
export * from './match-part.js';
export * from './search-text.js';
export * from './edit-distance.js';
