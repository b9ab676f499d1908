import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { demoSourcePath } from '../../src/catalog/index.js';
import { runCli, runCliAsync } from '../helpers/run-cli.js';
import { useTempDir } from '../helpers/temp-dir.js';

const tempDir = useTempDir();

function setup() {
  const dir = tempDir();
  const env = { HEADROOM_CATALOG: join(dir, 'team.sqlite'), XDG_DATA_HOME: join(dir, 'data') };
  expect(runCli(['catalog', 'import', demoSourcePath()], env).status).toBe(0);
  return { dir, env };
}

describe('the approved-parts list from the command line', () => {
  it('keeps a consistent, complete trail when two processes change approvals at once', async () => {
    const { env } = setup();
    const worker = (who: string, states: string[]) =>
      (async () => {
        for (const [i, state] of states.entries()) {
          const r = await runCliAsync(['catalog', 'approval', 'BWK3-40A', state, '--reason', `${who} step ${i}`, '--by', who], env);
          expect(r.stderr).toBe('');
          expect(r.status).toBe(0);
        }
      })();
    await Promise.all([worker('ana', ['banned', 'approved', 'pending', 'banned', 'approved', 'pending']), worker('ben', ['preferred', 'approved', 'pending', 'preferred', 'approved', 'pending'])]);
    const db = new Database(env.HEADROOM_CATALOG, { readonly: true });
    const trail = db.prepare("SELECT from_state, to_state, by FROM approval_event WHERE part_number = 'BWK3-40A' ORDER BY id").all() as { from_state: string | null; to_state: string; by: string }[];
    const now = db.prepare("SELECT approval FROM part WHERE part_number = 'BWK3-40A'").get() as { approval: string };
    db.close();
    expect(trail).toHaveLength(1 + 12);
    // Each change starts from the state the one before it left: no change was lost or interleaved.
    for (let i = 1; i < trail.length; i++) expect(trail[i]!.from_state).toBe(trail[i - 1]!.to_state);
    expect(now.approval).toBe(trail.at(-1)!.to_state);
    expect(trail.filter((e) => e.by === 'ana')).toHaveLength(6);
    expect(trail.filter((e) => e.by === 'ben')).toHaveLength(6);
  });

  it('shows history, refuses a change without a reason, and diffs exports with exit codes', () => {
    const { dir, env } = setup();
    const noReason = runCli(['catalog', 'approval', 'BWK3-40A', 'banned'], env);
    expect(noReason.status).toBe(2);
    expect(noReason.stderr).toContain('every approval change needs its reason');
    const before = join(dir, 'before.csv');
    runCli(['catalog', 'export', before], env);
    expect(runCli(['catalog', 'approval', 'BWK3-40A', 'banned', '--reason', 'lot 2611 failures', '--by', 'ce'], env).status).toBe(0);
    const history = runCli(['catalog', 'history', 'BWK3-40A'], env);
    expect(history.stdout).toMatch(/ce {2}preferred → banned {2}— lot 2611 failures/);
    const after = join(dir, 'after.csv');
    runCli(['catalog', 'export', after], env);
    const diff = runCli(['catalog', 'diff', before, after], env);
    expect(diff.status).toBe(1);
    expect(diff.stdout).toContain('Brackwater Semiconductor BWK3-40A: preferred → banned');
    expect(runCli(['catalog', 'diff', before, before], env).status).toBe(0);
  });

  it('reports an import conflict with exit 1 and leaves the catalog as it was', () => {
    const { env } = setup();
    runCli(['catalog', 'approval', 'BWK3-40A', 'banned', '--reason', 'local finding'], env);
    const r = runCli(['catalog', 'import', demoSourcePath()], env);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('BWK3-40A: edited here since it was last imported');
    expect(runCli(['catalog', 'show', 'BWK3-40A', '--json'], env).stdout).toContain('"approval": "banned"');
    expect(runCli(['catalog', 'import', demoSourcePath(), '--overwrite-local'], env).status).toBe(0);
  });
});
