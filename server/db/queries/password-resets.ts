import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Executor } from '../client';
import { passwordResets } from '../schema-password-resets';
import { users } from '../schema';

export async function insertPasswordReset(db: Executor, row: typeof passwordResets.$inferInsert) {
  await db.insert(passwordResets).values(row);
}

export async function findPasswordResetByHash(db: Executor, tokenHash: string) {
  const [row] = await db
    .select({ reset: passwordResets, email: users.email })
    .from(passwordResets)
    .innerJoin(users, eq(users.id, passwordResets.userId))
    .where(eq(passwordResets.tokenHash, tokenHash));
  return row;
}

/** Uses the link, only if it is still unused and unexpired; exactly one of two racing uses wins. */
export async function claimPasswordReset(db: Executor, id: string, now: Date) {
  const [result] = await db
    .update(passwordResets)
    .set({ usedAt: now })
    .where(and(eq(passwordResets.id, id), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)));
  return result.affectedRows === 1;
}

/** After a reset every other link of the user stops working too. */
export async function voidPasswordResets(db: Executor, userId: string, now: Date) {
  await db
    .update(passwordResets)
    .set({ usedAt: now })
    .where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt)));
}
