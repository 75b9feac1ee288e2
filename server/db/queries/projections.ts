import { and, desc, eq, inArray } from 'drizzle-orm';
import type { Executor } from '../client';
import { projections } from '../schema-domain';

export type ProjectionRow = typeof projections.$inferSelect;

/** Every column but the large ones, for lists and progress polling. */
const light = {
  id: projections.id,
  workspaceId: projections.workspaceId,
  batchId: projections.batchId,
  scenarioId: projections.scenarioId,
  strategyId: projections.strategyId,
  label: projections.label,
  role: projections.role,
  letItSeedYear: projections.letItSeedYear,
  seed: projections.seed,
  replicates: projections.replicates,
  status: projections.status,
  replicatesDone: projections.replicatesDone,
  error: projections.error,
  queuedAt: projections.queuedAt,
  startedAt: projections.startedAt,
  finishedAt: projections.finishedAt,
};

export function listProjections(db: Executor, workspaceId: string, limit: number, scenarioId?: string) {
  const where = scenarioId
    ? and(eq(projections.workspaceId, workspaceId), eq(projections.scenarioId, scenarioId))
    : eq(projections.workspaceId, workspaceId);
  return db.select(light).from(projections).where(where).orderBy(desc(projections.queuedAt)).limit(limit);
}

export function listBatch(db: Executor, workspaceId: string, batchId: string) {
  return db
    .select()
    .from(projections)
    .where(and(eq(projections.workspaceId, workspaceId), eq(projections.batchId, batchId)))
    .orderBy(projections.role, projections.label);
}

export async function findProjection(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(projections)
    .where(and(eq(projections.id, id), eq(projections.workspaceId, workspaceId)));
  return row;
}

export async function findProjectionById(db: Executor, id: string) {
  const [row] = await db.select().from(projections).where(eq(projections.id, id));
  return row;
}

export async function insertProjections(db: Executor, rows: (typeof projections.$inferInsert)[]) {
  await db.insert(projections).values(rows);
}

export async function updateProjection(
  db: Executor,
  id: string,
  patch: Partial<typeof projections.$inferInsert>,
) {
  await db.update(projections).set(patch).where(eq(projections.id, id));
}

/** Projections a stopped server left unfinished, oldest first. */
export function listUnfinished(db: Executor) {
  return db
    .select({ id: projections.id })
    .from(projections)
    .where(inArray(projections.status, ['queued', 'running']))
    .orderBy(projections.queuedAt);
}
