// The durable work queue in MariaDB. Every state change is one short transaction:
// - claim: the first pending chunk of a queued or running sweep, or a claimed chunk whose
//   lease ran out, read with SELECT … FOR UPDATE SKIP LOCKED (MariaDB 10.6+) so concurrent
//   workers skip each other's rows instead of waiting, then marked claimed by this worker
//   with a lease;
// - heartbeat: extends the lease while this worker still holds the chunk;
// - complete: stores the chunk's results and marks it done only if this worker still holds
//   it; results are keyed by (sweep, point), so even a chunk finished twice stores each
//   point once;
// - release: hands the chunk back (pause, cancel, shutdown, an error).
// Times are the database's UTC clock, so workers on machines with skewed clocks agree.
import { sql, type SQL } from 'drizzle-orm';
import type { ResultSetHeader, RowDataPacket } from 'mysql2';
import type { Database, Executor } from '../db/client';
import type { PointResult } from '../../shared/sweeps/evaluate';

/** A chunk tried this often without finishing fails its sweep (a point that kills its worker, say). */
export const MAX_CHUNK_ATTEMPTS = 5;

export type Claim = {
  sweepId: string;
  chunkIndex: number;
  firstPoint: number;
  endPoint: number;
  claimId: number;
};

async function query<T>(db: Executor, statement: SQL): Promise<T[]> {
  const [rows] = (await db.execute(statement)) as unknown as [RowDataPacket[]];
  return rows as T[];
}

async function run(db: Executor, statement: SQL): Promise<number> {
  const [header] = (await db.execute(statement)) as unknown as [ResultSetHeader];
  return header.affectedRows;
}

type ChunkRow = {
  sweep_id: string;
  chunk_index: number;
  first_point: number;
  end_point: number;
  status: 'pending' | 'claimed' | 'done';
  worker_id: string | null;
  lease_expires_at: Date | null;
  attempts: number;
  last_error: string | null;
};

/** Claims one chunk for `workerId`, or returns null when there is nothing to do. */
export async function claimChunk(
  db: Database,
  workerId: string,
  leaseSeconds: number,
): Promise<Claim | null> {
  // Which sweeps want work, read without locks: locking the sweep rows would make every
  // claimer queue up behind one another. The sweep with the fewest chunks done goes first,
  // so sweeps launched side by side share the workers.
  const live = await query<{ id: string }>(
    db,
    sql`SELECT id FROM sweeps WHERE status IN ('queued', 'running') ORDER BY chunks_done, created_at LIMIT 20`,
  );
  for (const { id } of live) {
    const claim = await claimIn(db, id, workerId, leaseSeconds);
    if (claim) return claim;
  }
  return null;
}

async function claimIn(db: Database, sweepId: string, workerId: string, leaseSeconds: number) {
  // READ COMMITTED: rows the scan passes over without matching are not kept locked, and
  // SKIP LOCKED passes over chunks other workers are claiming or completing right now.
  return db.transaction(
    async (tx): Promise<Claim | null> => {
      const [chunk] = await query<ChunkRow>(
        tx,
        sql`SELECT sweep_id, chunk_index, first_point, end_point, status, worker_id, lease_expires_at, attempts, last_error
            FROM sweep_chunks
            WHERE sweep_id = ${sweepId}
              AND (status = 'pending' OR (status = 'claimed' AND lease_expires_at < UTC_TIMESTAMP(3)))
            ORDER BY chunk_index
            LIMIT 1
            FOR UPDATE SKIP LOCKED`,
      );
      if (!chunk) return null;
      if (chunk.attempts >= MAX_CHUNK_ATTEMPTS) {
        const reason =
          `Points ${chunk.first_point}–${chunk.end_point - 1} were tried ${chunk.attempts} times without finishing` +
          (chunk.last_error ? `; last error: ${chunk.last_error}` : ' (their worker stopped each time)');
        await run(
          tx,
          sql`UPDATE sweeps SET status = 'failed', error = ${reason.slice(0, 2000)}, finished_at = UTC_TIMESTAMP(3)
            WHERE id = ${chunk.sweep_id} AND status IN ('queued', 'running')`,
        );
        return null;
      }
      const takenOver = chunk.status === 'claimed';
      await run(
        tx,
        sql`UPDATE sweep_chunks
          SET status = 'claimed', worker_id = ${workerId}, attempts = attempts + 1,
              lease_expires_at = UTC_TIMESTAMP(3) + INTERVAL ${leaseSeconds} SECOND, heartbeat_at = UTC_TIMESTAMP(3)
          WHERE sweep_id = ${chunk.sweep_id} AND chunk_index = ${chunk.chunk_index}`,
      );
      const [header] = (await tx.execute(
        sql`INSERT INTO sweep_claims (sweep_id, chunk_index, worker_id, claimed_at, previous_worker_id, previous_lease_expires_at)
          VALUES (${chunk.sweep_id}, ${chunk.chunk_index}, ${workerId}, UTC_TIMESTAMP(3),
                  ${takenOver ? chunk.worker_id : null}, ${takenOver ? chunk.lease_expires_at : null})`,
      )) as unknown as [ResultSetHeader];
      await run(
        tx,
        sql`UPDATE sweeps SET status = 'running', started_at = COALESCE(started_at, UTC_TIMESTAMP(3))
          WHERE id = ${chunk.sweep_id} AND (status = 'queued' OR (status = 'running' AND started_at IS NULL))`,
      );
      return {
        sweepId: chunk.sweep_id,
        chunkIndex: chunk.chunk_index,
        firstPoint: chunk.first_point,
        endPoint: chunk.end_point,
        claimId: header.insertId,
      };
    },
    { isolationLevel: 'read committed' },
  );
}

