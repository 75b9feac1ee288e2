// Worker threads for sweep points, used by the durable worker loop and by the command line
// alike. Points are handed out one at a time, a few per thread ahead, so a slow point never
// holds back the others; stopping hands out no more and waits for those already running.
import { Piscina } from 'piscina';
import type { PointResult, SweepRun } from '../../shared/sweeps/evaluate';
import type { PointTask } from './point-worker';

export type PointPool = ReturnType<typeof createPointPool>;

export type ComputedPoint = { index: number; values: number[]; result: PointResult };

export function createPointPool(options: { threads: number }) {
  const pool = new Piscina({
    filename: new URL('./point-worker.ts', import.meta.url).href,
    // Every thread from the start: a sweep keeps them all busy, and a thread that starts
    // mid-chunk (loading TypeScript) would only delay it.
    minThreads: options.threads,
    maxThreads: options.threads,
    // Workers load TypeScript through tsx, whether or not the parent process did.
    execArgv: ['--import', 'tsx'],
    idleTimeout: 60_000,
  });

  /**
   * Computes the given points (index and parameter values). Resolves with every result in
   * index order, or with null when `shouldStop` turned true before all were handed out.
   */
  async function evaluate(
    run: SweepRun,
    points: readonly { index: number; values: number[] }[],
    shouldStop: () => boolean = () => false,
  ): Promise<ComputedPoint[] | null> {
    const results = new Array<ComputedPoint>(points.length);
    let next = 0;
    let stopped = false;
    // A failed task (a thread that died) stops the other lanes too, so none outlives the call.
    let failure: { error: unknown } | null = null;
    const lane = async () => {
      while (next < points.length && failure === null) {
        if (shouldStop()) {
          stopped = true;
          return;
        }
        const i = next++;
        const { index, values } = points[i];
        const task: PointTask = { run, index, values };
        try {
          results[i] = { index, values, result: (await pool.run(task)) as PointResult };
        } catch (error) {
          failure ??= { error };
        }
      }
    };
    const lanes = Math.min(points.length, options.threads * 2);
    await Promise.all(Array.from({ length: lanes }, lane));
    if (failure !== null) throw (failure as { error: unknown }).error;
    return stopped ? null : results;
  }

  return { evaluate, threads: options.threads, destroy: () => pool.destroy() };
}
