// One worker loop: claims a chunk, computes its points on the point pool while a heartbeat
// keeps the lease, and stores the results with the chunk's completion. The web server runs
// one (SWEEP_WORKER=on) and every `npm run worker` process runs one, all against the same
// MariaDB; nothing but the database connects them.
import { hostname } from 'node:os';
import { randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Logger } from 'pino';
import type { SweepRun } from '../../shared/sweeps/evaluate';
import type { Database } from '../db/client';
import { sweeps } from '../db/schema-sweeps';
import { createPointPool, type PointPool } from './point-pool';
import { claimChunk, completeChunk, heartbeat, releaseChunk, type Claim } from './queue';

export type SweepWorkerSettings = {
  leaseSeconds: number;
  threads: number;
};

export type SweepWorker = ReturnType<typeof createSweepWorker>;

type Loaded = { run: SweepRun; points: number[][] };

/** A worker's name in the claim log: machine, process and a random tag (pids repeat). */
export const newWorkerId = () =>
  `${hostname().slice(0, 60)}:${process.pid}:${randomBytes(4).toString('hex')}`;

export function createSweepWorker(db: Database, logger: Logger, settings: SweepWorkerSettings) {
  const workerId = newWorkerId();
  // Idle workers look for work a few times per lease, at most once a second.
  const pollMs = Math.min(1000, settings.leaseSeconds * 250);
  // Three beats per lease, and at least one every 2 s so a pause or cancel is seen quickly.
  const heartbeatMs = Math.min((settings.leaseSeconds * 1000) / 3, 2000);
  let pool: PointPool | null = null;
  let loop: Promise<void> | null = null;
  let stopping = false;
  let wake: (() => void) | null = null;
  // The frozen definition and points of recent sweeps, so a chunk claim does not reload them.
  const cache = new Map<string, Loaded>();

  const sleep = (ms: number) =>
    new Promise<void>((resolve) => {
      const timer = setTimeout(done, ms);
      function done() {
        clearTimeout(timer);
        wake = null;
        resolve();
      }
      wake = done;
    });

  async function load(sweepId: string): Promise<Loaded | null> {
    const hit = cache.get(sweepId);
    if (hit) return hit;
    const [row] = await db
      .select({ definition: sweeps.definition, base: sweeps.base, points: sweeps.points })
      .from(sweeps)
      .where(eq(sweeps.id, sweepId));
    if (!row) return null;
    const d = row.definition;
    const loaded: Loaded = {
      run: {
        base: row.base,
        paths: d.parameters.map((p) => p.path),
        outcomes: d.outcomes,
        outcomeYear: d.outcomeYear,
        replicatesPerPoint: d.replicatesPerPoint,
        seed: d.seed,
      },
      points: row.points,
    };
    if (cache.size >= 4) cache.delete(cache.keys().next().value!);
    cache.set(sweepId, loaded);
    return loaded;
  }

  async function work(claim: Claim) {
    const loaded = await load(claim.sweepId);
    if (!loaded) return; // deleted with its workspace; its chunks went with it
    let stopReason: 'lost' | 'not running' | null = null;
    let beating: Promise<void> = Promise.resolve();
    const timer = setInterval(() => {
      beating = beating.then(async () => {
        try {
          const hb = await heartbeat(db, claim, workerId, settings.leaseSeconds);
          if (!hb.held) stopReason = 'lost';
          else if (hb.sweepStatus !== 'running') stopReason = 'not running';
        } catch (err) {
          // A missed beat is survivable; the lease is three beats long.
          logger.warn({ err, sweep: claim.sweepId }, 'sweep heartbeat failed');
        }
      });
    }, heartbeatMs);
    const points = [];
    for (let i = claim.firstPoint; i < claim.endPoint; i++)
      points.push({ index: i, values: loaded.points[i] });
    try {
      const computed = await pool!.evaluate(loaded.run, points, () => stopping || stopReason !== null);
      clearInterval(timer);
      await beating;
      if (computed === null || stopReason !== null) {
        // Hands it back; when another worker holds it by now, this only logs the claim as lost.
        await releaseChunk(db, claim, workerId);
        return;
      }
      const stored = await completeChunk(db, claim, workerId, computed);
      if (!stored) logger.info({ sweep: claim.sweepId, chunk: claim.chunkIndex }, 'chunk was taken over');
    } catch (err) {
      clearInterval(timer);
      await beating;
      logger.error({ err, sweep: claim.sweepId, chunk: claim.chunkIndex }, 'sweep chunk failed');
      await releaseChunk(db, claim, workerId, (err as Error).message ?? String(err)).catch(() => undefined);
    }
  }

  async function main() {
    while (!stopping) {
      let claim: Claim | null = null;
      try {
        claim = await claimChunk(db, workerId, settings.leaseSeconds);
      } catch (err) {
        logger.error({ err }, 'sweep claim failed');
      }
      if (claim) await work(claim);
      else if (!stopping) await sleep(pollMs);
    }
  }

  return {
    workerId,
    /** Starts the loop (and its threads); calling it again does nothing. */
    start() {
      if (loop) return;
      stopping = false;
      pool = createPointPool({ threads: settings.threads });
      loop = main();
    },
    /** Stops claiming, hands back a chunk in progress, and ends the threads. */
    async stop() {
      stopping = true;
      wake?.();
      await loop;
      loop = null;
      await pool?.destroy();
      pool = null;
    },
  };
}
