// A local SMTP server that stands in for a mail service outside production: it accepts
// every message on loopback and stores it in MariaDB, where the development outbox page
// and the tests read it. It never runs in production (server/mail/start.ts decides).
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { Logger } from 'pino';
import type { Database } from '../db/client';
import { insertFakeMessage } from '../db/queries/mail';

export type FakeSmtp = { port: number; url: string; close(): Promise<void> };

const HOST = '127.0.0.1';

async function listen(server: SMTPServer, port: number) {
  server.listen(port, HOST);
  await Promise.race([
    once(server.server, 'listening'),
    once(server, 'error').then(([err]) => Promise.reject(err)),
  ]);
  return (server.server.address() as AddressInfo).port;
}

/**
 * Starts the fake on `port`; if another program (another developer's Seedwake) holds that
 * port, it takes any free one instead, since the app reaches it through the URL it returns.
 */
export async function startFakeSmtp(
  db: Database,
  options: { port: number; logger?: Logger },
): Promise<FakeSmtp> {
  const make = () =>
    new SMTPServer({
      // Loopback only and no credentials: there is nothing to log in to and nothing to encrypt.
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      banner: 'Seedwake development mailbox (nothing leaves this machine)',
      size: 10 * 1024 * 1024,
      logger: false,
      onData(stream, session, callback) {
        simpleParser(stream)
          .then((mail) =>
            insertFakeMessage(db, {
              to: session.envelope.rcptTo.map((r) => r.address).join(', '),
              from: (mail.from?.text ?? (session.envelope.mailFrom || { address: '' }).address).slice(0, 320),
              subject: (mail.subject ?? '').slice(0, 300),
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : '',
              receivedAt: new Date(),
            }),
          )
          // Answering only after the row is written means "250 OK" really means stored.
          .then(
            () => callback(),
            (err: Error) => callback(err),
          );
      },
    });
  let server = make();
  let port: number;
  try {
    port = await listen(server, options.port);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || options.port === 0) throw err;
    options.logger?.warn({ port: options.port }, 'fake SMTP port is taken; using a free one');
    server = make();
    port = await listen(server, 0);
  }
  options.logger?.info({ port }, 'fake SMTP server (development mailbox) listening');
  return {
    port,
    url: `smtp://${HOST}:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
