// In-app notices (a launch of projections finished or failed; sweeps later) and each
// person's choice about the e-mail that goes with them.
import {
  boolean,
  char,
  datetime,
  index,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import { users } from './schema';

export const notifications = mysqlTable(
  'notifications',
  {
    id: char('id', { length: 36 }).primaryKey(),
    userId: char('user_id', { length: 36 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kind: varchar('kind', { length: 40 }).notNull(),
    /** What the notice is about, e.g. "batch:<id>": unique per person, so it is never told twice. */
    subject: varchar('subject', { length: 80 }).notNull(),
    title: varchar('title', { length: 200 }).notNull(),
    body: text('body').notNull(),
    /** A path inside the app, e.g. /w/<workspace>/…. */
    link: varchar('link', { length: 500 }),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    readAt: datetime('read_at', { fsp: 3 }),
  },
  (t) => [
    uniqueIndex('notifications_subject').on(t.userId, t.subject),
    index('notifications_user').on(t.userId, t.createdAt),
  ],
);

/** A missing row means the defaults: e-mail on. */
export const notificationSettings = mysqlTable('notification_settings', {
  userId: char('user_id', { length: 36 })
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  email: boolean('email').notNull(),
  updatedAt: datetime('updated_at', { fsp: 3 }).notNull(),
});
