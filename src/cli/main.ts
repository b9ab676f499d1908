#!/usr/bin/env node
import { Command, CommanderError, Option } from 'commander';
import { CatalogError, packageVersion } from '../catalog/index.js';
import { EXIT, UsageError } from './cli-error.js';
import { registerCatalogCommands } from './register-catalog.js';
import { registerDesignCommands } from './register-design.js';
import { runHome } from './commands/home.js';
import { jsonDocument } from './output.js';

function buildProgram(): Command {
  const program = new Command('headroom')
    .description('Choose diodes from circuit conditions, with every limit derived and every candidate explained.')
    .version(packageVersion(), '-V, --version')
    .addOption(new Option('--catalog <path>', 'catalog file (default: HEADROOM_CATALOG, else the per-user data folder)'))
    .option('--demo', 'use the bundled demo catalog')
    .showHelpAfterError('(run headroom --help for usage)')
    .exitOverride();
  program.action(async (options: { catalog?: string; demo?: boolean }) => {
    await runHome(options);
  });
  registerCatalogCommands(program);
  registerDesignCommands(program);
  return program;
}

/** One top-level catch: every expected failure becomes a message, a next step and an exit code. */
async function main(argv: string[]): Promise<number> {
  const program = buildProgram();
  const wantsJson = argv.includes('--json');
  try {
    await program.parseAsync(argv);
    return process.exitCode === undefined ? EXIT.ok : Number(process.exitCode);
  } catch (error) {
    if (error instanceof CommanderError) {
      return error.exitCode === 0 ? EXIT.ok : EXIT.usage;
    }
    if (error instanceof UsageError || error instanceof CatalogError) {
      const hint = error.hint ? `\nNext: ${error.hint}.` : '';
      const details = error instanceof UsageError ? error.details : [];
      if (wantsJson) {
        const data = error instanceof UsageError && error.data ? error.data : {};
        process.stdout.write(jsonDocument('error', { error: { message: error.message, hint: error.hint ?? null, ...data } }) + '\n');
      }
      process.stderr.write(`headroom: ${error.message}\n${details.map((d) => `  ${d}\n`).join('')}${hint}\n`);
      return EXIT.usage;
    }
    throw error;
  }
}

main(process.argv).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`headroom: internal error: ${(error as Error)?.stack ?? String(error)}\n`);
    process.exitCode = 70;
  },
);
