import type { RowIssue } from '../row-issue.js';
import { FIELD_VALUE_COLUMNS } from './field-values.js';
import { MANUFACTURER_AT, PART_NUMBER_AT, WRITE_COLUMNS, identityOf, type SqlValue } from './row-values.js';
import { TextTable } from './text-table.js';

const FIELD_VALUE_AT = FIELD_VALUE_COLUMNS.map((c) => WRITE_COLUMNS.indexOf(c));

/**
 * What an import remembers across the rows of one file: each part it named (maker and number,
 * letter case ignored) with its line, so a second row for the same part is refused, and the
 * distinct values of the word-searched fields (part_field_value).
 */
export class FileIdentities {
  private readonly named = new TextTable<number>();
  private readonly values = FIELD_VALUE_COLUMNS.map(() => new TextTable<true>());

  constructor(private readonly file: string) {}

  /** The row's part is new to the file (undefined), or the issue naming the line that had it. */
  admit(values: readonly SqlValue[], line: number): RowIssue | undefined {
    const partNumber = values[PART_NUMBER_AT] as string;
    const earlier = this.named.setIfAbsent(identityOf(values[MANUFACTURER_AT] as string, partNumber), line);
    if (earlier !== undefined) {
      return { file: this.file, line, column: 'part_number', value: partNumber, message: `the same manufacturer and part number as line ${earlier}`, expected: 'each part once per file' };
    }
    for (let i = 0; i < FIELD_VALUE_AT.length; i++) this.values[i]!.setIfAbsent(values[FIELD_VALUE_AT[i]!] as string, true);
    return undefined;
  }

  fieldValues(): Record<string, string[]> {
    return Object.fromEntries(FIELD_VALUE_COLUMNS.map((c, i) => [c, [...this.values[i]!.keys()]]));
  }
}
