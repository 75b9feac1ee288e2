// The consultant's journey through projections: the demo comparison from the dashboard,
// a re-run watched to the end, units, CSV and chart export, a reload in the middle of a
// long run, and what a viewer may not do. Accessibility is checked with axe-core.
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it, onTestFailed } from 'vitest';
import { AxeBuilder } from '@axe-core/playwright';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, screenshot, startServer } from '../support/browser';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

const PASSWORD = 'seedwake-demo-2026';
/** A machine shared with other test runs can be slow; no assertion here is about time. */
const SLOW = { timeout: 20_000 };
const DEMO_BATCH = '5eedfa00-0000-4000-8000-000000000501';

beforeAll(async () => {
  [browser, server] = await Promise.all([launchBrowser(), startServer()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function signIn(context: BrowserContext, email: string): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
  return page;
}

/**
 * axe-core's rules cover WCAG 2.x A and AA (contrast, names, labels, landmarks); the issue
 * asks that none of its serious or critical findings remain.
 */
async function expectNoSeriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
  expect(serious).toEqual([]);
}

/** The first line of a downloaded file, after the click that starts the download. */
async function downloadedText(
  page: Page,
  click: () => Promise<void>,
): Promise<{ name: string; text: string }> {
  const [download] = await Promise.all([page.waitForEvent('download'), click()]);
  const path = await download.path();
  return { name: download.suggestedFilename(), text: readFileSync(path!, 'utf8') };
}

describe('projections, comparisons and let it seed', () => {
  it('opens the demo comparison, re-runs it, switches units, exports, and keeps progress over a reload', async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 900 },
      acceptDownloads: true,
    });
    const page = await signIn(context, 'consultant@alder-creek.example');
    // What the page showed when a step failed, for whoever reads the failure.
    onTestFailed(() => screenshot(page, 'projections-failure'));
    const workspaceUrl = page.url();

    // Dashboard: the quick start leads to the seeded comparison.
    const quickStart = page.getByRole('link', { name: /Open the comparison/ });
    await quickStart.waitFor();
    await expectNoSeriousViolations(page);
    await quickStart.click();
    await page.waitForURL(/\/batches\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Summary' }).waitFor();
    const table = page.getByRole('table', { name: /Summary of each strategy/ });
    // The demo strategies and the No control reference, one row each.
    await expect.poll(() => table.getByRole('rowheader', { name: 'No control' }).count(), SLOW).toBe(1);
    const rows = await table.locator('tbody tr').count();
    expect(rows).toBeGreaterThanOrEqual(2);
    expect(await page.locator('svg[data-chart]').count()).toBeGreaterThanOrEqual(5);
    expect(await page.getByText('Pesticide cautions').count()).toBe(1);
    await expectNoSeriousViolations(page);
    await screenshot(page, 'comparison');

    // CSV of the summary table: the header names each column with its unit.
    const csv = await downloadedText(page, () =>
      page.getByRole('button', { name: 'Download table (CSV)' }).click(),
    );
    expect(csv.name).toMatch(/\.csv$/);
    const header = csv.text.split(/\r?\n/)[0];
    expect(header.startsWith('strategy,role,seedbankYear5Median (seeds/m²)')).toBe(true);
    // One line per row of the table, plus the header and the final line break.
    expect(csv.text.trimEnd().split(/\r?\n/)).toHaveLength(rows + 1);

    // A chart exports as SVG (with its title) and as PNG (the PNG signature, RFC 2083 §3.1).
    const seedbankFigure = page.getByRole('figure', { name: /Seedbank, total/ });
    const svg = await downloadedText(page, () =>
      seedbankFigure.getByRole('button', { name: /as SVG/ }).click(),
    );
    expect(svg.text).toContain('<svg');
    expect(svg.text).toContain('Seedbank, total');
    const [pngDownload] = await Promise.all([
      page.waitForEvent('download'),
      seedbankFigure.getByRole('button', { name: /as PNG/ }).click(),
    ]);
    const png = readFileSync((await pngDownload.path())!);
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

    // Units: US customary shows densities per ft².
    await page.locator('header label', { hasText: 'US customary' }).click();
    await expect.poll(() => table.locator('thead').textContent(), SLOW).toContain('seeds/ft²');
    await expect.poll(() => table.locator('thead').textContent(), SLOW).not.toContain('seeds/m²');
    await page.locator('header label', { hasText: 'Metric' }).click();

    // Run again with the same seed: a new launch whose progress is followed to the end.
    const firstBatch = page.url();
    await page.getByRole('button', { name: 'Run again with the same seed' }).click();
    await page.waitForURL((url) => /\/batches\/[0-9a-f-]{36}$/.test(url.pathname) && url.href !== firstBatch);
    // Every row is back once every projection of the new launch has finished.
    await expect.poll(() => table.locator('tbody tr').count(), { timeout: 60_000 }).toBe(rows);
    expect(await page.getByRole('progressbar').count()).toBe(0);

    // One projection of the new launch: bands, depletion, year table, elasticities, seed.
    await table.getByRole('link', { name: 'Dig out crowns, then stop seed set' }).click();
    await page.waitForURL(/\/projections\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Which stage to hit' }).waitFor();
    expect(
      await page.getByText('λ < 1: the program drives the population down', { exact: false }).count(),
    ).toBe(1);
    // The demo seed, recorded with the result (server/db/seed/demo-library.ts).
    expect(await page.getByText('20261201', { exact: true }).count()).toBeGreaterThan(0);
    expect(await page.locator('svg[data-chart]').count()).toBe(5);
    const years = await downloadedText(page, () =>
      page.getByRole('button', { name: 'Download table (CSV, all measures)' }).click(),
    );
    expect(years.text.split(/\r?\n/)[0]).toBe('year,measure,unit,mean,sd,q05,q25,median,q75,q95');
    await expectNoSeriousViolations(page);
    await screenshot(page, 'projection');

    // A larger run: progress survives a reload, because it comes from the server.
    await page.goto(`${workspaceUrl}/scenarios/new`);
    await page.getByLabel('Scenario name').fill('Large run for the progress check');
    await page.getByLabel('Field', { exact: true }).selectOption({ label: 'Hollow Lane block (raspberry)' });
    await page.getByRole('checkbox', { name: /Repeated shoot removal/ }).check();
    await page.getByLabel('Replicates').fill('100000');
    await page.getByRole('button', { name: 'Create and run' }).click();
    await page.waitForURL(/\/batches\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByRole('progressbar').count(), SLOW).toBe(2);
    await page.reload();
    await expect.poll(() => page.getByRole('progressbar').count(), SLOW).toBe(2);
    await expect
      .poll(() => page.getByRole('progressbar').first().getAttribute('aria-valuemax'), SLOW)
      .toBe('100000');
    // Cancelling frees the worker for whatever runs next (a run already summarising may still finish).
    const cancelButtons = page.getByRole('button', { name: /^Cancel / });
    await expect
      .poll(
        async () => {
          if ((await cancelButtons.count()) > 0) await cancelButtons.first().click();
          return cancelButtons.count();
        },
        { timeout: 40_000 },
      )
      .toBe(0);
    // No control was still queued when it was cancelled, so it stays listed as cancelled.
    await expect.poll(() => page.getByText(/^Cancelled · /).count(), SLOW).toBeGreaterThan(0);
    await context.close();
  });

  it('shows a viewer the comparison and the let-it-seed view without edit controls', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await signIn(context, 'grower@alder-creek.example');
    // The demo's seeded launch (server/db/seed/demo.ts) carries a let-it-seed run.
    await page.goto(`${page.url()}/batches/${DEMO_BATCH}`);
    await page.getByRole('heading', { name: 'Summary' }).waitFor();
    expect(await page.getByRole('button', { name: /Run again/ }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Edit the scenario' }).count()).toBe(0);
    await page.getByRole('link', { name: 'Open the let-it-seed view' }).click();
    await page.waitForURL(/\/let-it-seed$/);
    await page.getByText('Letting the plants seed in year', { exact: false }).waitFor();
    expect(await page.getByRole('button', { name: /Run the let-it-seed comparison/ }).count()).toBe(0);
    await context.close();
  });
});
