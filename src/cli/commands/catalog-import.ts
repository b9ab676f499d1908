import { existsSync } from 'node:fs';
import { formatFromPath, importPartsFile, formatRowIssue, type ImportConflict, type ImportResult } from '../../catalog/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';
import { changeAuthor } from '../user-name.js';

export interface ImportCommandOptions extends CatalogOptions {
  readonly format?: string;
  readonly skipInvalid?: boolean;
  readonly keepLocal?: boolean;
  readonly overwriteLocal?: boolean;
  readonly by?: string;
}

/** Parts changed both here and in the file: a check that failed (exit 1), not bad input. */
export class ImportConflictError extends Error {
  constructor(
    readonly file: string,
    readonly conflicts: readonly ImportConflict[],
  ) {
    super(`${file}: ${conflicts.length} part${conflicts.length === 1 ? ' was' : 's were'} changed in this catalog since the last import and differ${conflicts.length === 1 ? 's' : ''} in the file; nothing was imported`);
    this.name = 'ImportConflictError';
  }
}

export type ImportOutcome = Extract<ImportResult, { ok: true }> & { file: string; catalogPath: string };

export function runCatalogImport(file: string, options: ImportCommandOptions): ImportOutcome {
  const format = formatFromPath(file, options.format);
  if (!format) {
    throw new UsageError(`cannot tell the format of ${file}`, 'name a .csv or .json file, or give --format csv or --format json');
  }
  if (!existsSync(file)) throw new UsageError(`no file ${file}`, 'check the path');
  if (options.keepLocal && options.overwriteLocal) {
    throw new UsageError('--keep-local and --overwrite-local contradict each other', 'choose one');
  }
  return withCatalog({ ...options, create: true }, (catalog) => {
    const result = importPartsFile(catalog, file, format, {
      by: changeAuthor(options.by),
      onConflict: options.keepLocal ? 'keep-local' : options.overwriteLocal ? 'overwrite-local' : 'report',
      ...(options.skipInvalid ? { skipInvalid: true } : {}),
    });
    if (!result.ok && 'conflicts' in result) throw new ImportConflictError(file, result.conflicts);
    if (!result.ok) {
      const count = result.issues.length;
      throw new UsageError(
        `${file}: ${count} problem${count === 1 ? '' : 's'}; nothing was imported`,
        'fix the rows named above and import again, or add --skip-invalid to import only the good rows',
        result.issues.map(formatRowIssue),
        { issues: result.issues },
      );
    }
    return { ...result, file, catalogPath: catalog.path };
  });
}
