export * from './compare-ratings.js';
export * from './package-fit.js';
export * from './check-substitution.js';
export * from './rank-replacements.js';
