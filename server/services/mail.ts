import type { OutboxMessage } from '../../shared/api/mail';
import type { Executor } from '../db/client';
import { insertMail, listFakeMessages } from '../db/queries/mail';
import type { MailContent } from '../mail/templates';

/** Puts a message in the queue; the mail loop sends it. Never waits on SMTP. */
export async function queueMail(db: Executor, to: string, content: MailContent) {
  const now = new Date();
  await insertMail(db, { to, ...content, status: 'queued', attempts: 0, nextAttemptAt: now, createdAt: now });
}

/** The development outbox: what the fake SMTP server received, newest first. */
export async function outbox(db: Executor): Promise<OutboxMessage[]> {
  const rows = await listFakeMessages(db, 100);
  return rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() }));
}
