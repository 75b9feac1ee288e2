// Personal API tokens: only a SHA-256 of the secret is stored (the secret has 256 random
// bits, so a slow password hash adds nothing), scoped to one workspace and a role.
import { char, datetime, index, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { users, workspaces } from './schema';

export const apiTokens = mysqlTable(
  'api_tokens',
  {
    id: char('id', { length: 36 }).primaryKey(),
    userId: char('user_id', { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    workspaceId: char('workspace_id', { length: 36 })
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 80 }).notNull(),
    role: mysqlEnum('role', ['owner', 'editor', 'viewer']).notNull(),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    prefix: varchar('prefix', { length: 16 }).notNull(),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    lastUsedAt: datetime('last_used_at', { fsp: 3 }),
  },
  (t) => [index('api_tokens_user').on(t.userId)],
);
