import type { Command } from 'commander';
import { EXIT } from './cli-error.js';
import { runRoles } from './commands/roles.js';
import { runSolve } from './commands/solve.js';
import { runJunction } from './commands/junction.js';
import { formatStepValue } from '../circuits/derivation.js';
import { runPolicyAdd, runPolicyList } from './commands/policies.js';
import { printPolicyList } from './print/policy-list.js';
import { jsonDocument, makeOutput } from './output.js';
import { printRoleList } from './print/role-list.js';
import { printSolvedPosition } from './print/solved-position.js';

export function registerDesignCommands(program: Command): void {
  program
    .command('roles')
    .description('list the circuit roles with their conditions, units and defaults')
    .option('--json', 'write the roles as JSON')
    .action((_o: unknown, cmd: Command) => {
      const out = makeOutput(Boolean(cmd.optsWithGlobals().json));
      const roles = runRoles();
      out.write(out.json ? jsonDocument('roles', { roles }) : printRoleList(roles));
    });

  const policies = program.command('policies').description('derating policies: the built-in ones and the team\'s own');
  policies
    .command('list', { isDefault: true })
    .description('list every policy with its factors and their sources')
    .option('--json', 'write the policies as JSON')
    .action((_o: unknown, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const list = runPolicyList(o);
      out.write(out.json ? jsonDocument('policies', { policies: list }) : printPolicyList(list));
    });
  policies
    .command('add <file>')
    .description('add or replace a team policy from a YAML or JSON file (see docs/design-format.md)')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .action((file: string, _o: unknown, cmd: Command) => {
      const { policy, isNew } = runPolicyAdd(file, cmd.optsWithGlobals());
      process.stdout.write(`${isNew ? 'Added' : 'Replaced'} policy ${policy.id} (${policy.name}).\n`);
    });

  program
    .command('solve <design>')
    .description('operating point, limits, derivation and cautions of one position of a design file')
    .option('--ref <designator>', 'the position, e.g. D3')
    .option('--json', 'write the result as JSON')
    .action((design: string, _o: unknown, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const outcome = runSolve(design, o.ref, o);
      out.write(out.json ? jsonDocument('solve', outcome) : printSolvedPosition(outcome));
      if (!outcome.result.ok) process.exitCode = EXIT.checkFailed;
    });

  program
    .command('junction')
    .description('avalanche breakdown voltage, critical field and depletion width of a silicon junction from its doping')
    .option('--doping <cm3>', 'doping of the lightly doped side of a one-sided abrupt junction, cm⁻³, e.g. 1e16')
    .option('--gradient <cm4>', 'grading constant of a linearly graded junction, cm⁻⁴, e.g. 1e20')
    .option('--bandgap <ev>', 'bandgap in eV (default 1.12, silicon)')
    .option('--json', 'write the estimate as JSON')
    .action((_o: unknown, cmd: Command) => {
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const e = runJunction(o);
      if (out.json) return out.write(jsonDocument('junction', { estimate: e }));
      const lines = [`${e.profile} junction: breakdown ${formatStepValue({ value: e.breakdownV, unit: 'voltage' })}, mechanism ${e.mechanism}, tempco ${e.tempcoSign}`];
      e.steps.forEach((s, i) => lines.push(`  ${i + 1}. ${s.quantity}: ${s.symbol} = ${s.formula}`, `     = ${s.substituted}${s.source ? `   [${s.source}]` : ''}`));
      for (const c of e.cautions) lines.push(`  - ${c.text}`);
      out.write(lines.join('\n'));
    });
}
