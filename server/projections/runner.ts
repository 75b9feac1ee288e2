// Runs queued projections one at a time on the worker pool (each one's replicate blocks
// use every thread), keeps their status and progress in MariaDB, and resumes what a
// stopped server left unfinished: projections are deterministic, so re-running from
// the start gives the numbers the interrupted run would have given.
import type { Logger } from 'pino';
import type { Scenario } from '../../models/scenario/types';
import type { Database } from '../db/client';
import { findProjectionById, listUnfinished, updateProjection } from '../db/queries/projections';
import { CancelledError, type ProjectionPool } from './pool';

export type ProjectionRunner = ReturnType<typeof createProjectionRunner>;

export function createProjectionRunner(
  db: Database,
  pool: ProjectionPool,
  logger: Logger,
  options: { maxQueued: number; onFinished?: (id: string) => Promise<void> },
) {
  const queue: string[] = [];
  const running = new Map<string, AbortController>();
  let pumping: Promise<void> | null = null;
  let stopped = false;

  /** Tells the listener (notices) that a projection ended; its failure never stops the queue. */
  async function finished(id: string) {
    await options.onFinished?.(id).catch((err) => logger.error({ err, projection: id }, 'onFinished failed'));
  }

  async function runOne(id: string) {
    const row = await findProjectionById(db, id);
    if (!row || row.status !== 'queued') return;
    const controller = new AbortController();
    running.set(id, controller);
    await updateProjection(db, id, { status: 'running', startedAt: new Date(), replicatesDone: 0 });
    let lastWrite = 0;
    let pending: Promise<unknown> = Promise.resolve();
    try {
      const outcome = await pool.run(row.snapshot as Scenario, {
        signal: controller.signal,
        onProgress(done) {
          // Progress goes to the database a few times a second at most.
          const now = Date.now();
          if (now - lastWrite < 250) return;
          lastWrite = now;
          pending = pending
            .then(() => updateProjection(db, id, { replicatesDone: done }))
            .catch(() => undefined);
        },
      });
      await pending;
      await updateProjection(db, id, {
        status: 'done',
        result: outcome,
        replicatesDone: row.replicates,
        finishedAt: new Date(),
      });
    } catch (err) {
      await pending;
      // A server that is stopping leaves the row as it is; recover() resumes it next start.
      if (stopped) return;
      if (err instanceof CancelledError) {
        await updateProjection(db, id, { status: 'cancelled', finishedAt: new Date() });
      } else {
        logger.error({ err, projection: id }, 'projection failed');
        await updateProjection(db, id, {
          status: 'failed',
          error: (err as Error).message.slice(0, 2000),
          finishedAt: new Date(),
        });
      }
    } finally {
      running.delete(id);
    }
    if (!stopped) await finished(id);
  }

  function pump() {
    // The reset runs in .finally, after the assignment: reset inside the async body, an
    // empty queue would clear `pumping` before `??=` stored the settled promise, and no
    // later enqueue would ever start the loop again.
    pumping ??= (async () => {
      while (queue.length && !stopped) await runOne(queue.shift()!);
    })().finally(() => {
      pumping = null;
    });
    return pumping;
  }

  return {
    /** Whether `n` more projections fit in the queue (the route answers 429 otherwise). */
    hasRoomFor: (n: number) => queue.length + running.size + n <= options.maxQueued,
    queued: () => queue.length + running.size,
    enqueue(ids: string[]) {
      queue.push(...ids);
      void pump();
    },
    /** Cancels a queued or running projection; true if it was ours to cancel. */
    async cancel(id: string) {
      const i = queue.indexOf(id);
      if (i >= 0) {
        queue.splice(i, 1);
        await updateProjection(db, id, { status: 'cancelled', finishedAt: new Date() });
        await finished(id);
        return true;
      }
      const controller = running.get(id);
      controller?.abort();
      return !!controller;
    },
    /** At start-up: everything left queued or running goes back in the queue. */
    async recover() {
      const rows = await listUnfinished(db);
      for (const { id } of rows)
        await updateProjection(db, id, { status: 'queued', replicatesDone: 0, startedAt: null });
      if (rows.length) logger.info({ count: rows.length }, 'resuming projections left unfinished');
      queue.push(...rows.map((r) => r.id));
      void pump();
      return rows.length;
    },
    /** Stops taking work; what is queued or running stays so in MariaDB and resumes at the next start. */
    async stop() {
      stopped = true;
      queue.length = 0;
      await pool.destroy();
      await pumping?.catch(() => undefined);
    },
    /** Resolves when the queue is empty (tests and graceful shutdown). */
    idle: () => pumping ?? Promise.resolve(),
  };
}
