import { and, asc, desc, eq, lte, sql } from 'drizzle-orm';
import type { Executor } from '../client';
import { mailFakeMessages, mailQueue } from '../schema-mail';

export type QueuedMailRow = typeof mailQueue.$inferSelect;

export async function insertMail(db: Executor, row: typeof mailQueue.$inferInsert) {
  await db.insert(mailQueue).values(row);
}

/** Queued messages whose time has come, oldest first. */
export function listDueMail(db: Executor, now: Date, limit: number) {
  return db
    .select()
    .from(mailQueue)
    .where(and(eq(mailQueue.status, 'queued'), lte(mailQueue.nextAttemptAt, now)))
    .orderBy(asc(mailQueue.nextAttemptAt), asc(mailQueue.id))
    .limit(limit);
}

/**
 * Takes a message for one attempt: only one sender wins, because the row must still be due
 * when it is updated. The lease keeps others off it while the send is in flight; if the
 * process dies mid-send, the message becomes due again when the lease runs out.
 */
export async function claimMail(db: Executor, id: number, now: Date, leaseUntil: Date) {
  const [result] = await db
    .update(mailQueue)
    .set({ nextAttemptAt: leaseUntil, attempts: sql`${mailQueue.attempts} + 1` })
    .where(and(eq(mailQueue.id, id), eq(mailQueue.status, 'queued'), lte(mailQueue.nextAttemptAt, now)));
  return result.affectedRows === 1;
}

export async function updateMail(db: Executor, id: number, patch: Partial<typeof mailQueue.$inferInsert>) {
  await db.update(mailQueue).set(patch).where(eq(mailQueue.id, id));
}

export async function insertFakeMessage(db: Executor, row: typeof mailFakeMessages.$inferInsert) {
  await db.insert(mailFakeMessages).values(row);
}

export const listFakeMessages = (db: Executor, limit: number) =>
  db.select().from(mailFakeMessages).orderBy(desc(mailFakeMessages.id)).limit(limit);
