import { searchKey } from '../selection/query/search-text.js';

/*
 * A part is found by maker and number along part_key (migration 007), which starts with the
 * part-number key: every look-up names the key too, or SQLite would scan the table.
 */

/** Matches one part by maker and number, letter case ignored; bind identityParams(…). */
export const IDENTITY_WHERE = 'search_key = ? AND part_number = ? COLLATE NOCASE AND manufacturer = ? COLLATE NOCASE';

export function identityParams(manufacturer: string, partNumber: string): [string, string, string] {
  return [searchKey(partNumber), partNumber, manufacturer];
}

/** Matches the parts with this number, any maker; bind numberParams(…). */
export const NUMBER_WHERE = 'search_key = ? AND part_number = ? COLLATE NOCASE';

export function numberParams(partNumber: string): [string, string] {
  return [searchKey(partNumber), partNumber];
}

/** The order of part_key: the catalog listed by part number, separators and letter case ignored. */
export const KEY_ORDER = 'search_key, part_number COLLATE NOCASE, manufacturer COLLATE NOCASE';
