// Throughput of the projection engine on the demo perennial (models/examples): the two
// standard sizes of issue 3 — 1,000 replicates × 20 years and 10,000 × 50 — and how time
// grows with the number of replicates and with the horizon. One thread, as one worker.
import { readFileSync } from 'node:fs';
import { parseScenario } from '../../shared/scenario/parse';
import { runReplicates } from '../../models/projection/replicates';
import { summarise } from '../../models/projection/summarise';
import type { Scenario } from '../../models/scenario/types';

function demo(replicates: number, horizonYears: number): Scenario {
  const json = JSON.parse(readFileSync('models/examples/demo-perennial-dock.json', 'utf8'));
  const parsed = parseScenario({ ...json, replicates, horizonYears });
  if (!parsed.ok) throw new Error('the demo scenario no longer validates');
  return parsed.scenario;
}

const MB = 1024 * 1024;

/**
 * Best-of-`repeats` run of all replicates. Memory is read right after the run, while the
 * trajectories are still alive (a GC during the run can make the deltas smaller than the
 * allocation); trajectoryMB is the exact size of the stored series.
 */
function timeRun(scenario: Scenario, repeats: number) {
  let seconds = Infinity;
  let summariseSeconds = Infinity;
  let draws = 0;
  let rssDeltaMB = 0;
  let heapDeltaMB = 0;
  let trajectoryMB = 0;
  for (let i = 0; i < repeats; i++) {
    const before = process.memoryUsage();
    const start = performance.now();
    const block = runReplicates(scenario, 0, scenario.replicates);
    const ran = performance.now();
    const after = process.memoryUsage();
    summarise(scenario, block);
    const done = performance.now();
    seconds = Math.min(seconds, (ran - start) / 1000);
    summariseSeconds = Math.min(summariseSeconds, (done - ran) / 1000);
    draws = block.draws;
    rssDeltaMB = (after.rss - before.rss) / MB;
    heapDeltaMB = (after.heapUsed - before.heapUsed + after.arrayBuffers - before.arrayBuffers) / MB;
    trajectoryMB = Object.values(block.series).reduce((sum, a) => sum + a.byteLength, 0) / MB;
  }
  return { seconds, summariseSeconds, draws, rssDeltaMB, heapDeltaMB, trajectoryMB };
}

function standardLine(replicates: number, years: number, repeats: number): object {
  const r = timeRun(demo(replicates, years), repeats);
  return {
    bench: 'projection',
    what: `demo perennial, ${replicates} replicates × ${years} years, one thread, best of ${repeats}`,
    replicates,
    years,
    seconds: Number(r.seconds.toFixed(4)),
    summariseSeconds: Number(r.summariseSeconds.toFixed(4)),
    replicateYearsPerSecond: Math.round((replicates * years) / r.seconds),
    draws: r.draws,
    drawsPerSecond: Math.round(r.draws / r.seconds),
    rssDeltaMB: Number(r.rssDeltaMB.toFixed(1)),
    heapDeltaMB: Number(r.heapDeltaMB.toFixed(1)),
    trajectoryMB: Number(r.trajectoryMB.toFixed(1)),
    // Peak resident set of the whole bench process so far (includes earlier benches).
    peakRssMB: Number((process.resourceUsage().maxRSS / 1024).toFixed(1)),
  };
}

function scalingLine(vary: 'replicates' | 'years', sizes: number[], fixed: number): object {
  const points = sizes.map((size) => {
    const [replicates, years] = vary === 'replicates' ? [size, fixed] : [fixed, size];
    const r = timeRun(demo(replicates, years), 2);
    return {
      [vary]: size,
      seconds: Number(r.seconds.toFixed(4)),
      microsecondsPerReplicateYear: Number(((r.seconds * 1e6) / (replicates * years)).toFixed(3)),
    };
  });
  return {
    bench: `projection-scaling-${vary}`,
    what: `demo perennial, ${vary} varied, ${vary === 'replicates' ? `${fixed} years` : `${fixed} replicates`}, best of 2`,
    points,
  };
}

export async function benchProjections(): Promise<object[]> {
  // Warm the JIT so the first measured size is not charged for compilation.
  timeRun(demo(200, 20), 1);
  return [
    standardLine(1000, 20, 5),
    standardLine(10_000, 50, 1),
    scalingLine('replicates', [250, 500, 1000, 2000], 20),
    scalingLine('years', [10, 20, 40, 80], 500),
  ];
}
