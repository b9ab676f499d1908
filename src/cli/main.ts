#!/usr/bin/env node
import { Command, CommanderError, Option } from 'commander';
import { CatalogError } from '../catalog/catalog-error.js';
import { packageVersion } from '../catalog/package-root.js';
import { EXIT, UsageError } from './cli-error.js';
import { jsonDocument } from './output.js';
import { prepareDemoCatalog } from './catalog-session.js';

/** Command groups and the module that registers them; only the one asked for is loaded. */
const GROUPS: Record<string, () => Promise<(program: Command) => void>> = {
  catalog: async () => (await import('./register-catalog.js')).registerCatalogCommands,
  design: async () => (await import('./register-design.js')).registerDesignCommands,
  pick: async () => (await import('./register-pick.js')).registerPickCommand,
};
const GROUP_OF: Record<string, string> = {
  catalog: 'catalog',
  pick: 'pick',
  roles: 'design',
  solve: 'design',
  policies: 'design',
  junction: 'design',
  swap: 'design',
  audit: 'design',
};

async function buildProgram(argv: readonly string[]): Promise<Command> {
  const program = new Command('headroom')
    .description('Choose diodes from circuit conditions, with every limit derived and every candidate explained.')
    .version(packageVersion(), '-V, --version')
    .addOption(new Option('--catalog <path>', 'catalog file (default: HEADROOM_CATALOG, else the per-user data folder)'))
    .option('--demo', 'use the bundled demo catalog')
    .showHelpAfterError('(run headroom --help for usage)')
    .exitOverride();
  program.action(async (options: { catalog?: string; demo?: boolean }) => {
    const { runHome } = await import('./commands/home.js');
    await runHome(options);
  });
  // Start-up pays only for the command group in use; help and unknown words load them all.
  const words = argv.slice(2).filter((a, i, all) => !a.startsWith('-') && all[i - 1] !== '--catalog');
  const group = words[0] !== undefined ? GROUP_OF[words[0]] : undefined;
  const wanted = group ? [group] : words.length === 0 && !argv.some((a) => a === '--help' || a === '-h') ? [] : Object.keys(GROUPS);
  for (const name of wanted) (await GROUPS[name]!())(program);
  return program;
}

/** One top-level catch: every expected failure becomes a message, a next step and an exit code. */
async function main(argv: string[]): Promise<number> {
  const wantsJson = argv.includes('--json');
  try {
    const program = await buildProgram(argv);
    if (argv.includes('--demo')) await prepareDemoCatalog();
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

/**
 * Done: leave now rather than when V8's background work (concurrent marking and compiling) winds
 * down, which held a finished `headroom pick` for about 20 ms (bench/README.md, start-up). Only
 * with nothing still queued for stdout or stderr, so no output is ever cut short.
 */
function finish(code: number): void {
  process.exitCode = code;
  if (process.stdout.writableLength === 0 && process.stderr.writableLength === 0) process.exit(code);
}

// A reader that stops early (`headroom catalog export | head`) closes the pipe: that is the end
// of the output wanted, not an error to report with a stack trace.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code !== 'EPIPE') throw error;
  process.exit(process.exitCode === undefined ? 0 : Number(process.exitCode));
});

main(process.argv).then(
  finish,
  (error: unknown) => {
    process.stderr.write(`headroom: internal error: ${(error as Error)?.stack ?? String(error)}\n`);
    process.exitCode = 70;
  },
);
