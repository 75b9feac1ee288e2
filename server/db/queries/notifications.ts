import { and, count, desc, eq, isNull, sql } from 'drizzle-orm';
import type { Executor } from '../client';
import { projections, scenarios } from '../schema-domain';
import { notifications, notificationSettings } from '../schema-notifications';

export type NotificationRow = typeof notifications.$inferSelect;

/** Adds the notice unless this person was already told about this subject; true if added. */
export async function insertNotificationOnce(db: Executor, row: typeof notifications.$inferInsert) {
  const [result] = await db.insert(notifications).ignore().values(row);
  return result.affectedRows === 1;
}

export const listNotifications = (db: Executor, userId: string, limit: number) =>
  db
    .select()
    .from(notifications)
    .where(eq(notifications.userId, userId))
    .orderBy(desc(notifications.createdAt))
    .limit(limit);

export async function countUnread(db: Executor, userId: string) {
  const [row] = await db
    .select({ n: count() })
    .from(notifications)
    .where(and(eq(notifications.userId, userId), isNull(notifications.readAt)));
  return row.n;
}

export async function markRead(db: Executor, userId: string, id: string, at: Date) {
  const [result] = await db
    .update(notifications)
    .set({ readAt: at })
    .where(and(eq(notifications.id, id), eq(notifications.userId, userId), isNull(notifications.readAt)));
  return result.affectedRows === 1;
}

export async function findNotification(db: Executor, userId: string, id: string) {
  const [row] = await db
    .select()
    .from(notifications)
    .where(and(eq(notifications.id, id), eq(notifications.userId, userId)));
  return row;
}

export async function findNotificationSettings(db: Executor, userId: string) {
  const [row] = await db.select().from(notificationSettings).where(eq(notificationSettings.userId, userId));
  return row;
}

export async function saveNotificationSettings(db: Executor, userId: string, email: boolean, at: Date) {
  await db
    .insert(notificationSettings)
    .values({ userId, email, updatedAt: at })
    .onDuplicateKeyUpdate({ set: { email, updatedAt: at } });
}

/** Each projection of a launch with what a notice needs, without the large JSON columns. */
export function listBatchOutcomes(db: Executor, batchId: string) {
  return db
    .select({
      id: projections.id,
      workspaceId: projections.workspaceId,
      label: projections.label,
      status: projections.status,
      replicates: projections.replicates,
      years: sql<number>`JSON_EXTRACT(${projections.snapshot}, '$.horizonYears')`.mapWith(Number),
      error: projections.error,
      createdBy: projections.createdBy,
      startedAt: projections.startedAt,
      finishedAt: projections.finishedAt,
      scenarioName: scenarios.name,
    })
    .from(projections)
    .leftJoin(scenarios, eq(scenarios.id, projections.scenarioId))
    .where(eq(projections.batchId, batchId))
    .orderBy(projections.role, projections.label);
}
