import { and, asc, eq } from 'drizzle-orm';
import type { Executor } from '../client';
import { fields } from '../schema-domain';

export type FieldRow = typeof fields.$inferSelect;

export const listFields = (db: Executor, workspaceId: string) =>
  db.select().from(fields).where(eq(fields.workspaceId, workspaceId)).orderBy(asc(fields.name));

export async function findField(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select()
    .from(fields)
    .where(and(eq(fields.id, id), eq(fields.workspaceId, workspaceId)));
  return row;
}

export async function insertField(db: Executor, row: typeof fields.$inferInsert) {
  await db.insert(fields).values(row);
}

export async function updateField(db: Executor, id: string, patch: Partial<typeof fields.$inferInsert>) {
  await db.update(fields).set(patch).where(eq(fields.id, id));
}

export async function deleteField(db: Executor, id: string) {
  await db.delete(fields).where(eq(fields.id, id));
}
