// A piscina worker. Two tasks: run one block of replicates (progress over a MessagePort,
// cancellation through a shared flag the engine checks between replicates), and finish a
// projection (summary, mean-field and matrix view) so no heavy work runs on the request
// thread.
import type { MessagePort } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { runReplicates } from '../../models/projection/replicates';
import { seriesNames, type ReplicateBlock } from '../../models/projection/trajectories';
import type { Scenario } from '../../models/scenario/types';
import { finishProjection, type ProjectionOutcome } from './outcome';

export type BlockTask = {
  kind: 'block';
  scenario: Scenario;
  from: number;
  to: number;
  progress: MessagePort;
  /** Int32Array over a SharedArrayBuffer; element 0 becomes 1 to cancel. */
  cancel: Int32Array;
};
export type FinishTask = { kind: 'finish'; scenario: Scenario; block: ReplicateBlock };

/** Hands typed arrays' memory to the other thread instead of copying (piscina's transferable protocol). */
function moving<T>(value: T, block: ReplicateBlock) {
  const buffers = seriesNames.map((n) => block.series[n].buffer);
  return Piscina.move({
    get [Piscina.transferableSymbol]() {
      return buffers;
    },
    get [Piscina.valueSymbol]() {
      return value;
    },
  } as never) as unknown as T;
}

function runBlock(task: BlockTask) {
  let reported = 0;
  const step = Math.max(1, Math.floor((task.to - task.from) / 50));
  const block = runReplicates(task.scenario, task.from, task.to, {
    onProgress(done) {
      if (done - reported >= step || done === task.to - task.from) {
        task.progress.postMessage(done - reported);
        reported = done;
      }
    },
    shouldCancel: () => Atomics.load(task.cancel, 0) === 1,
  });
  task.progress.close();
  return moving(block, block);
}

function finish(task: FinishTask): ProjectionOutcome {
  return finishProjection(task.scenario, task.block);
}

export default function handle(task: BlockTask | FinishTask) {
  return task.kind === 'block' ? runBlock(task) : finish(task);
}
