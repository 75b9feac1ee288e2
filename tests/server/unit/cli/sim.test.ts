// The sim CLI as the issue documents it, run as a child process exactly as a script would.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runProjection } from '../../../../models/projection/run';
import { parseScenario } from '../../../../shared/scenario/parse';
import { exampleJson } from '../../../models/projection/fixtures';

const sim = (...args: string[]) => {
  const run = spawnSync('npx', ['tsx', 'server/cli/sim.ts', ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
};

const dir = mkdtempSync(join(tmpdir(), 'seedwake-cli-'));
const file = (name: string, text: string) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

describe('sim project', () => {
  it('prints JSON whose summary equals runProjection for the same seed and overrides', () => {
    const out = sim(
      'project',
      'models/examples/demo-perennial-dock.json',
      '--seed',
      '99',
      '--replicates',
      '40',
      '--years',
      '6',
    );
    expect(out.code).toBe(0);
    expect(out.stderr).toBe('');
    const printed = JSON.parse(out.stdout);
    const json = { ...exampleJson('demo-perennial-dock'), seed: 99, replicates: 40, horizonYears: 6 };
    const parsed = parseScenario(json);
    if (!parsed.ok) throw new Error('example must parse');
    // Through JSON both ways, as the CLI prints it (null for an unreached decline, etc.).
    expect(printed.summary).toEqual(JSON.parse(JSON.stringify(runProjection(parsed.scenario).summary)));
    expect(printed.summary.seed).toBe(99);
  });

  it('prints CSV with a header carrying units and one row per year 0..H', () => {
    const out = sim(
      'project',
      'models/examples/annual-goosefoot.json',
      '--format',
      'csv',
      '--years',
      '7',
      '--replicates',
      '30',
    );
    expect(out.code).toBe(0);
    const lines = out.stdout.trimEnd().split('\n');
    expect(lines).toHaveLength(1 + 8);
    const header = lines[0].split(',');
    expect(header[0]).toBe('year');
    expect(header).toContain('seedbankTotal_mean (seeds/m2)');
    expect(header).toContain('depletionProbability (fraction)');
    expect(lines.slice(1).map((l) => Number(l.split(',')[0]))).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    for (const line of lines.slice(1)) expect(line.split(',')).toHaveLength(header.length);
  });
});

describe('sim analyze', () => {
  it('prints the six keys of the matrix analysis', () => {
    const out = sim('analyze', 'models/examples/matrix-three-stage.json');
    expect(out.code).toBe(0);
    const printed = JSON.parse(out.stdout);
    expect(Object.keys(printed).sort()).toEqual([
      'dampingRatio',
      'elasticities',
      'lambda',
      'reproductiveValue',
      'sensitivities',
      'stableStage',
    ]);
    // Issue 3: the stable stage sums to 1 and the reproductive value's first entry is 1.
    expect(printed.stableStage.reduce((a: number, b: number) => a + b, 0)).toBeCloseTo(1, 12);
    expect(printed.reproductiveValue[0]).toBeCloseTo(1, 12);
  });
});

describe('invalid input: exit code 2, message on stderr, nothing on stdout', () => {
  const bad = JSON.stringify({
    ...exampleJson('lesson-seedbank-decay'),
    profile: { ...exampleJson('lesson-seedbank-decay').profile, seedDecay: { shallow: 1.4, deep: 0.05 } },
  });
  const cases: [string, string[], RegExp][] = [
    ['missing file', ['project', join(dir, 'absent.json')], /absent\.json: no such file/],
    ['bad JSON', ['project', file('broken.json', '{"profile": ')], /not valid JSON/],
    [
      'schema error',
      ['project', file('bad.json', bad)],
      /profile\.seedDecay\.shallow: 1\.4 is outside 0–1 \(fraction per year\)/,
    ],
    [
      'bad flag',
      ['project', 'models/examples/annual-goosefoot.json', '--format', 'xml'],
      /--format must be json or csv/,
    ],
    [
      'bad matrix',
      ['analyze', file('m.json', '{"stages": ["a", "b"], "matrix": [[1, 2]]}')],
      /matrix: has 1 rows for 2 stages/,
    ],
  ];
  for (const [name, args, message] of cases) {
    it(name, () => {
      const out = sim(...args);
      expect(out.code).toBe(2);
      expect(out.stdout).toBe('');
      expect(out.stderr).toMatch(message);
    });
  }
});
