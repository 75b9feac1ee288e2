// A teacher builds a lesson from a template, shares its class link, and a signed-out
// student opens it, moves a slider with the keyboard and switches to projector mode.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import AxeBuilder from '@axe-core/playwright';
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { lessonRuns } from '../../shared/lessons/runs';
import type { ClassLessonView } from '../../shared/api/lessons';
import { launchBrowser, screenshot, screenshotDir, startServer } from '../support/browser';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

beforeAll(async () => {
  [browser, server] = await Promise.all([launchBrowser(), startServer()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function seriousViolations(page: Page) {
  const result = await new AxeBuilder({ page }).analyze();
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

const meanField = async (page: Page) =>
  JSON.parse(
    (await page.locator('[data-lesson-chart="seedbankTotal"]').first().getAttribute('data-mean-field'))!,
  ) as Record<string, number[]>;

/** The CLI's mean field for a scenario, run as a script would run it. */
function cliMeanField(scenario: unknown): number[] {
  const dir = mkdtempSync(join(tmpdir(), 'seedwake-lesson-'));
  const file = join(dir, 'scenario.json');
  writeFileSync(file, JSON.stringify(scenario));
  const run = spawnSync('npx', ['tsx', 'server/cli/sim.ts', 'project', file, '--replicates', '10'], {
    encoding: 'utf8',
    timeout: 60_000,
  });
  if (run.status !== 0) throw new Error(`sim exited ${run.status}: ${run.stderr}`);
  return JSON.parse(run.stdout).meanField.seedbankTotal;
}

describe('a lesson from a template, opened from its class link', () => {
  it('is built by a teacher, runs signed out, follows the keyboard and goes to projector mode', async () => {
    const teacher = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await teacher.goto(`${server.url}/sign-in`);
    await teacher.getByLabel('E-mail').fill('teacher@alder-creek.example');
    await teacher.getByLabel('Password').fill('seedwake-demo-2026');
    await teacher.getByRole('button', { name: 'Sign in' }).click();
    await teacher.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    const workspaceUrl = teacher.url();

    await teacher.getByRole('link', { name: 'Lessons', exact: true }).click();
    await teacher.getByRole('link', { name: 'New lesson' }).click();
    await teacher.getByRole('radio', { name: /Seedbank decay/ }).check();
    await teacher.getByLabel('Title').fill('Two cohorts, one question');
    await teacher.getByLabel('Starts at, Annual seed decay (d), cohort A').fill('0.2');
    await teacher
      .getByLabel('Prompt 1')
      .fill('Which cohort lasts **longer**? <script>window.hacked = true</script>');
    await teacher.getByRole('button', { name: 'Create the lesson' }).click();
    await teacher.waitForURL(/\/lessons\/[0-9a-f-]{36}$/);
    await expect
      .poll(() => teacher.getByRole('heading', { level: 1 }).textContent())
      .toBe('Two cohorts, one question');

    await teacher.getByRole('button', { name: 'Make a class link' }).click();
    const linkBox = teacher.getByLabel('The class link (shown once — copy it now)');
    await expect.poll(() => linkBox.inputValue()).toMatch(/\/class\/[A-Za-z0-9_-]{43}$/);
    const classUrl = await linkBox.inputValue();

    // A fresh context: no cookie, nobody signed in.
    const student = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await student.newPage();
    await page.goto(classUrl);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('Two cohorts, one question');
    // Only this lesson: none of the workspace's navigation, and its API stays closed.
    expect(await page.getByRole('link', { name: 'Overview' }).count()).toBe(0);
    const wsId = workspaceUrl.split('/w/')[1];
    expect((await page.request.get(`${server.url}/api/workspaces/${wsId}/lessons`)).status()).toBe(401);
    // The prompt's Markdown is rendered and its script is gone.
    expect(await page.locator('#prompts-title + ol strong').textContent()).toBe('longer');
    expect(await page.evaluate(() => (window as { hacked?: boolean }).hacked)).toBeUndefined();
    expect(await page.locator('#prompts-title + ol script').count()).toBe(0);

    // The browser's deterministic numbers equal the CLI's for the same inputs.
    const lesson = (await (
      await page.request.get(classUrl.replace('/class/', '/api/class/'))
    ).json()) as ClassLessonView;
    const values = JSON.parse((await page.locator('[data-values]').getAttribute('data-values'))!);
    expect(values.decay).toBe(0.2);
    const before = await meanField(page);
    const [cohortA] = lessonRuns(lesson.definition, null, values);
    const cli = cliMeanField(cohortA.scenario);
    expect(before['cohort-a']).toHaveLength(lesson.definition.settings.horizonYears + 1);
    before['cohort-a'].forEach((v, t) => expect(v).toBeCloseTo(cli[t], 9));
    // The decay lesson's axis reaches at least 40 years (buried seed stays viable for more
    // than 40 years: common practice, no published source).
    expect(lesson.definition.settings.horizonYears).toBeGreaterThanOrEqual(40);
    expect(await page.locator('svg[data-chart] text', { hasText: /^40$/ }).count()).toBeGreaterThan(0);

    // The keyboard moves the slider and the chart follows.
    const halfLife = page.locator('[data-figure="cohort-a-half-life"]');
    const halfLifeBefore = await halfLife.textContent();
    const slider = page.getByRole('slider', { name: 'Annual seed decay (d), cohort A' });
    await slider.focus();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => slider.inputValue()).toBe('0.22');
    await expect
      .poll(async () => (await meanField(page))['cohort-a'][10])
      .toBeLessThan(before['cohort-a'][10]);
    expect(await halfLife.textContent()).not.toBe(halfLifeBefore);

    // Replay with chance: the bands arrive.
    await page.getByRole('button', { name: 'Replay with chance' }).click();
    await expect
      .poll(() => page.getByText('200 replicates with seed', { exact: false }).count())
      .toBeGreaterThan(0);
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'lesson');

    // Projector mode: the lesson alone, large, keyboard-driven, on a projector-sized screen.
    await page.setViewportSize({ width: 1600, height: 1000 });
    await page.getByRole('button', { name: 'Projector mode' }).click();
    const projector = page.getByRole('dialog', { name: /Projector mode/ });
    await expect.poll(() => projector.isVisible()).toBe(true);
    const big = projector.getByRole('slider', { name: 'Germination (g), cohort A' });
    await big.focus();
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => big.inputValue()).toBe('0.07');
    expect(await seriousViolations(page)).toEqual([]);
    // What the room sees: the screen, not the page scrolled behind the dialog.
    mkdirSync(screenshotDir, { recursive: true });
    await page.screenshot({ path: join(screenshotDir, 'projector.png') });
    await page.keyboard.press('Escape');
    await expect.poll(() => projector.count()).toBe(0);
    // The setting made on the projector is still there on the page.
    expect(await page.getByRole('slider', { name: 'Germination (g), cohort A' }).inputValue()).toBe('0.07');

    await student.close();
    await teacher.close();
  });
});
