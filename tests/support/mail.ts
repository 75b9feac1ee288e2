// A mailbox for tests: the fake SMTP server on a free loopback port and a mail queue that
// sends to it, driven by hand (drainOnce) so a test knows exactly when mail goes out.
import type { RowDataPacket } from 'mysql2';
import type { AppContext } from '../../server/context';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { createMailQueue } from '../../server/mail/queue';

export type Received = { id: number; to: string; from: string; subject: string; text: string; html: string };

export async function received(ctx: AppContext, to: string): Promise<Received[]> {
  const [rows] = await ctx.pool.query<RowDataPacket[]>(
    'SELECT id, to_address AS `to`, from_address AS `from`, subject, text, html FROM mail_fake_messages WHERE to_address = ? ORDER BY id',
    [to],
  );
  return rows as Received[];
}

export async function mailbox(ctx: AppContext) {
  const fake = await startFakeSmtp(ctx.db, { port: 0 });
  const queue = createMailQueue(ctx.db, ctx.logger, { smtpUrl: fake.url, from: ctx.config.mailFrom });
  return {
    fake,
    queue,
    /**
     * Sends what is queued until `count` messages to `to` have arrived (mail queued after
     * an answer, as a reset request's is, may need a moment), then returns them all.
     */
    async waitFor(to: string, count = 1, timeoutMs = 10_000): Promise<Received[]> {
      const until = Date.now() + timeoutMs;
      for (;;) {
        await queue.drainOnce();
        const got = await received(ctx, to);
        if (got.length >= count) return got;
        if (Date.now() > until) throw new Error(`${got.length} of ${count} messages to ${to} arrived`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    async close() {
      await queue.stop();
      await fake.close();
    },
  };
}

/** The secret at the end of the link to `path` in a message's text, e.g. linkToken(text, '/invitations'). */
export function linkIn(text: string, path: string) {
  const m = text.match(new RegExp(`(https?://\\S+?${path}/([A-Za-z0-9_-]{43}))(?![A-Za-z0-9_-])`));
  if (!m) throw new Error(`no ${path} link in: ${text}`);
  return { url: m[1], token: m[2] };
}
