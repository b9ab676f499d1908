import type { RowIssue } from '../row-issue.js';
import { FIELD_VALUE_COLUMNS } from './field-values.js';
import type { RowBatch, RowGroup } from './row-collector.js';
import { IdentityTable } from './identity-table.js';
import { MANUFACTURER_AT, PART_NUMBER_AT, WRITE_COLUMNS, type SqlValue } from './row-values.js';
import { TextTable } from './text-table.js';

const FIELD_VALUE_AT = FIELD_VALUE_COLUMNS.map((c) => WRITE_COLUMNS.indexOf(c));
/** Where admit reads a row: maker, number, then the field values. */
const ROW_AT = [MANUFACTURER_AT, PART_NUMBER_AT, ...FIELD_VALUE_AT];

/**
 * What an import remembers across the rows of one file: each part it named (maker and number,
 * letter case ignored) with its line, so a second row for the same part is refused, and the
 * distinct values of the word-searched fields (part_field_value). A large file's reader in a worker
 * thread leaves this to the writing thread (checkBatch), which has time to spare while the worker
 * reads (bench/README.md, import).
 */
export class FileIdentities {
  private readonly named = new IdentityTable();
  private readonly values = FIELD_VALUE_COLUMNS.map(() => new TextTable<true>());

  constructor(private readonly file: string) {}

  /** The row's part is new to the file (undefined), or the issue naming the line that had it. */
  admit(values: readonly SqlValue[], line: number): RowIssue | undefined {
    return this.admitAt(values, 0, ROW_AT, line);
  }

  /** The row at `offset` in `values`, its columns at offset + at[…]: maker, number, then the field values. */
  private admitAt(values: readonly SqlValue[], offset: number, at: readonly number[], line: number): RowIssue | undefined {
    const partNumber = values[offset + at[1]!] as string;
    const earlier = this.named.setIfAbsent(values[offset + at[0]!] as string, partNumber, line);
    if (earlier !== undefined) {
      return { file: this.file, line, column: 'part_number', value: partNumber, message: `the same manufacturer and part number as line ${earlier}`, expected: 'each part once per file' };
    }
    for (let i = 0; i < this.values.length; i++) this.values[i]!.setIfAbsent(values[offset + at[i + 2]!] as string, true);
    return undefined;
  }

  /**
   * The same for a batch read elsewhere: rows of parts the file named before are taken out of
   * their groups and reported. `shapes` holds the columns of every shape so far (newShapes added).
   */
  checkBatch(batch: RowBatch, shapes: readonly (readonly number[])[]): RowBatch {
    const issues: RowIssue[] = [];
    const groups = batch.groups.map((group) => this.checkGroup(group, shapes[group.shape]!, issues));
    return issues.length === 0 ? batch : { ...batch, groups: groups.filter((g) => g.lines.length > 0), issues: [...batch.issues, ...issues] };
  }

  private checkGroup(group: RowGroup, columns: readonly number[], issues: RowIssue[]): RowGroup {
    const width = columns.length;
    const at = ROW_AT.map((c) => columns.indexOf(c));
    // Every accepted row fills these columns (a description is at least ""): a shape without one is a bug.
    if (at.includes(-1)) throw new Error('a row group without maker, number, kind, package or description');
    let refused: Set<number> | undefined;
    for (let r = 0; r < group.lines.length; r++) {
      const issue = this.admitAt(group.values, r * width, at, group.lines[r]!);
      if (issue) {
        issues.push(issue);
        (refused ??= new Set()).add(r);
      }
    }
    if (!refused) return group;
    const kept = group.lines.flatMap((_, r) => (refused.has(r) ? [] : [r]));
    return { shape: group.shape, lines: kept.map((r) => group.lines[r]!), values: kept.flatMap((r) => group.values.slice(r * width, (r + 1) * width)) };
  }

  fieldValues(): Record<string, string[]> {
    return Object.fromEntries(FIELD_VALUE_COLUMNS.map((c, i) => [c, [...this.values[i]!.keys()]]));
  }
}
