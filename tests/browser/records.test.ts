// Journey 2 of the product brief in the browser: the consultant uploads the demo's invented
// efficacy trial, reads the preview, imports it, reads the % control table, adopts one
// estimate into a strategy step and sees the source note; a viewer reads without edit
// controls. Accessibility is checked with axe-core.
import { readFileSync } from 'node:fs';
import { AxeBuilder } from '@axe-core/playwright';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFields, demoStrategies } from '../../server/db/seed/demo-library';
import { launchBrowser, screenshot, startServer } from '../support/browser';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

const PASSWORD = 'seedwake-demo-2026';
const WS = '5eedfa00-0000-4000-8000-000000000001';
const TRIAL = 'models/examples/records/hollow-lane-efficacy-trial.csv';

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

/** axe-core covers WCAG 2.x A and AA; none of its serious or critical findings may remain. */
async function expectNoSeriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
  expect(serious).toEqual([]);
}

describe('field records', () => {
  it('uploads the demo trial, previews, imports, reads % control, adopts into a step and shows the source note', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await signIn(context, 'consultant@alder-creek.example');
    // A field and a strategy of this test's own, so the demo's seeded records and strategies stay as they are.
    const api = (path: string, body: unknown) =>
      page.request.post(`${server.url}/api/workspaces/${WS}${path}`, {
        data: body,
        headers: { Origin: server.url },
      });
    const field = await (
      await api('/fields', {
        crop: 'raspberry',
        plantingYear: 2022,
        notes: '',
        setting: { ...demoFields[0].setting, name: 'Records journey block' },
      })
    ).json();
    const plan = demoStrategies[0];
    const strategy = await (
      await api('/strategies', {
        strategy: { name: 'Records journey plan', steps: plan.steps },
        description: '',
        fieldId: field.id,
        maxRates: [],
      })
    ).json();
    expect(strategy.id).toMatch(/^[0-9a-f-]{36}$/);

    await page.goto(`${server.url}/w/${WS}/fields/${field.id}/records`);
    await page.getByRole('heading', { name: 'Records of Records journey block' }).waitFor();
    await page.getByLabel('Kind of records').selectOption('efficacy-trials');
    await page.getByLabel('File', { exact: true }).setInputFiles(TRIAL);
    // The preview: no problems, 80 plots, the check picked from the treatments named in the file.
    await page
      .getByText('No problems found: all 80 rows can be imported. Nothing has been saved yet.')
      .waitFor();
    await expect.poll(() => page.getByLabel('Untreated check').inputValue()).toBe('untreated check');
    expect(
      await page
        .getByRole('table', { name: /rows and every row with a problem/ })
        .locator('tbody tr')
        .count(),
    ).toBeGreaterThan(10);
    await expectNoSeriousViolations(page);

    await page.getByRole('button', { name: 'Import 80 rows' }).click();
    await page.getByText(/Imported hollow-lane-efficacy-trial\.csv: 80 rows/).waitFor();
    const uploads = page.getByRole('table', { name: /Uploaded record files/ });
    await uploads.getByRole('link', { name: 'hollow-lane-efficacy-trial.csv' }).waitFor();

    // The % control table at 4 weeks after treatment.
    await page.getByLabel('Assessment timing').selectOption({ label: '4 WAT' });
    const control = page.getByRole('table', { name: '% control per treatment, 4 WAT' });
    await control.waitFor();
    const glyphosate = control.getByRole('row', { name: /glyphosate spot/ });
    // Abbott's % control from the file, hand-computed for 4 WAT: blocks I–IV check 47, 57, 37, 61 and
    // glyphosate spot 3, 2, 3, 2 plants → 93.6, 96.5, 91.9, 96.7 %, mean 94.7 % ± SD 2.3 %.
    await expect.poll(() => glyphosate.textContent()).toContain('94.7 ± 2.3');
    const plot = (treatment: string, block: string) =>
      readFileSync(TRIAL, 'utf8')
        .split('\n')
        .find((l) => l.startsWith(`Hollow Lane 2025,${treatment},${block},4 WAT,`))
        ?.split(',')[4];
    expect(['I', 'II', 'III', 'IV'].map((b) => plot('untreated check', b))).toEqual(['47', '57', '37', '61']);
    expect(['I', 'II', 'III', 'IV'].map((b) => plot('glyphosate spot', b))).toEqual(['3', '2', '3', '2']);
    await expectNoSeriousViolations(page);

    await page.getByRole('button', { name: 'Adopt into a step: glyphosate spot at 4 WAT' }).click();
    const panel = page.getByRole('region', { name: 'Adopt: glyphosate spot at 4 WAT' });
    await panel.waitFor();
    // The step preselected is the one whose active ingredient the treatment names.
    await expect.poll(() => panel.getByLabel('Strategy').inputValue()).toBe(strategy.id);
    await expect.poll(() => panel.getByLabel('Step').inputValue()).toBe('2');
    await panel
      .getByText('Set the efficacy of step 3 “Fall spot treatment of survivors” in “Records journey plan”')
      .waitFor();
    const preview = await panel.getByRole('blockquote').textContent();
    expect(preview).toMatch(
      /^From upload hollow-lane-efficacy-trial\.csv \(sha256 [0-9a-f]{12}…\), trial Hollow Lane 2025, glyphosate spot: % control 95 ± 2 %/,
    );
    await expectNoSeriousViolations(page);
    await panel.getByRole('button', { name: 'Adopt this estimate' }).click();
    await panel.getByText('Source note recorded').waitFor();
    expect(await panel.getByRole('blockquote').textContent()).toBe(preview);
    await page.getByRole('heading', { name: 'Adopted from these records' }).scrollIntoViewIfNeeded();
    await page.getByText('in use').waitFor();
    await screenshot(page, 'records');

    // The step now carries the trial's mean and SD as fractions, and its source note.
    const saved = await (
      await page.request.get(`${server.url}/api/workspaces/${WS}/strategies/${strategy.id}`)
    ).json();
    expect(saved.strategy.steps[2].efficacy.mean).toBeCloseTo(0.947, 3);
    const sources = await (
      await page.request.get(`${server.url}/api/workspaces/${WS}/strategies/${strategy.id}/sources`)
    ).json();
    expect(sources['steps[2].efficacy']).toBe(preview);
    await context.close();
  });

  it('shows a viewer the records and estimates without upload or adopt controls', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await signIn(context, 'grower@alder-creek.example');
    await page.goto(`${server.url}/w/${WS}/fields/${demoFields[0].id}/records`);
    await page.getByRole('heading', { name: 'Estimates' }).waitFor();
    await page.getByRole('table', { name: /Seedbank density per layer and year/ }).waitFor();
    expect(await page.getByRole('heading', { name: 'Upload records' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Adopt into|^Set as initial/ }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Remove' }).count()).toBe(0);
    await expectNoSeriousViolations(page);
    await context.close();
  });
});
