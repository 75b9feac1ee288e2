// Outgoing mail and the development mailbox. A request that causes mail only adds a row to
// mail_queue; a background loop sends it (server/mail/queue.ts), so SMTP being slow or down
// never holds a request up and a failed send stays here to be retried.
import {
  bigint,
  datetime,
  index,
  int,
  mediumtext,
  mysqlEnum,
  mysqlTable,
  text,
  varchar,
} from 'drizzle-orm/mysql-core';

export const mailStatuses = ['queued', 'sent', 'failed'] as const;

export const mailQueue = mysqlTable(
  'mail_queue',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    to: varchar('to_address', { length: 254 }).notNull(),
    subject: varchar('subject', { length: 300 }).notNull(),
    text: mediumtext('text').notNull(),
    html: mediumtext('html').notNull(),
    status: mysqlEnum('status', mailStatuses).notNull().default('queued'),
    attempts: int('attempts').notNull().default(0),
    /** When the loop may next try; pushed forward while a send is in flight and after a failure. */
    nextAttemptAt: datetime('next_attempt_at', { fsp: 3 }).notNull(),
    lastError: text('last_error'),
    createdAt: datetime('created_at', { fsp: 3 }).notNull(),
    sentAt: datetime('sent_at', { fsp: 3 }),
  },
  (t) => [index('mail_queue_due').on(t.status, t.nextAttemptAt)],
);

/** Every message the local fake SMTP server received (never used in production). */
export const mailFakeMessages = mysqlTable(
  'mail_fake_messages',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    /** The envelope recipients, comma-separated: who the message was delivered to. */
    to: text('to_address').notNull(),
    from: varchar('from_address', { length: 320 }).notNull(),
    subject: varchar('subject', { length: 300 }).notNull(),
    text: mediumtext('text').notNull(),
    html: mediumtext('html').notNull(),
    receivedAt: datetime('received_at', { fsp: 3 }).notNull(),
  },
  (t) => [index('mail_fake_received').on(t.receivedAt)],
);
