import type { Command } from 'commander';
import { EXIT } from './cli-error.js';
import { runPick } from './commands/pick.js';
import { jsonDocument, makeOutput } from './output.js';
import { printPickResult } from './print/pick-result.js';

export function registerPickCommand(program: Command): void {
  program
    .command('pick <design>')
    .description('rank catalog parts for one position of a design file, each with its margins explained')
    .option('--ref <designator>', 'the position, e.g. D3')
    .option('--top <n>', 'how many candidates to show (default 10)')
    .option('--include-banned', 'rank banned parts too (scored down)')
    .option('--include-obsolete', 'rank obsolete parts too (scored down)')
    .option('--package <list>', 'preferred packages, best first, e.g. SOD-123,SMA')
    .option('--unknown-is-failure', 'count a limit the catalog cannot decide as a failure')
    .option('--json', 'write the ranking and every evaluation as JSON')
    .action((design: string, _o: unknown, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const outcome = runPick(design, o.ref, o);
      out.write(out.json ? jsonDocument('pick', outcome) : printPickResult(outcome));
      // Exit 1 when nothing passes: a script can tell "no part" from "here is a part".
      if (!outcome.result.ok || (outcome.search?.ranking.passingCount ?? 0) === 0) process.exitCode = EXIT.checkFailed;
    });
}
