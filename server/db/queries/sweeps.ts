import { and, asc, count, desc, eq, isNotNull, sql, type SQL } from 'drizzle-orm';
import type { RowDataPacket } from 'mysql2';
import type { Executor } from '../client';
import { sweepChunks, sweepResults, sweeps } from '../schema-sweeps';

export type SweepRow = typeof sweeps.$inferSelect;

/** Every column but the design points, which only workers need. */
const light = {
  id: sweeps.id,
  workspaceId: sweeps.workspaceId,
  scenarioId: sweeps.scenarioId,
  strategyId: sweeps.strategyId,
  name: sweeps.name,
  definition: sweeps.definition,
  base: sweeps.base,
  totalPoints: sweeps.totalPoints,
  totalChunks: sweeps.totalChunks,
  replicateYears: sweeps.replicateYears,
  pointsDone: sweeps.pointsDone,
  failedPoints: sweeps.failedPoints,
  chunksDone: sweeps.chunksDone,
  status: sweeps.status,
  error: sweeps.error,
  createdBy: sweeps.createdBy,
  createdAt: sweeps.createdAt,
  startedAt: sweeps.startedAt,
  finishedAt: sweeps.finishedAt,
};
export type LightSweep = Omit<SweepRow, 'points'>;

export async function insertSweep(
  db: Executor,
  row: typeof sweeps.$inferInsert,
  chunks: (typeof sweepChunks.$inferInsert)[],
) {
  await db.insert(sweeps).values(row);
  // Inserted in slices: one statement per few hundred chunks keeps each packet small.
  for (let i = 0; i < chunks.length; i += 500) await db.insert(sweepChunks).values(chunks.slice(i, i + 500));
}

export function listSweeps(db: Executor, workspaceId: string) {
  return db
    .select(light)
    .from(sweeps)
    .where(eq(sweeps.workspaceId, workspaceId))
    .orderBy(desc(sweeps.createdAt))
    .limit(200);
}

export async function findSweep(
  db: Executor,
  workspaceId: string,
  id: string,
): Promise<LightSweep | undefined> {
  const [row] = await db
    .select(light)
    .from(sweeps)
    .where(and(eq(sweeps.id, id), eq(sweeps.workspaceId, workspaceId)));
  return row;
}

/** Moves a sweep from one of `from` to `to`; false when it was in none of them. */
export async function setSweepStatus(
  db: Executor,
  id: string,
  from: readonly LightSweep['status'][],
  to: LightSweep['status'],
  finished = false,
) {
  const [header] = await db
    .update(sweeps)
    .set({ status: to, ...(finished ? { finishedAt: sql`UTC_TIMESTAMP(3)` } : {}) })
    .where(
      and(
        eq(sweeps.id, id),
        sql`${sweeps.status} IN (${sql.join(
          from.map((s) => sql`${s}`),
          sql`, `,
        )})`,
      ),
    );
  return header.affectedRows === 1;
}

/** Resuming a sweep whose last chunk finished while it was paused finishes it. */
export async function finishIfComplete(db: Executor, id: string) {
  await db
    .update(sweeps)
    .set({ status: 'done', finishedAt: sql`UTC_TIMESTAMP(3)` })
    .where(
      and(eq(sweeps.id, id), eq(sweeps.status, 'running'), sql`${sweeps.chunksDone} = ${sweeps.totalChunks}`),
    );
}

/** Points stored in the last minute, and the length of that window (shorter just after the start). */
export async function recentRate(db: Executor, id: string) {
  const [rows] = (await db.execute(
    sql`SELECT
          (SELECT COUNT(*) FROM sweep_results r
             WHERE r.sweep_id = s.id AND r.created_at >= UTC_TIMESTAMP(3) - INTERVAL 60 SECOND) AS recent,
          TIMESTAMPDIFF(MICROSECOND, GREATEST(s.started_at, UTC_TIMESTAMP(3) - INTERVAL 60 SECOND), UTC_TIMESTAMP(3)) AS window_us
        FROM sweeps s WHERE s.id = ${id}`,
  )) as unknown as [RowDataPacket[]];
  const row = rows[0] as { recent: number | string; window_us: number | string | null } | undefined;
  return row
    ? { recent: Number(row.recent), seconds: row.window_us === null ? 0 : Number(row.window_us) / 1e6 }
    : null;
}

export type PointOrder = { by: SQL; descending: boolean };

/** A SQL expression to sort results by: the index, a parameter's value or an outcome's (numbers, nulls last). */
export function pointOrderExpression(sort: string): SQL {
  if (sort === 'index') return sql`${sweepResults.pointIndex}`;
  const parameter = /^p(\d+)$/.exec(sort);
  if (parameter) return sql`(JSON_VALUE(${sweepResults.inputs}, ${`$[${Number(parameter[1])}]`}) + 0)`;
  return sql`(JSON_VALUE(${sweepResults.outcomes}, ${`$.${sort}`}) + 0)`;
}

export async function pageOfPoints(
  db: Executor,
  sweepId: string,
  options: { order: PointOrder; failedOnly: boolean; limit: number; offset: number },
) {
  const where = options.failedOnly
    ? and(eq(sweepResults.sweepId, sweepId), isNotNull(sweepResults.error))
    : eq(sweepResults.sweepId, sweepId);
  const direction = options.order.descending ? sql`DESC` : sql`ASC`;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        index: sweepResults.pointIndex,
        inputs: sweepResults.inputs,
        outcomes: sweepResults.outcomes,
        error: sweepResults.error,
      })
      .from(sweepResults)
      .where(where)
      .orderBy(
        sql`(${options.order.by}) IS NULL`,
        sql`${options.order.by} ${direction}`,
        options.order.descending ? desc(sweepResults.pointIndex) : asc(sweepResults.pointIndex),
      )
      .limit(options.limit)
      .offset(options.offset),
    db.select({ total: count() }).from(sweepResults).where(where),
  ]);
  return { rows, total };
}

export function allPoints(db: Executor, sweepId: string) {
  return db
    .select({
      index: sweepResults.pointIndex,
      inputs: sweepResults.inputs,
      outcomes: sweepResults.outcomes,
      error: sweepResults.error,
    })
    .from(sweepResults)
    .where(eq(sweepResults.sweepId, sweepId))
    .orderBy(asc(sweepResults.pointIndex));
}
