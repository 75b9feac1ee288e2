// Browser tests drive Debian's Chromium through playwright-core (never a downloaded
// browser) against a real Seedwake server listening on a free loopback port.
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { startMail } from '../../server/mail/start';
import { testApp } from './test-app';

export const screenshotDir = join(process.cwd(), 'test-output', 'screenshots');

/** Playwright's launch() gives every browser a fresh temporary --user-data-dir. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

/**
 * A server as `npm start` runs it, mail included: the fake SMTP server and the queue's loop.
 * `options` reach the app's context, e.g. sweep settings for a journey that runs a sweep.
 */
export async function startServer(options: Parameters<typeof testApp>[0] = {}) {
  const t = testApp({ publicOrigin: null, ...options });
  const server = t.app.listen(0, '127.0.0.1');
  await new Promise<void>((r) => server.once('listening', () => r()));
  const { port } = server.address() as AddressInfo;
  const mail = await startMail(t.ctx.db, t.ctx.logger, t.ctx.config, { fakePort: 0, intervalMs: 100 });
  return {
    url: `http://127.0.0.1:${port}`,
    ctx: t.ctx,
    async close() {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await mail.stop();
      await t.close();
    },
  };
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}
