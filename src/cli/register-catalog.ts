import type { Command } from 'commander';
import { EXIT } from './cli-error.js';
import { jsonDocument, makeOutput } from './output.js';

// Each command loads its own modules when it runs, so start-up pays only for the one in use.
type Opts = Record<string, string | boolean | undefined>;

export function registerCatalogCommands(program: Command): void {
  const catalog = program.command('catalog').description('keep the parts catalog and the approved-parts list');

  catalog
    .command('import <file>')
    .description('add or update parts from a CSV or JSON file; nothing is written if any row is bad')
    .option('--format <format>', 'csv or json (default: from the file name)')
    .option('--skip-invalid', 'write the good rows and report the bad ones')
    .option('--keep-local', 'where a part changed both here and in the file, keep this catalog\'s version')
    .option('--overwrite-local', 'where a part changed both here and in the file, take the file\'s version')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .option('--json', 'write the result as JSON')
    .action(async (file: string, _o: Opts, cmd: Command) => {
      const { ImportConflictError, runCatalogImport } = await import('./commands/catalog-import.js');
      const { printConflicts, printImportSummary } = await import('./print/import-summary.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      try {
        const result = runCatalogImport(file, o);
        out.write(out.json ? jsonDocument('catalog import', result) : printImportSummary(result));
      } catch (error) {
        if (!(error instanceof ImportConflictError)) throw error;
        if (out.json) out.write(jsonDocument('catalog import', { ok: false, conflicts: error.conflicts }));
        out.note(printConflicts(error));
        process.exitCode = EXIT.checkFailed;
      }
    });

  catalog
    .command('export [file]')
    .description('write the whole catalog in canonical order (stdout when no file is named)')
    .option('--format <format>', 'csv or json (default: from the file name, else csv)')
    .action(async (file: string | undefined, _o: Opts, cmd: Command) => {
      const { runCatalogExport } = await import('./commands/catalog-export.js');
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
    .action(async (_o: Opts, cmd: Command) => {
      const { runCatalogList } = await import('./commands/catalog-list.js');
      const { printPartList } = await import('./print/part-list.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { parts, catalogPath } = runCatalogList(o);
      out.write(out.json ? jsonDocument('catalog list', { catalog: catalogPath, parts: parts }) : printPartList(parts, catalogPath));
    });

  catalog
    .command('show <part>')
    .description('every rating of one part with its test conditions (PART or MAKER:PART)')
    .option('--json', 'write the part as JSON')
    .action(async (reference: string, _o: Opts, cmd: Command) => {
      const { runCatalogShow } = await import('./commands/catalog-show.js');
      const { printPartDetail } = await import('./print/part-detail.js');
      const { encodePartCells } = await import('../catalog/index.js');
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
    .action(async (args: string[], _o: Opts, cmd: Command) => {
      const { runCatalogAdd } = await import('./commands/catalog-add.js');
      const { printPartDetail } = await import('./print/part-detail.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { part, catalogPath } = runCatalogAdd(args, o);
      out.write(out.json ? jsonDocument('catalog add', { catalog: catalogPath, part }) : `Added ${part.manufacturer} ${part.partNumber} to ${catalogPath}.\n\n${printPartDetail(part)}`);
    });

  catalog
    .command('info')
    .description('where the catalog is, its schema version and how many parts it holds')
    .option('--json', 'write the facts as JSON')
    .action(async (_o: Opts, cmd: Command) => {
      const { runCatalogInfo } = await import('./commands/catalog-info.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const info = runCatalogInfo(o);
      out.write(out.json ? jsonDocument('catalog info', info) : `Catalog ${info.path}\n  schema version ${info.schemaVersion}\n  ${info.parts} parts`);
    });

  catalog
    .command('approval <part> <state>')
    .description('change a part\'s approval state (preferred, approved, conditional, pending, banned), with its reason')
    .option('--reason <text>', 'why: recorded in the part\'s history (required)')
    .option('--condition <text>', 'the condition of a conditional approval, e.g. "only below 60 °C ambient"')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .option('--json', 'write the change as JSON')
    .action(async (reference: string, state: string, _o: Opts, cmd: Command) => {
      const { runCatalogApproval } = await import('./commands/catalog-approval.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { part, event } = runCatalogApproval(reference, state, o);
      out.write(out.json ? jsonDocument('catalog approval', { part, event }) : `${part.manufacturer} ${part.partNumber}: ${event.fromState} → ${event.toState}. Recorded as ${event.by} at ${event.at}.`);
    });

  catalog
    .command('history <part>')
    .description('the approval trail of a part, oldest first (append-only)')
    .option('--json', 'write the trail as JSON')
    .action(async (reference: string, _o: Opts, cmd: Command) => {
      const { runCatalogHistory } = await import('./commands/catalog-approval.js');
      const { printHistory } = await import('./print/catalog-team.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const { part, events } = runCatalogHistory(reference, o);
      out.write(out.json ? jsonDocument('catalog history', { part, events }) : printHistory(part, events));
    });

  catalog
    .command('groups')
    .description('second-source groups with how many fields differ between their members')
    .option('--json', 'write the groups as JSON')
    .action(async (_o: Opts, cmd: Command) => {
      const { runGroupList } = await import('./commands/catalog-groups.js');
      const { printGroupList } = await import('./print/catalog-team.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const groups = runGroupList(o);
      out.write(out.json ? jsonDocument('catalog groups', { groups }) : printGroupList(groups));
    });

  catalog
    .command('group <name> [parts...]')
    .description('show a second-source group and what differs between its members; with parts, declare them interchangeable')
    .option('--json', 'write the group as JSON')
    .action(async (groupName: string, parts: string[], _o: Opts, cmd: Command) => {
      const { runGroupDeclare, runGroupShow } = await import('./commands/catalog-groups.js');
      const { printGroup } = await import('./print/catalog-team.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      if (parts.length === 0) {
        const group = runGroupShow(groupName, o);
        return out.write(out.json ? jsonDocument('catalog group', { group }) : printGroup(group));
      }
      const { group, moved } = runGroupDeclare(groupName, parts, o);
      const notes = moved.map((p) => `Moved ${p.partNumber} out of group ${p.secondSourceGroup}.`);
      out.write(out.json ? jsonDocument('catalog group', { group, moved }) : [...notes, printGroup(group)].join('\n'));
    });

  catalog
    .command('ungroup <part>')
    .description('take a part out of its second-source group')
    .action(async (reference: string, _o: Opts, cmd: Command) => {
      const { runGroupLeave } = await import('./commands/catalog-groups.js');
      const { part, dissolved } = runGroupLeave(reference, cmd.optsWithGlobals());
      process.stdout.write(`${part.partNumber} left its group.${dissolved ? ` Group ${dissolved} had one member left and was dissolved.` : ''}\n`);
    });

  catalog
    .command('diff <before> <after>')
    .description('compare two exports (.csv/.json) or catalog files (.sqlite): added, removed, changed, approval moves; exit 1 if they differ')
    .option('--json', 'write the differences as JSON')
    .action(async (before: string, after: string, _o: Opts, cmd: Command) => {
      const { runCatalogDiff } = await import('./commands/catalog-diff.js');
      const { printDiff } = await import('./print/catalog-team.js');
      const { isEmptyDiff } = await import('../parts/index.js');
      const out = makeOutput(Boolean(cmd.optsWithGlobals().json));
      const outcome = runCatalogDiff(before, after);
      out.write(out.json ? jsonDocument('catalog diff', outcome) : printDiff(outcome));
      if (!isEmptyDiff(outcome.diff)) process.exitCode = EXIT.checkFailed;
    });

  catalog
    .command('check')
    .description('SQLite integrity check plus our own: every part valid, approval history consistent; exit 1 on a finding')
    .option('--json', 'write the findings as JSON')
    .action(async (_o: Opts, cmd: Command) => {
      const { checkCatalog } = await import('../catalog/index.js');
      const { withCatalog } = await import('./catalog-session.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const result = withCatalog(o, (c) => checkCatalog(c));
      out.write(
        out.json
          ? jsonDocument('catalog check', result)
          : [
              `Catalog ${result.path}: schema ${result.schemaVersion}, ${result.parts} parts, ${result.historyEntries} history entries.`,
              result.isHealthy ? 'No problems found.' : `${result.findings.length} problem${result.findings.length === 1 ? '' : 's'}:`,
              ...result.findings.map((f) => `  [${f.check}] ${f.message}`),
            ].join('\n'),
      );
      if (!result.isHealthy) process.exitCode = EXIT.checkFailed;
    });
}
