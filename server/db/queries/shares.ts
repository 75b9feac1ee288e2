import { and, eq, inArray } from 'drizzle-orm';
import type { Executor } from '../client';
import { shares } from '../schema-shares';
import { projections } from '../schema-domain';
import { users } from '../schema';

/** Batches of the workspace shared with the user. */
export async function sharedBatchIds(db: Executor, workspaceId: string, userId: string) {
  const rows = await db
    .select({ batchId: shares.batchId })
    .from(shares)
    .where(and(eq(shares.workspaceId, workspaceId), eq(shares.userId, userId)));
  return rows.map((r) => r.batchId);
}

/** What the shared batches refer to: scenarios, strategies, fields and profiles in their snapshots. */
export async function sharedReferences(db: Executor, workspaceId: string, batchIds: string[]) {
  if (!batchIds.length) return { scenarioIds: new Set<string>(), strategyIds: new Set<string>() };
  const rows = await db
    .select({ scenarioId: projections.scenarioId, strategyId: projections.strategyId })
    .from(projections)
    .where(and(eq(projections.workspaceId, workspaceId), inArray(projections.batchId, batchIds)));
  return {
    scenarioIds: new Set(rows.map((r) => r.scenarioId).filter((x): x is string => !!x)),
    strategyIds: new Set(rows.map((r) => r.strategyId).filter((x): x is string => !!x)),
  };
}

export async function insertShare(db: Executor, row: typeof shares.$inferInsert) {
  await db
    .insert(shares)
    .values(row)
    .onDuplicateKeyUpdate({ set: { createdAt: row.createdAt } });
}

export async function deleteShare(db: Executor, workspaceId: string, batchId: string, userId: string) {
  await db
    .delete(shares)
    .where(and(eq(shares.workspaceId, workspaceId), eq(shares.batchId, batchId), eq(shares.userId, userId)));
}

export function listShares(db: Executor, workspaceId: string, batchId: string) {
  return db
    .select({ userId: shares.userId, name: users.name, email: users.email, createdAt: shares.createdAt })
    .from(shares)
    .innerJoin(users, eq(users.id, shares.userId))
    .where(and(eq(shares.workspaceId, workspaceId), eq(shares.batchId, batchId)));
}
