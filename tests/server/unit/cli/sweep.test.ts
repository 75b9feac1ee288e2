// `sim sweep` run as a child process, as a script would: the same points whatever the number
// of worker threads, tidy CSV, and bad input refused with exit code 2 naming the problem.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../../../shared/scenario/parse';
import { runLocalSweep, sweepFileSchema } from '../../../../server/sweeps/local-run';

const sim = (...args: string[]) => {
  const run = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/sim.ts', ...args], {
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
};

const dir = mkdtempSync(join(tmpdir(), 'seedwake-sweep-'));
const example = () => JSON.parse(readFileSync('models/examples/sweep-dock-decay.json', 'utf8'));
/** The example made small: 6 points of 10 replicates. */
const small = () => ({
  ...example(),
  design: { kind: 'latin-hypercube', points: 6 },
  replicatesPerPoint: 10,
});
const file = (name: string, json: unknown) => {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(json));
  return path;
};

describe('sim sweep', () => {
  it('prints the same points with 2 worker threads as one in-process run on 1', async () => {
    const path = file('small.json', small());
    const out = sim('sweep', path, '--workers', '2');
    expect(out.stderr).toBe('');
    expect(out.code).toBe(0);
    const printed = JSON.parse(out.stdout);
    const spec = sweepFileSchema.parse(small());
    const base = parseScenario(spec.scenario);
    if (!base.ok) throw new Error('the example must parse');
    const local = await runLocalSweep(base.scenario, spec, 1);
    if (!local.ok) throw new Error('the example must plan');
    expect(printed.points).toEqual(JSON.parse(JSON.stringify(local.result.points)));
    expect(printed.totalPoints).toBe(6);
  });

  it('prints tidy CSV: a header with units, one row per point and outcome', () => {
    const out = sim('sweep', file('csv.json', small()), '--format', 'csv');
    expect(out.code).toBe(0);
    const lines = out.stdout.trimEnd().split('\r\n');
    expect(lines[0].split(',').slice(0, 3)).toEqual([
      'point',
      'point_seed',
      'profile.seedDecay.shallow (fraction per year)',
    ]);
    // Tidy data: one observation per row (Wickham 2014, J. Stat. Softw. 59(10)); 3 outcomes.
    expect(lines).toHaveLength(1 + 6 * 3);
  });

  it('refuses an unknown parameter path and a bad --workers with exit code 2', () => {
    const bad = small();
    bad.parameters[0].path = 'profile.seedDecay.middle';
    const out = sim('sweep', file('bad.json', bad));
    expect(out.code).toBe(2);
    expect(out.stdout).toBe('');
    expect(out.stderr).toMatch(
      /parameters\[0\]\.path: "profile\.seedDecay\.middle" is not a numeric parameter/,
    );
    const workers = sim('sweep', file('ok.json', small()), '--workers', '0');
    expect(workers.code).toBe(2);
    expect(workers.stderr).toMatch(/--workers must be a whole number from 1 to 64/);
  });
});