const held = (claim: Claim, workerId: string) =>
  sql`sweep_id = ${claim.sweepId} AND chunk_index = ${claim.chunkIndex} AND status = 'claimed' AND worker_id = ${workerId}`;

/**
 * Extends the lease. Says whether this worker still holds the chunk and what state the
 * sweep is in now, so the loop can stop a chunk whose sweep was paused or cancelled.
 */
export async function heartbeat(db: Database, claim: Claim, workerId: string, leaseSeconds: number) {
  const kept = await run(
    db,
    sql`UPDATE sweep_chunks
        SET lease_expires_at = UTC_TIMESTAMP(3) + INTERVAL ${leaseSeconds} SECOND, heartbeat_at = UTC_TIMESTAMP(3)
        WHERE ${held(claim, workerId)}`,
  );
  const [sweep] = await query<{ status: string }>(
    db,
    sql`SELECT status FROM sweeps WHERE id = ${claim.sweepId}`,
  );
  return { held: kept === 1, sweepStatus: sweep?.status ?? 'gone' };
}

/** A point as stored: its values, and its outcomes or its error. */
export type StoredPoint = { index: number; values: number[]; result: PointResult };

/**
 * Stores the chunk's points and marks it done, in one transaction, if this worker still
 * holds it; returns false (and stores nothing) when another worker took it over.
 */
export async function completeChunk(db: Database, claim: Claim, workerId: string, points: StoredPoint[]) {
  return db.transaction(async (tx) => {
    const [chunk] = await query<ChunkRow>(
      tx,
      sql`SELECT status, worker_id FROM sweep_chunks
          WHERE sweep_id = ${claim.sweepId} AND chunk_index = ${claim.chunkIndex} FOR UPDATE`,
    );
    if (!chunk || chunk.status !== 'claimed' || chunk.worker_id !== workerId) {
      await endClaim(tx, claim, 'lost');
      return false;
    }
    const rows = points.map(
      (p) =>
        sql`(${claim.sweepId}, ${p.index}, ${JSON.stringify(p.values)},
             ${p.result.ok ? JSON.stringify(p.result.outcomes) : null},
             ${p.result.ok ? null : p.result.error.slice(0, 4000)}, UTC_TIMESTAMP(3))`,
    );
    if (rows.length > 0) {
      // A no-op on a duplicate key: a point computed before is kept as it was (it is the same).
      await run(
        tx,
        sql`INSERT INTO sweep_results (sweep_id, point_index, inputs, outcomes, error, created_at)
            VALUES ${sql.join(rows, sql`, `)}
            ON DUPLICATE KEY UPDATE point_index = point_index`,
      );
    }
    await run(
      tx,
      sql`UPDATE sweep_chunks SET status = 'done', completed_at = UTC_TIMESTAMP(3), lease_expires_at = NULL
          WHERE sweep_id = ${claim.sweepId} AND chunk_index = ${claim.chunkIndex}`,
    );
    // The chunk row is locked and was still claimed, so this runs once per chunk.
    const failed = points.filter((p) => !p.result.ok).length;
    await run(
      tx,
      sql`UPDATE sweeps
          SET points_done = points_done + ${claim.endPoint - claim.firstPoint},
              failed_points = failed_points + ${failed}, chunks_done = chunks_done + 1
          WHERE id = ${claim.sweepId}`,
    );
    await run(
      tx,
      sql`UPDATE sweeps SET status = 'done', finished_at = UTC_TIMESTAMP(3)
          WHERE id = ${claim.sweepId} AND status = 'running' AND chunks_done = total_chunks`,
    );
    await endClaim(tx, claim, 'completed');
    return true;
  });
}

/**
 * Hands a held chunk back as pending. A release for a pause, cancel or shutdown does not
 * count as a try; one after an error does, and keeps the error for the sweep's message.
 */
export async function releaseChunk(db: Database, claim: Claim, workerId: string, error?: string) {
  await db.transaction(async (tx) => {
    const released = await run(
      tx,
      sql`UPDATE sweep_chunks
          SET status = 'pending', worker_id = NULL, lease_expires_at = NULL,
              attempts = attempts - ${error === undefined ? 1 : 0},
              last_error = ${error === undefined ? sql`last_error` : error.slice(0, 2000)}
          WHERE ${held(claim, workerId)}`,
    );
    await endClaim(tx, claim, released === 1 ? 'released' : 'lost');
  });
}

async function endClaim(db: Executor, claim: Claim, outcome: 'completed' | 'released' | 'lost') {
  await run(
    db,
    sql`UPDATE sweep_claims SET outcome = ${outcome}, finished_at = UTC_TIMESTAMP(3) WHERE id = ${claim.claimId}`,
  );
}
