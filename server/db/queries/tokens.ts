import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../client';
import { apiTokens } from '../schema-tokens';
import { workspaces } from '../schema';

export type TokenRow = typeof apiTokens.$inferSelect;

export async function insertToken(db: Executor, row: typeof apiTokens.$inferInsert) {
  await db.insert(apiTokens).values(row);
}

export function listTokens(db: Executor, userId: string) {
  return db
    .select({ token: apiTokens, workspaceName: workspaces.name })
    .from(apiTokens)
    .innerJoin(workspaces, eq(workspaces.id, apiTokens.workspaceId))
    .where(eq(apiTokens.userId, userId))
    .orderBy(desc(apiTokens.createdAt));
}

export async function findTokenByHash(db: Executor, tokenHash: string) {
  const [row] = await db.select().from(apiTokens).where(eq(apiTokens.tokenHash, tokenHash));
  return row;
}

export async function touchToken(db: Executor, id: string, at: Date) {
  await db.update(apiTokens).set({ lastUsedAt: at }).where(eq(apiTokens.id, id));
}

export async function deleteToken(db: Executor, userId: string, id: string) {
  const [result] = await db.delete(apiTokens).where(and(eq(apiTokens.id, id), eq(apiTokens.userId, userId)));
  return result.affectedRows > 0;
}
