import { decodePartCells, writeParts, type CellIssue } from '../../catalog/index.js';
import { PART_COLUMNS, type Part } from '../../parts/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { changeAuthor } from '../user-name.js';
import { IDENTITY_WHERE, identityParams } from '../../catalog/identity-sql.js';

export interface AddCommandOptions extends CatalogOptions {
  readonly by?: string;
}

/** Reads "column=value" arguments; temperatures typed without a unit are °C here, as people mean. */
export function parseAssignments(args: readonly string[]): Record<string, string> {
  const cells: Record<string, string> = {};
  for (const arg of args) {
    const eq = arg.indexOf('=');
    if (eq <= 0) {
      throw new UsageError(`"${arg}" is not of the form column=value`, `for example: vrrm_v="600 V" (columns: ${PART_COLUMNS.join(', ')})`);
    }
    const column = arg.slice(0, eq).trim();
    if (column in cells) throw new UsageError(`column ${column} given twice`, 'give each column once');
    cells[column] = arg.slice(eq + 1);
  }
  return cells;
}

export function runCatalogAdd(args: readonly string[], options: AddCommandOptions): { part: Part; catalogPath: string } {
  const cells = parseAssignments(args);
  const decoded = decodePartCells(cells, { bareTemperatureUnit: '°C' });
  if (!decoded.ok) {
    throw new UsageError(
      `the part was not added: ${decoded.issues.length} problem${decoded.issues.length === 1 ? '' : 's'}`,
      'correct the values named above and run the command again',
      decoded.issues.map(describeCellIssue),
      { issues: decoded.issues },
    );
  }
  return withCatalog({ ...options, create: true }, (catalog) => {
    const { part } = decoded;
    const exists = catalog.db
      .prepare(`SELECT 1 FROM part WHERE ${IDENTITY_WHERE}`)
      .get(...identityParams(part.manufacturer, part.partNumber));
    if (exists) {
      throw new UsageError(`${part.manufacturer} ${part.partNumber} is already in the catalog`, 'to change it, export, edit and import the catalog');
    }
    writeParts(catalog, [part], { by: changeAuthor(options.by), reason: 'added from the command line' });
    return { part, catalogPath: catalog.path };
  });
}

function describeCellIssue(issue: CellIssue): string {
  const value = issue.value ? ` "${issue.value}"` : '';
  return `${issue.column}${value}: ${issue.message}${issue.expected ? ` (expected ${issue.expected})` : ''}`;
}
