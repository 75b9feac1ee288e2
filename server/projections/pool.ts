// The projection worker pool: a scenario's replicates are cut into blocks that run in
// worker threads (never on the request thread), then merged and summarised exactly as
// the CLI's runProjection does, so any pool size gives the same numbers.
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { mergeReplicateBlocks, seriesNames, type ReplicateBlock } from '../../models/projection/trajectories';
import type { Scenario } from '../../models/scenario/types';
import type { ProjectionOutcome } from './outcome';
import type { BlockTask, FinishTask } from './worker';

export class CancelledError extends Error {
  constructor() {
    super('cancelled');
  }
}

export type ProjectionPool = ReturnType<typeof createProjectionPool>;

export function createProjectionPool(options: { threads: number }) {
  const pool = new Piscina({
    filename: new URL('./worker.ts', import.meta.url).href,
    minThreads: 1,
    maxThreads: options.threads,
    // Workers load TypeScript through tsx, whether or not the parent process did.
    execArgv: ['--import', 'tsx'],
    idleTimeout: 60_000,
  });

  function runBlock(
    scenario: Scenario,
    from: number,
    to: number,
    cancel: Int32Array,
    onDone: (n: number) => void,
  ) {
    const channel = new MessageChannel();
    channel.port1.on('message', onDone);
    const task: BlockTask = { kind: 'block', scenario, from, to, progress: channel.port2, cancel };
    return (pool.run(task, { transferList: [channel.port2] }) as Promise<ReplicateBlock>).finally(() =>
      channel.port1.close(),
    );
  }

  type Hooks = { onProgress?(done: number): void; signal?: AbortSignal };

  /**
   * Runs every replicate of a scenario and merges the blocks. `onProgress` gets the
   * replicates done so far; aborting `signal` stops the blocks between replicates and
   * rejects with CancelledError.
   */
  async function replicates(scenario: Scenario, hooks: Hooks = {}): Promise<ReplicateBlock> {
    const R = scenario.replicates;
    // Enough blocks to keep every thread busy and the progress bar moving, none tiny.
    const blockCount = Math.max(1, Math.min(options.threads * 4, Math.ceil(R / 25)));
    const size = Math.ceil(R / blockCount);
    const cancel = new Int32Array(new SharedArrayBuffer(4));
    const onAbort = () => Atomics.store(cancel, 0, 1);
    hooks.signal?.addEventListener('abort', onAbort, { once: true });
    // Per-block counts: a block's last progress message may arrive after its result, so a
    // finished block counts in full and the reported total only ever rises.
    const blockDone: number[] = [];
    let reported = 0;
    const report = () => {
      const total = blockDone.reduce((a, b) => a + b, 0);
      if (total > reported) hooks.onProgress?.((reported = total));
    };
    try {
      const tasks: Promise<ReplicateBlock>[] = [];
      for (let from = 0, i = 0; from < R; from += size, i++) {
        const to = Math.min(R, from + size);
        blockDone[i] = 0;
        const task = runBlock(scenario, from, to, cancel, (n: number) => {
          blockDone[i] = Math.min(to - from, blockDone[i] + n);
          report();
        }).then((block) => {
          blockDone[i] = to - from;
          report();
          return block;
        });
        tasks.push(task);
      }
      // On any failure every block is told to stop and awaited, so no task outlives the run.
      const settled = await Promise.allSettled(
        tasks.map((task) => task.catch((err) => (Atomics.store(cancel, 0, 1), Promise.reject(err)))),
      );
      const failed = settled.find((r): r is PromiseRejectedResult => r.status === 'rejected');
      if (failed) throw hooks.signal?.aborted ? new CancelledError() : failed.reason;
      const blocks = settled.map((r) => (r as PromiseFulfilledResult<ReplicateBlock>).value);
      if (hooks.signal?.aborted) throw new CancelledError();
      return mergeReplicateBlocks(blocks);
    } finally {
      hooks.signal?.removeEventListener('abort', onAbort);
    }
  }

  /** A whole projection: the replicates, then summary, mean field and matrix view in a worker. */
  async function run(scenario: Scenario, hooks: Hooks = {}): Promise<ProjectionOutcome> {
    const block = await replicates(scenario, hooks);
    const finish: FinishTask = { kind: 'finish', scenario, block };
    return (await pool.run(finish, {
      transferList: seriesNames.map((n) => block.series[n].buffer) as never,
    })) as ProjectionOutcome;
  }

  return { run, replicates, threads: options.threads, destroy: () => pool.destroy() };
}
