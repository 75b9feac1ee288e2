// Drizzle schema: the tables of the foundation. Domain tables live in their own files
// beside this one and are re-exported nowhere; drizzle.config.ts lists every schema file.
import {
  bigint,
  boolean,
  datetime,
  index,
  int,
  mediumtext,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  varchar,
  char,
} from 'drizzle-orm/mysql-core';
import { jsonColumn } from './json-column';

const id = (name = 'id') => char(name, { length: 36 });
const createdAt = () => datetime('created_at', { fsp: 3 }).notNull();

export const users = mysqlTable('users', {
  id: id().primaryKey(),
  email: varchar('email', { length: 254 }).notNull().unique(),
  name: varchar('name', { length: 120 }).notNull(),
  passwordHash: varchar('password_hash', { length: 255 }).notNull(),
  createdAt: createdAt(),
  passwordChangedAt: datetime('password_changed_at', { fsp: 3 }).notNull(),
});

export const workspaces = mysqlTable('workspaces', {
  id: id().primaryKey(),
  name: varchar('name', { length: 120 }).notNull(),
  personal: boolean('personal').notNull().default(false),
  createdAt: createdAt(),
});

export const memberships = mysqlTable(
  'memberships',
  {
    workspaceId: id('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    userId: id('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: mysqlEnum('role', ['owner', 'editor', 'viewer']).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.workspaceId, t.userId] }), index('memberships_user').on(t.userId)],
);

/** express-mysql-session's own table, kept in our migrations so one tool owns the schema. */
export const sessions = mysqlTable('sessions', {
  sessionId: varchar('session_id', { length: 128 }).primaryKey(),
  expires: int('expires', { unsigned: true }).notNull(),
  data: mediumtext('data'),
});

export const auditLog = mysqlTable(
  'audit_log',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    at: datetime('at', { fsp: 3 }).notNull(),
    event: varchar('event', { length: 64 }).notNull(),
    userId: id('user_id'),
    workspaceId: id('workspace_id'),
    ip: varchar('ip', { length: 64 }),
    detail: jsonColumn<Record<string, unknown>>('detail'),
  },
  (t) => [index('audit_user').on(t.userId, t.at), index('audit_event').on(t.event, t.at)],
);
