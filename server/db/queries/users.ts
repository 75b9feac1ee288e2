import { eq } from 'drizzle-orm';
import type { Executor as Database } from '../client';
import { users } from '../schema';

export type UserRow = typeof users.$inferSelect;

export async function findUserByEmail(db: Database, email: string) {
  const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  return row;
}

export async function findUserById(db: Database, id: string) {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row;
}

export async function insertUser(db: Database, row: typeof users.$inferInsert) {
  await db.insert(users).values(row);
}

export async function updateUser(
  db: Database,
  id: string,
  patch: Partial<Pick<UserRow, 'name' | 'passwordHash' | 'passwordChangedAt'>>,
) {
  await db.update(users).set(patch).where(eq(users.id, id));
}
