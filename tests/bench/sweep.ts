// Throughput of sensitivity sweeps on the worker-thread pool the server's worker loop and
// `sim sweep` use: a standard sweep (the example models/examples/sweep-dock-decay.json with
// 200 Latin hypercube points of 100 replicates × 20 years) on 1 and 2 threads and the speed-up,
// and how the time grows with the number of points. The one-thread replicate-years per
// second is the rate server/sweeps/estimate.ts uses for the time estimate before launch.
import { readFileSync } from 'node:fs';
import { designPoints } from '../../models/sensitivity/points';
import type { Scenario } from '../../models/scenario/types';
import { parseScenario } from '../../shared/scenario/parse';
import { planSweep } from '../../shared/sweeps/plan';
import { sweepSpecSchema, type SweepSpec } from '../../shared/sweeps/schema';
import { createPointPool } from '../../server/sweeps/point-pool';

function standard(points: number): { base: Scenario; spec: SweepSpec } {
  const {
    scenario,
    name: _name,
    ...rest
  } = JSON.parse(readFileSync('models/examples/sweep-dock-decay.json', 'utf8'));
  const parsed = parseScenario(scenario);
  if (!parsed.ok) throw new Error('the example sweep no longer validates');
  const spec = sweepSpecSchema.parse({
    ...rest,
    design: { kind: 'latin-hypercube', points },
    replicatesPerPoint: 50,
  });
  return { base: parsed.scenario, spec };
}

/** Seconds to compute every point on `threads` threads, after a warm-up (thread start and JIT excluded). */
async function timeSweep(points: number, threads: number) {
  const { base, spec } = standard(points);
  const planned = planSweep(base, spec);
  if (!planned.ok) throw new Error(JSON.stringify(planned.problems));
  const rows = designPoints(planned.plan.parameters, spec.design, spec.seed).map((values, index) => ({
    index,
    values,
  }));
  const run = {
    base,
    paths: planned.plan.parameters.map((p) => p.path),
    outcomes: spec.outcomes,
    outcomeYear: spec.outcomeYear,
    replicatesPerPoint: spec.replicatesPerPoint,
    seed: spec.seed,
  };
  const pool = createPointPool({ threads });
  try {
    // Threads load TypeScript as they start; give them time, then warm every one up.
    await new Promise((r) => setTimeout(r, 2000));
    await pool.evaluate(run, rows.slice(0, threads * 8));
    const start = performance.now();
    await pool.evaluate(run, rows);
    const seconds = (performance.now() - start) / 1000;
    return { seconds, replicateYears: planned.plan.replicateYears };
  } finally {
    await pool.destroy();
  }
}

export async function benchSweeps(): Promise<object[]> {
  const one = await timeSweep(200, 1);
  const two = await timeSweep(200, 2);
  const line = (workers: number, r: { seconds: number; replicateYears: number }) => ({
    bench: 'sweep',
    what: `example dock sweep, 200 Latin hypercube points × 100 replicates × 20 years, ${workers} worker thread${workers > 1 ? 's' : ''}`,
    workers,
    points: 200,
    seconds: Number(r.seconds.toFixed(3)),
    pointsPerSecond: Number((200 / r.seconds).toFixed(2)),
    replicateYearsPerSecond: Math.round(r.replicateYears / r.seconds),
  });
  const scaling = [];
  for (const points of [50, 100, 200, 400]) {
    const r = await timeSweep(points, 1);
    scaling.push({
      points,
      seconds: Number(r.seconds.toFixed(3)),
      millisecondsPerPoint: Number(((r.seconds * 1000) / points).toFixed(2)),
    });
  }
  return [
    line(1, one),
    line(2, two),
    {
      bench: 'sweep-speedup',
      what: '1 → 2 worker threads, same sweep',
      speedup: Number((one.seconds / two.seconds).toFixed(2)),
    },
    {
      bench: 'sweep-scaling-points',
      what: 'example dock sweep, points varied, 1 worker thread',
      points: scaling,
    },
  ];
}
