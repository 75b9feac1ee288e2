// Password reset links: single-use, short-lived, and stored as a SHA-256 of the secret only.
import { char, datetime, index, mysqlTable } from 'drizzle-orm/mysql-core';
import { users } from './schema';

export const passwordResets = mysqlTable(
  'password_resets',
  {
    id: char('id', { length: 36 }).primaryKey(),
    userId: char('user_id', { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    expiresAt: datetime('expires_at', { fsp: 3 }).notNull(),
    usedAt: datetime('used_at', { fsp: 3 }),
  },
  (t) => [index('password_resets_user').on(t.userId)],
);
