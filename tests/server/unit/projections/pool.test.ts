import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createProjectionPool } from '../../../../server/projections/pool';
import { runProjection } from '../../../../models/projection/run';
import { parseScenario } from '../../../../shared/scenario/parse';
import type { Scenario } from '../../../../models/scenario/types';

function demo(replicates: number): Scenario {
  const json = JSON.parse(readFileSync('models/examples/demo-perennial-dock.json', 'utf8'));
  json.replicates = replicates;
  json.horizonYears = 12;
  const parsed = parseScenario(json);
  if (!parsed.ok) throw new Error('example invalid');
  return parsed.scenario;
}

const one = createProjectionPool({ threads: 1 });
const two = createProjectionPool({ threads: 2 });
afterAll(async () => {
  await Promise.all([one.destroy(), two.destroy()]);
});

// Reproducibility is the engine's promise: the split into blocks and threads must not show.
describe('the projection worker pool', () => {
  it('gives identical results with 1 and 2 threads, equal to the CLI’s runProjection', async () => {
    const scenario = demo(300);
    const [a, b] = await Promise.all([one.run(scenario), two.run(scenario)]);
    expect(b.summary).toEqual(a.summary);
    const cli = runProjection(scenario);
    expect(a.summary).toEqual(cli.summary);
    expect(a.meanField).toEqual(cli.meanField);
  });

  it('reports progress up to every replicate', async () => {
    const seen: number[] = [];
    await two.run(demo(200), { onProgress: (n) => seen.push(n) });
    expect(seen.length).toBeGreaterThan(1);
    expect(seen.at(-1)).toBe(200);
    expect([...seen].sort((x, y) => x - y)).toEqual(seen);
  });

  it('stops when cancelled', async () => {
    const controller = new AbortController();
    const big = { ...demo(20_000), horizonYears: 12 };
    let last = 0;
    const run = two.run(big, {
      signal: controller.signal,
      onProgress: (n) => {
        last = n;
        if (n > 100) controller.abort();
      },
    });
    await expect(run).rejects.toThrow('cancelled');
    expect(last).toBeLessThan(20_000);
  });
});
