// Sends what is in mail_queue. A request that causes mail only inserts a row; this loop
// takes due rows, sends each over SMTP and records the outcome. A failed send is tried
// again later with exponential backoff, so an SMTP outage delays mail but loses none.
import nodemailer from 'nodemailer';
import type { Logger } from 'pino';
import type { Database } from '../db/client';
import { claimMail, listDueMail, updateMail } from '../db/queries/mail';

/** 30 s after the first failure, doubling each time, never more than an hour apart. */
export const retryDelayMs = (attempts: number) => Math.min(60 * 60_000, 30_000 * 2 ** (attempts - 1));

/** An SMTP server that refuses a message permanently (5xx) is given this many tries in all. */
export const PERMANENT_FAILURE_ATTEMPTS = 3;

/** Longer than the transport's own timeouts, so a lease never runs out while a send is live. */
const LEASE_MS = 5 * 60_000;
const BATCH = 20;

export type MailQueue = ReturnType<typeof createMailQueue>;

export function createMailQueue(
  db: Database,
  logger: Logger,
  options: { smtpUrl: string; from: string; now?: () => number },
) {
  const now = options.now ?? Date.now;
  const transport = nodemailer.createTransport({
    url: options.smtpUrl,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 60_000,
  });
  let timer: NodeJS.Timeout | undefined;
  let draining: Promise<unknown> | undefined;
  let running = false;

  async function sendOne(row: Awaited<ReturnType<typeof listDueMail>>[number]) {
    const at = now();
    if (!(await claimMail(db, row.id, new Date(at), new Date(at + LEASE_MS)))) return 'skipped';
    const attempts = row.attempts + 1;
    try {
      await transport.sendMail({
        from: options.from,
        to: row.to,
        subject: row.subject,
        text: row.text,
        html: row.html,
      });
      await updateMail(db, row.id, { status: 'sent', sentAt: new Date(now()), lastError: null });
      return 'sent';
    } catch (err) {
      const code = (err as { responseCode?: number }).responseCode ?? 0;
      const permanent = code >= 500 && attempts >= PERMANENT_FAILURE_ATTEMPTS;
      const lastError = (err as Error).message.slice(0, 2000);
      await updateMail(
        db,
        row.id,
        permanent
          ? { status: 'failed', lastError }
          : { nextAttemptAt: new Date(now() + retryDelayMs(attempts)), lastError },
      );
      logger.warn(
        { mail: row.id, attempts, code, err: lastError },
        'mail not sent; will retry unless refused',
      );
      return permanent ? 'failed' : 'retrying';
    }
  }

  /** Sends every message that is due now; returns what became of each. */
  async function drainOnce() {
    const counts = { sent: 0, retrying: 0, failed: 0 };
    for (;;) {
      const due = await listDueMail(db, new Date(now()), BATCH);
      for (const row of due) {
        const outcome = await sendOne(row);
        if (outcome !== 'skipped') counts[outcome]++;
      }
      // Rows that failed were pushed into the future, so a full batch means more may be due.
      if (due.length < BATCH) return counts;
    }
  }

  function schedule(intervalMs: number) {
    timer = setTimeout(() => {
      draining = drainOnce()
        .catch((err) => logger.error({ err }, 'mail queue: drain failed'))
        .finally(() => {
          draining = undefined;
          if (running) schedule(intervalMs);
        });
    }, intervalMs);
  }

  return {
    drainOnce,
    /** Drains every `intervalMs`; one drain at a time, so no two overlap. */
    start(intervalMs: number) {
      if (running) return;
      running = true;
      schedule(intervalMs);
    },
    async stop() {
      running = false;
      clearTimeout(timer);
      await draining;
      transport.close();
    },
  };
}
