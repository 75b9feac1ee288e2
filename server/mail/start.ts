import type { Logger } from 'pino';
import type { Config } from '../config';
import type { Database } from '../db/client';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp';
import { createMailQueue, type MailQueue } from './queue';

/** Whether this configuration uses the local fake SMTP server (and so has a development outbox). */
export const usesFakeSmtp = (config: Config) => !config.production && !config.smtpUrl;

export type MailRuntime = { fake: FakeSmtp | undefined; queue: MailQueue | undefined; stop(): Promise<void> };

/**
 * Starts sending mail from the queue: to SMTP_URL when it is set, else (never in
 * production) to the local fake. Production without SMTP_URL keeps mail queued, and says so.
 */
export async function startMail(
  db: Database,
  logger: Logger,
  config: Config,
  options: { fakePort?: number; intervalMs?: number } = {},
): Promise<MailRuntime> {
  const fake = usesFakeSmtp(config)
    ? await startFakeSmtp(db, { port: options.fakePort ?? config.smtpFakePort, logger })
    : undefined;
  const smtpUrl = config.smtpUrl ?? fake?.url;
  if (!smtpUrl) logger.warn('SMTP_URL is not set: e-mail stays queued in mail_queue until it is');
  const queue = smtpUrl ? createMailQueue(db, logger, { smtpUrl, from: config.mailFrom }) : undefined;
  queue?.start(options.intervalMs ?? 2_000);
  return {
    fake,
    queue,
    async stop() {
      await queue?.stop();
      await fake?.close();
    },
  };
}
