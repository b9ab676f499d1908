export * from './search-result.js';
export * from './catalog-search.js';
export * from './memory-search.js';
export { rankExact, rankFuzzy, type RankItem, type Ranked } from './rank-results.js';
export { oneSlipVariants, slipProofPieces } from './typo-variants.js';
