import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Executor } from '../client';
import { strategies } from '../schema-domain';

export type StrategyRow = typeof strategies.$inferSelect;

export const listStrategies = (db: Executor, workspaceId: string) =>
  db.select().from(strategies).where(eq(strategies.workspaceId, workspaceId)).orderBy(asc(strategies.name));

export async function findStrategy(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(strategies)
    .where(and(eq(strategies.id, id), eq(strategies.workspaceId, workspaceId)));
  return row;
}

export function findStrategies(db: Executor, workspaceId: string, ids: string[]) {
  if (ids.length === 0) return Promise.resolve([]);
  return db
    .select()
    .from(strategies)
    .where(and(eq(strategies.workspaceId, workspaceId), inArray(strategies.id, ids)));
}

export async function insertStrategy(db: Executor, row: typeof strategies.$inferInsert) {
  await db.insert(strategies).values(row);
}

export async function updateStrategy(
  db: Executor,
  id: string,
  patch: Partial<typeof strategies.$inferInsert>,
) {
  await db.update(strategies).set(patch).where(eq(strategies.id, id));
}

export async function deleteStrategy(db: Executor, id: string) {
  await db.delete(strategies).where(eq(strategies.id, id));
}
