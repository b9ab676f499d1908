import { renameSync, writeFileSync } from 'node:fs';
import { formatFromPath, listParts, writePartsText, type PartFileFormat } from '../../catalog/index.js';
import { UsageError } from '../cli-error.js';
import { withCatalog, type CatalogOptions } from '../catalog-session.js';

export interface ExportCommandOptions extends CatalogOptions {
  readonly format?: string;
}

export interface ExportOutcome {
  readonly text: string;
  readonly format: PartFileFormat;
  readonly parts: number;
  readonly file?: string;
}

/** Canonical export; to a file it is written beside and renamed, so readers never see half a file. */
export function runCatalogExport(file: string | undefined, options: ExportCommandOptions): ExportOutcome {
  const format = file ? formatFromPath(file, options.format) : formatFromPath('', options.format ?? 'csv');
  if (!format) throw new UsageError(`cannot tell the export format for ${file}`, 'name a .csv or .json file, or give --format csv or --format json');
  const parts = withCatalog(options, (catalog) => listParts(catalog));
  const text = writePartsText(parts, format);
  if (file) {
    const temp = `${file}.partial-${process.pid}`;
    writeFileSync(temp, text);
    renameSync(temp, file);
  }
  return { text, format, parts: parts.length, ...(file ? { file } : {}) };
}
