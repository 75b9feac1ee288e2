// Comparisons (launch batches) shared with individual viewers. A viewer sees only what
// is shared with them; editors and owners see the whole workspace.
import { char, datetime, index, mysqlTable, primaryKey } from 'drizzle-orm/mysql-core';
import { users, workspaces } from './schema';

export const shares = mysqlTable(
  'shares',
  {
    workspaceId: char('workspace_id', { length: 36 })
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    batchId: char('batch_id', { length: 36 }).notNull(),
    userId: char('user_id', { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    sharedBy: char('shared_by', { length: 36 }).references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.batchId, t.userId] }), index('shares_user').on(t.userId, t.workspaceId)],
);
