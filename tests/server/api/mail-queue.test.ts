import { afterAll, describe, expect, it } from 'vitest';
import type { RowDataPacket } from 'mysql2';
import { SMTPServer } from 'smtp-server';
import { createApp } from '../../../server/app';
import { loadConfig } from '../../../server/config';
import { createContext } from '../../../server/context-factory';
import { startFakeSmtp } from '../../../server/mail/fake-smtp';
import { createMailQueue } from '../../../server/mail/queue';
import { startMail } from '../../../server/mail/start';
import { queueMail } from '../../../server/services/mail';
import { TEST_ORIGIN, browserLike, signUp, testApp, uniqueEmail } from '../../support/test-app';
import { received } from '../../support/mail';

const t = testApp();
afterAll(() => t.close());

const content = (n: number) => ({
  subject: `Queued ${n}`,
  text: `message ${n}`,
  html: `<p>message ${n}</p>`,
});

async function queued(to: string) {
  const [rows] = await t.ctx.pool.query<RowDataPacket[]>(
    'SELECT status, attempts, next_attempt_at, last_error FROM mail_queue WHERE to_address = ?',
    [to],
  );
  return rows as { status: string; attempts: number; next_attempt_at: Date; last_error: string | null }[];
}

/** A loopback port nothing listens on: the fake's own, just after it closed. */
async function deadPort() {
  const fake = await startFakeSmtp(t.ctx.db, { port: 0 });
  await fake.close();
  return fake.port;
}

describe('the mail queue', () => {
  it('keeps mail queued while SMTP is down and sends all of it, once, when it is back', async () => {
    const port = await deadPort();
    const to = [uniqueEmail('q1'), uniqueEmail('q2'), uniqueEmail('q3')];
    for (const [i, address] of to.entries()) await queueMail(t.ctx.db, address, content(i));
    let clock = Date.now();
    const down = createMailQueue(t.ctx.db, t.ctx.logger, {
      smtpUrl: `smtp://127.0.0.1:${port}`,
      from: 'Seedwake <test@seedwake.test>',
      now: () => clock,
    });

    await down.drainOnce();
    for (const address of to) {
      const [row] = await queued(address);
      expect(row).toMatchObject({ status: 'queued', attempts: 1 });
      expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
      // Exponential backoff (common practice, no published source): 30 s after the first failure.
      expect(row.next_attempt_at.getTime()).toBe(clock + 30_000);
    }
    // Not due yet: nothing is tried again before its time.
    await down.drainOnce();
    expect((await queued(to[0]))[0].attempts).toBe(1);
    clock += 31_000;
    await down.drainOnce();
    const [second] = await queued(to[0]);
    expect(second.attempts).toBe(2);
    // …and twice as long after the second.
    expect(second.next_attempt_at.getTime()).toBe(clock + 60_000);
    await down.stop();

    // SMTP is back.
    const fake = await startFakeSmtp(t.ctx.db, { port: 0 });
    clock += 61_000;
    const up = createMailQueue(t.ctx.db, t.ctx.logger, {
      smtpUrl: fake.url,
      from: 'x@seedwake.test',
      now: () => clock,
    });
    await up.drainOnce();
    for (const [i, address] of to.entries()) {
      expect((await queued(address))[0].status).toBe('sent');
      const got = await received(t.ctx, address);
      expect(got).toHaveLength(1);
      expect(got[0]).toMatchObject({ subject: `Queued ${i}`, text: `message ${i}` });
    }
    await up.stop();
    await fake.close();
  });

  it('never sends a message twice when two senders drain at once', async () => {
    const fake = await startFakeSmtp(t.ctx.db, { port: 0 });
    const [a, b] = [0, 1].map(() =>
      createMailQueue(t.ctx.db, t.ctx.logger, { smtpUrl: fake.url, from: 'x@seedwake.test' }),
    );
    const to = Array.from({ length: 6 }, (_, i) => uniqueEmail(`race${i}`));
    for (const [i, address] of to.entries()) await queueMail(t.ctx.db, address, content(i));
    await Promise.all([a.drainOnce(), b.drainOnce()]);
    for (const address of to) expect(await received(t.ctx, address)).toHaveLength(1);
    await Promise.all([a.stop(), b.stop()]);
    await fake.close();
  });

  it('marks a message failed after repeated permanent refusals (5xx) instead of trying forever', async () => {
    // RFC 5321 §4.2.1: a 5yz reply is a permanent negative completion; resending will not help.
    const refusing = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      onRcptTo(_address, _session, callback) {
        callback(Object.assign(new Error('No such mailbox here'), { responseCode: 550 }));
      },
    });
    await new Promise<void>((r) => refusing.listen(0, '127.0.0.1', () => r()));
    const port = (refusing.server.address() as { port: number }).port;
    const to = uniqueEmail('bounce');
    await queueMail(t.ctx.db, to, content(9));
    let clock = Date.now();
    const queue = createMailQueue(t.ctx.db, t.ctx.logger, {
      smtpUrl: `smtp://127.0.0.1:${port}`,
      from: 'x@seedwake.test',
      now: () => clock,
    });
    for (let i = 0; i < 3; i++) {
      await queue.drainOnce();
      clock += 3600_000;
    }
    const [row] = await queued(to);
    expect(row).toMatchObject({ status: 'failed', attempts: 3 });
    expect(row.last_error).toContain('550');
    await queue.stop();
    await new Promise<void>((r) => refusing.close(() => r()));
  });

  it('the request that causes mail only queues it: it succeeds with no SMTP server at all', async () => {
    const owner = await signUp(t.app, 'nosmtp');
    const email = uniqueEmail('later');
    const res = await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/invitations`)
      .send({ email, role: 'viewer' });
    expect(res.status).toBe(201);
    expect(await queued(email)).toEqual([expect.objectContaining({ status: 'queued', attempts: 0 })]);
    expect(await received(t.ctx, email)).toEqual([]);
  });
});

describe('the fake SMTP server is for development only', () => {
  it('does not start in production, and the outbox answers 404 there', async () => {
    const config = { ...loadConfig(), production: true, smtpUrl: undefined, publicOrigin: TEST_ORIGIN };
    const ctx = createContext(config, { projectionThreads: 1 });
    try {
      const mail = await startMail(ctx.db, ctx.logger, config, { fakePort: 0 });
      expect(mail.fake).toBeUndefined();
      expect(mail.queue).toBeUndefined();
      await mail.stop();
      const res = await browserLike(createApp(ctx)).get('/api/dev/outbox');
      expect(res.status).toBe(404);
    } finally {
      await ctx.projections.runner.stop();
      await ctx.pool.end();
    }
  });

  it('starts outside production when SMTP_URL is unset, and stores what it receives', async () => {
    const mail = await startMail(t.ctx.db, t.ctx.logger, t.ctx.config, { fakePort: 0, intervalMs: 60_000 });
    expect(mail.fake?.url).toMatch(/^smtp:\/\/127\.0\.0\.1:\d+$/);
    const to = uniqueEmail('dev');
    await queueMail(t.ctx.db, to, content(7));
    await mail.queue!.drainOnce();
    expect((await received(t.ctx, to))[0]).toMatchObject({ subject: 'Queued 7', html: '<p>message 7</p>' });
    await mail.stop();
  });
});
