import type { Command } from 'commander';
import { runCatalogAdd } from './commands/catalog-add.js';
import { runCatalogExport } from './commands/catalog-export.js';
import { runCatalogImport } from './commands/catalog-import.js';
import { runCatalogInfo } from './commands/catalog-info.js';
import { runCatalogList } from './commands/catalog-list.js';
import { runCatalogShow } from './commands/catalog-show.js';
import { jsonDocument, makeOutput } from './output.js';
import { printPartDetail } from './print/part-detail.js';
import { printPartList } from './print/part-list.js';
import { printImportSummary } from './print/import-summary.js';
import { encodePartCells } from '../catalog/index.js';

type Opts = Record<string, string | boolean | undefined>;

export function registerCatalogCommands(program: Command): void {
  const catalog = program.command('catalog').description('keep the parts catalog: import, export, list, show, add');

  catalog
    .command('import <file>')
    .description('add or update parts from a CSV or JSON file; nothing is written if any row is bad')
    .option('--format <format>', 'csv or json (default: from the file name)')
    .option('--skip-invalid', 'write the good rows and report the bad ones')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .option('--json', 'write the result as JSON')
    .action((file: string, _o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const result = runCatalogImport(file, o);
      out.write(out.json ? jsonDocument('catalog import', result) : printImportSummary(result));
    });

  catalog
    .command('export [file]')
    .description('write the whole catalog in canonical order (stdout when no file is named)')
    .option('--format <format>', 'csv or json (default: from the file name, else csv)')
    .action((file: string | undefined, _o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const result = runCatalogExport(file, o);
      if (file) process.stderr.write(`Wrote ${result.parts} parts to ${file}.\n`);
      else process.stdout.write(result.text);
    });

  catalog
    .command('list')
    .description('list parts, optionally of one kind, approval state or maker')
    .option('--kind <kind>', 'rectifier, fast-recovery, ultrafast, schottky, sic-schottky, zener, tvs-uni, tvs-bi or signal')
    .option('--approval <state>', 'preferred, approved, conditional, pending or banned')
    .option('--maker <name>', 'manufacturer name')
    .option('--json', 'write the parts as JSON')
    .action((_o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { parts, catalogPath } = runCatalogList(o);
      out.write(out.json ? jsonDocument('catalog list', { catalog: catalogPath, parts: parts }) : printPartList(parts, catalogPath));
    });

  catalog
    .command('show <part>')
    .description('every rating of one part with its test conditions (PART or MAKER:PART)')
    .option('--json', 'write the part as JSON')
    .action((reference: string, _o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const part = runCatalogShow(reference, o);
      out.write(out.json ? jsonDocument('catalog show', { part, columns: encodePartCells(part) }) : printPartDetail(part));
    });

  catalog
    .command('add <column=value...>')
    .description('add one part from column=value pairs, e.g. kind=schottky vrrm_v="40 V"')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .option('--json', 'write the added part as JSON')
    .action((args: string[], _o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { part, catalogPath } = runCatalogAdd(args, o);
      out.write(out.json ? jsonDocument('catalog add', { catalog: catalogPath, part }) : `Added ${part.manufacturer} ${part.partNumber} to ${catalogPath}.\n\n${printPartDetail(part)}`);
    });

  catalog
    .command('info')
    .description('where the catalog is, its schema version and how many parts it holds')
    .option('--json', 'write the facts as JSON')
    .action((_o: Opts, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const info = runCatalogInfo(o);
      out.write(out.json ? jsonDocument('catalog info', info) : `Catalog ${info.path}\n  schema version ${info.schemaVersion}\n  ${info.parts} parts`);
    });
}
