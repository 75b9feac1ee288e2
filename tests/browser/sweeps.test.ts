// The analyst's journey through a sweep on the demo: define a one-at-a-time sweep, see its
// size before launch, launch it, watch the progress bar, pause and reload in the middle (the
// bar stands where the server says), resume, see it finish, read the tornado chart and
// download the tidy CSV. Accessibility is checked with axe-core.
import { readFileSync } from 'node:fs';
import { AxeBuilder } from '@axe-core/playwright';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it, onTestFailed } from 'vitest';
import { launchBrowser, screenshot, startServer } from '../support/browser';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

/** A machine shared with other test runs can be slow; no assertion here is about time. */
const SLOW = { timeout: 60_000 };

beforeAll(async () => {
  [browser, server] = await Promise.all([
    launchBrowser(),
    startServer({ sweeps: { leaseSeconds: 5, threads: 1 } }),
  ]);
  server.ctx.sweeps.worker.start();
});
afterAll(async () => {
  await browser?.close();
  await server?.ctx.sweeps.worker.stop();
  await server?.close();
});

/** axe-core's rules cover WCAG 2.x A and AA; the issue asks that no serious or critical finding remains. */
async function expectNoSeriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
  expect(serious).toEqual([]);
}

const progress = (page: Page) => page.getByRole('progressbar', { name: 'Points done' });
const pointsDone = async (page: Page) => Number(await progress(page).getAttribute('aria-valuenow'));

describe('a sensitivity sweep on the demo', () => {
  it('is defined, launched, watched over a reload, finished, charted and downloaded', async () => {
    // axe-core's Playwright runner needs a page of an explicit context, with downloads allowed.
    const context = await browser.newContext({
      viewport: { width: 1280, height: 900 },
      acceptDownloads: true,
    });
    const page = await context.newPage();
    onTestFailed(() => screenshot(page, 'sweep-failure'));
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill('analyst@alder-creek.example');
    await page.getByLabel('Password').fill('seedwake-demo-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);

    await page.getByRole('navigation', { name: 'Workspace' }).getByRole('link', { name: 'Sweeps' }).click();
    await page.getByRole('link', { name: 'New sweep' }).click();
    await page.getByLabel('Scenario', { exact: true }).selectOption({ label: 'Hollow Lane ten-year plan' });
    const pick = page.getByLabel('Parameter to add');
    await expect.poll(() => pick.locator('option').count(), SLOW).toBeGreaterThan(10);
    for (const path of [
      'profile.seedDecay.shallow',
      'profile.seedDecay.deep',
      'profile.establishment.survival',
      'field.initialSeedbank.shallow',
    ]) {
      await pick.selectOption(path);
      await page.getByRole('button', { name: 'Add parameter' }).click();
    }
    await page.getByRole('radio', { name: /One at a time/ }).check();
    // Big enough points (one per chunk, about a second each) that a pause lands mid-sweep.
    await page.getByLabel('Replicates per point').fill('20000');
    // One at a time over k = 4 parameters: the base point and each parameter at min and at
    // max, 2k + 1 = 9 points (Saltelli et al. 2008, The Primer — recalled from memory).
    await expect.poll(() => page.getByText('9 points', { exact: true }).count(), SLOW).toBe(1);
    await expect.poll(() => page.getByText('1,800,000 replicate-years').count()).toBe(1);
    await expectNoSeriousViolations(page);

    await page.getByRole('button', { name: 'Launch sweep' }).click();
    await page.waitForURL(/\/sweeps\/[0-9a-f-]{36}$/);
    await expect.poll(() => pointsDone(page), SLOW).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Pause' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Resume' }).count(), SLOW).toBe(1);
    // The chunk in hand is finished or handed back within a heartbeat; then nothing moves.
    const sweepId = page.url().split('/').pop()!;
    const workspaceId = page.url().match(/\/w\/([0-9a-f-]{36})/)![1];
    const api = `${server.url}/api/workspaces/${workspaceId}/sweeps/${sweepId}`;
    let settled = -1;
    await expect
      .poll(
        async () => {
          const now = (await (await page.request.get(api)).json()).pointsDone as number;
          const same = now === settled;
          settled = now;
          return same;
        },
        { ...SLOW, interval: 3000 },
      )
      .toBe(true);

    await page.reload();
    await expect.poll(() => pointsDone(page), SLOW).toBe(settled);
    expect(settled).toBeGreaterThan(0);
    expect(settled).toBeLessThan(9);
    expect(await progress(page).getAttribute('aria-valuemax')).toBe('9');
    await page.getByRole('button', { name: 'Resume' }).click();
    await expect.poll(() => pointsDone(page), SLOW).toBe(9);
    await expect.poll(() => page.getByText('Finished', { exact: false }).count(), SLOW).toBeGreaterThan(0);

    const tornado = page.getByRole('figure', { name: 'Tornado: Seedbank in year 10' });
    await expect.poll(() => tornado.count(), SLOW).toBe(1);
    await tornado.getByText('The numbers').click();
    // Four bars, one per parameter.
    expect(await tornado.locator('tbody tr').count()).toBe(4);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download CSV' }).click(),
    ]);
    const csv = readFileSync((await download.path())!, 'utf8')
      .trimEnd()
      .split('\r\n');
    expect(csv[0]).toMatch(/^point,point_seed,profile\.seedDecay\.shallow \(fraction per year\),/);
    // Tidy: one row per point and outcome (Wickham 2014, J. Stat. Softw. 59(10)); one outcome.
    expect(csv).toHaveLength(1 + 9);
    await expectNoSeriousViolations(page);
    await screenshot(page, 'sweep');
    await context.close();
  });
});
