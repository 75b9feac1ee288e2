// Invitations to a workspace by e-mail. Only a SHA-256 of the link's secret is stored (it has
// 256 random bits, so a slow password hash adds nothing); resending replaces it, so an older
// link stops working.
import { char, datetime, index, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { users, workspaces } from './schema';

export const invitations = mysqlTable(
  'invitations',
  {
    id: char('id', { length: 36 }).primaryKey(),
    workspaceId: char('workspace_id', { length: 36 })
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    role: mysqlEnum('role', ['owner', 'editor', 'viewer']).notNull(),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    invitedBy: char('invited_by', { length: 36 }).references(() => users.id, { onDelete: 'set null' }),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    /** Set again by a resend, together with a new token. */
    sentAt: datetime('sent_at', { fsp: 3 }).notNull(),
    expiresAt: datetime('expires_at', { fsp: 3 }).notNull(),
    acceptedAt: datetime('accepted_at', { fsp: 3 }),
    acceptedBy: char('accepted_by', { length: 36 }).references(() => users.id, { onDelete: 'set null' }),
    revokedAt: datetime('revoked_at', { fsp: 3 }),
  },
  (t) => [index('invitations_workspace').on(t.workspaceId, t.email)],
);
