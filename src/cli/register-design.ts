import type { Command } from 'commander';
import { EXIT } from './cli-error.js';
import { jsonDocument, makeOutput } from './output.js';

// Each command loads its own modules when it runs, so start-up pays only for the one in use.
export function registerDesignCommands(program: Command): void {
  program
    .command('roles')
    .description('list the circuit roles with their conditions, units and defaults')
    .option('--json', 'write the roles as JSON')
    .action(async (_o: unknown, cmd: Command) => {
      const { runRoles } = await import('./commands/roles.js');
      const { printRoleList } = await import('./print/role-list.js');
      const out = makeOutput(Boolean(cmd.optsWithGlobals().json));
      const roles = runRoles();
      out.write(out.json ? jsonDocument('roles', { roles }) : printRoleList(roles));
    });

  const policies = program.command('policies').description('derating policies: the built-in ones and the team\'s own');
  policies
    .command('list', { isDefault: true })
    .description('list every policy with its factors and their sources')
    .option('--json', 'write the policies as JSON')
    .action(async (_o: unknown, cmd: Command) => {
      const { runPolicyList } = await import('./commands/policies.js');
      const { printPolicyList } = await import('./print/policy-list.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const list = runPolicyList(o);
      out.write(out.json ? jsonDocument('policies', { policies: list }) : printPolicyList(list));
    });
  policies
    .command('add <file>')
    .description('add or replace a team policy from a YAML or JSON file (see docs/design-format.md)')
    .option('--by <name>', 'who the change is recorded as (default: your OS user)')
    .action(async (file: string, _o: unknown, cmd: Command) => {
      const { runPolicyAdd } = await import('./commands/policies.js');
      const { policy, isNew } = runPolicyAdd(file, cmd.optsWithGlobals());
      process.stdout.write(`${isNew ? 'Added' : 'Replaced'} policy ${policy.id} (${policy.name}).\n`);
    });

  program
    .command('solve <design>')
    .description('operating point, limits, derivation and cautions of one position of a design file')
    .option('--ref <designator>', 'the position, e.g. D3')
    .option('--json', 'write the result as JSON')
    .action(async (design: string, _o: unknown, cmd: Command) => {
      const { runSolve } = await import('./commands/solve.js');
      const { printSolvedPosition } = await import('./print/solved-position.js');
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
    .action(async (_o: unknown, cmd: Command) => {
      const { runJunction } = await import('./commands/junction.js');
      const { formatStepValue } = await import('../circuits/derivation.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const e = runJunction(o);
      if (out.json) return out.write(jsonDocument('junction', { estimate: e }));
      const lines = [`${e.profile} junction: breakdown ${formatStepValue({ value: e.breakdownV, unit: 'voltage' })}, mechanism ${e.mechanism}, tempco ${e.tempcoSign}`];
      e.steps.forEach((s, i) => lines.push(`  ${i + 1}. ${s.quantity}: ${s.symbol} = ${s.formula}`, `     = ${s.substituted}${s.source ? `   [${s.source}]` : ''}`));
      for (const c of e.cautions) lines.push(`  - ${c.text}`);
      out.write(lines.join('\n'));
    });

  program
    .command('swap <original> [alternate]')
    .description('can ALTERNATE replace ORIGINAL? rating by rating, package and, with --design/--ref, in the circuit; exit 1 if not a safe drop-in')
    .option('--design <file>', 'design file of the position to judge both parts in')
    .option('--ref <designator>', 'the position, e.g. D3')
    .option('--find', 'list catalog parts that could replace ORIGINAL, best first')
    .option('--top <n>', 'how many replacements to list with --find (default 10)')
    .option('--json', 'write the comparison as JSON')
    .action(async (original: string, alternate: string | undefined, _o: unknown, cmd: Command) => {
      const { runSwap } = await import('./commands/swap.js');
      const { printSwap } = await import('./print/swap-result.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const outcome = runSwap(original, alternate, o);
      out.write(out.json ? jsonDocument('swap', outcome) : printSwap(outcome));
      const isSafe = outcome.mode === 'check' ? outcome.check.isDropIn : outcome.replacements.some((r) => r.check.isDropIn);
      if (!isSafe) process.exitCode = EXIT.checkFailed;
    });

  program
    .command('audit <design>')
    .description('check every position of a design: part exists, approved for use, meets every limit; exit 1 on any failure')
    .option('--report <file>', 'also write a report: .md for review comments, .html for a self-contained page with margin charts')
    .option('--bom <file>', 'take the assigned parts from a BOM CSV (designator, manufacturer, part number)')
    .option('--bom-columns <mapping>', 'name the BOM headers, e.g. "ref=Designator,maker=Mfr,part=MPN"')
    .option('--allow-unknown', 'do not fail limits the datasheet leaves unknown (they are still reported)')
    .option('--json', 'write the audit as JSON')
    .action(async (design: string, _o: unknown, cmd: Command) => {
      const { runAudit } = await import('./commands/audit.js');
      const { printAudit } = await import('./report/audit-text.js');
      const o = cmd.optsWithGlobals();
      const out = makeOutput(Boolean(o.json));
      const result = runAudit(design, o);
      out.write(out.json ? jsonDocument('audit', result) : printAudit(result));
      if (o.report) out.note(`Wrote the report to ${o.report}.`);
      if (!result.isPassing) process.exitCode = EXIT.checkFailed;
    });
}
