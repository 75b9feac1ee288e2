import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../client';
import { scenarios } from '../schema-domain';

export type ScenarioRow = typeof scenarios.$inferSelect;

export const listScenarios = (db: Executor, workspaceId: string) =>
  db
    .select()
    .from(scenarios)
    .where(eq(scenarios.workspaceId, workspaceId))
    .orderBy(desc(scenarios.updatedAt));

export async function findScenario(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(scenarios)
    .where(and(eq(scenarios.id, id), eq(scenarios.workspaceId, workspaceId)));
  return row;
}

export async function insertScenario(db: Executor, row: typeof scenarios.$inferInsert) {
  await db.insert(scenarios).values(row);
}

export async function updateScenario(
  db: Executor,
  id: string,
  patch: Partial<typeof scenarios.$inferInsert>,
) {
  await db.update(scenarios).set(patch).where(eq(scenarios.id, id));
}

export async function deleteScenario(db: Executor, id: string) {
  await db.delete(scenarios).where(eq(scenarios.id, id));
}
