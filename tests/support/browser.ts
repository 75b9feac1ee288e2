// Browser tests drive Debian's Chromium through playwright-core (never a downloaded
// browser) against a real Seedwake server listening on a free loopback port.
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
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

export async function startServer() {
  const t = testApp({ publicOrigin: null });
  const server = t.app.listen(0, '127.0.0.1');
  await new Promise<void>((r) => server.once('listening', () => r()));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    ctx: t.ctx,
    async close() {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await t.close();
    },
  };
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}
