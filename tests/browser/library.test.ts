import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import AxeBuilder from '@axe-core/playwright';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, screenshot, startServer } from '../support/browser';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

beforeAll(async () => {
  [browser, server] = await Promise.all([launchBrowser(), startServer()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

// One signed-in browser context per demo person (axe needs pages made from a context);
// each test opens its own page in it, so signing in happens once per person.
const contexts = new Map<string, BrowserContext>();

async function signIn(who: 'consultant' | 'grower'): Promise<{ page: Page; workspaceUrl: string }> {
  let context = contexts.get(who);
  if (!context) {
    context = await browser.newContext({ viewport: { width: 1280, height: 1200 } });
    contexts.set(who, context);
    const page = await context.newPage();
    await page.goto(`${server.url}/sign-in`);
    // The demo people and their password, as the demo seed creates them.
    await page.getByLabel('E-mail').fill(`${who}@alder-creek.example`);
    await page.getByLabel('Password').fill('seedwake-demo-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    return { page, workspaceUrl: page.url() };
  }
  const page = await context.newPage();
  await page.goto(`${server.url}/`);
  await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
  return { page, workspaceUrl: page.url() };
}

async function openDemoStrategy(page: Page, workspaceUrl: string) {
  await page.goto(`${workspaceUrl}/strategies`);
  await page.getByRole('link', { name: 'Repeated shoot removal before seed set' }).click();
  await page.getByRole('heading', { level: 1, name: 'Repeated shoot removal before seed set' }).waitFor();
}

const band = (page: Page, timing: string) => page.locator(`section[data-timing="${timing}"]`);
const status = (page: Page) => page.locator('section[aria-labelledby="timeline-title"] [role="status"]');

describe('the strategy builder, species profiles and roles', () => {
  it('adds steps by keyboard and by mouse, moves them, and keeps them after a reload', async () => {
    const { page, workspaceUrl } = await signIn('consultant');
    await openDemoStrategy(page, workspaceUrl);

    // Keyboard: open the kind chooser, walk the radio group to Mulch, add it with Enter.
    await page.getByRole('button', { name: 'Add a step' }).focus();
    await page.keyboard.press('Enter');
    await expect
      .poll(() => page.evaluate(() => (document.activeElement as HTMLInputElement).value))
      .toBe('pre-emergence-herbicide');
    for (let i = 0; i < 10; i++) {
      if ((await page.evaluate(() => (document.activeElement as HTMLInputElement).value)) === 'mulch') break;
      await page.keyboard.press('ArrowDown');
    }
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { level: 2, name: /Step 3: Mulch/ }).waitFor();

    // A bad efficacy is refused beside its field and what was typed stays.
    const mean = page.getByLabel('Efficacy, mean');
    await mean.fill('1.4');
    const editor = page.locator('#step-editor');
    // The range of a fraction is 0–1 (a probability cannot exceed 1; common practice, no published source).
    await expect.poll(() => editor.getByText('1.4 is outside 0–1 (fraction)').count()).toBe(1);
    await page.getByRole('button', { name: 'Save strategy' }).click();
    await expect.poll(() => page.getByText('before the strategy can be saved').count()).toBe(1);
    expect(await mean.inputValue()).toBe('1.4');
    await mean.fill('0.8');
    await expect.poll(() => editor.getByText('is outside 0–1').count()).toBe(0);

    // Move it by keyboard: a mulch acts before emergence, so ↓ takes it from the dormant season to spring.
    const mulch = page.getByRole('button', { name: /^Mulch/ });
    await mulch.focus();
    await page.keyboard.press('ArrowDown');
    await expect.poll(() => status(page).textContent()).toContain('Moved “Mulch” to spring');
    await expect
      .poll(() =>
        band(page, 'spring')
          .getByRole('button', { name: /^Mulch/ })
          .count(),
      )
      .toBe(1);

    // Mouse: add a seed-set prevention step with clicks; it starts in summer, its first allowed season.
    await page.getByRole('button', { name: 'Add a step' }).click();
    await page.getByText('Seed-set prevention', { exact: true }).click();
    await page.getByRole('button', { name: 'Add step', exact: true }).click();
    await page.getByRole('heading', { level: 2, name: /Step 4: Seed-set prevention/ }).waitFor();
    await page.getByRole('button', { name: 'Done' }).click();

    // Drag it by its name from summer into the late-summer band.
    await band(page, 'late-summer').scrollIntoViewIfNeeded();
    const chip = band(page, 'summer').getByRole('button', { name: /^Seed-set prevention/ });
    const from = (await chip.boundingBox())!;
    const to = (await band(page, 'late-summer').boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    await page.mouse.move(from.x + from.width / 2, to.y + to.height - 12, { steps: 8 });
    await page.mouse.up();
    await expect
      .poll(() =>
        band(page, 'late-summer')
          .getByRole('button', { name: /^Seed-set prevention/ })
          .count(),
      )
      .toBe(1);

    await page.getByRole('button', { name: 'Save strategy' }).click();
    await expect.poll(() => page.getByText(/Saved at/).count()).toBe(1);

    // axe on the builder as an editor sees it, with the step form open.
    await page.getByRole('button', { name: /^Mulch/ }).click();
    const axe = await new AxeBuilder({ page }).analyze();
    const serious = axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
    expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
    // The whole builder in one screen, so the sticky save bar sits at its foot in the picture.
    const height = await page.evaluate(() => document.documentElement.scrollHeight);
    await page.setViewportSize({ width: 1280, height });
    await screenshot(page, 'strategy-builder');

    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Repeated shoot removal before seed set' }).waitFor();
    expect(
      await band(page, 'spring')
        .getByRole('button', { name: /^Mulch/ })
        .count(),
    ).toBe(1);
    expect(
      await band(page, 'late-summer')
        .getByRole('button', { name: /^Seed-set prevention/ })
        .count(),
    ).toBe(1);
    await page.close();
  });

  it('warns beside a chemical step whose entered rate is above a recorded label maximum', async () => {
    const { page, workspaceUrl } = await signIn('consultant');
    await page.goto(`${workspaceUrl}/strategies`);
    await page.getByRole('link', { name: 'Residual, post-emergence and spot treatment' }).click();
    await page.getByRole('button', { name: /^Fall spot treatment of survivors/ }).click();
    const editor = page.locator('#step-editor');
    // The product never fills in a rate: the field starts empty.
    expect(await editor.getByLabel(/^Rate \(as on the label\)/).inputValue()).toBe('');
    await editor.getByLabel(/^Rate \(as on the label\)/).fill('2');
    await editor.getByLabel(/^Rate unit/).fill('kg a.i./ha');
    await page.getByRole('button', { name: 'Add a maximum rate' }).click();
    await page.getByLabel('Active ingredient, row 1').fill('glyphosate');
    await page.getByLabel('Maximum rate, row 1').fill('1.5');
    await page.getByLabel('Rate unit, row 1').fill('kg a.i./ha');
    await page.getByRole('button', { name: 'Save strategy' }).click();
    await page.getByRole('heading', { name: /above a maximum you recorded/ }).waitFor();
    expect(await editor.getByText(/exceeds the maximum 1\.5 kg a\.i\.\/ha/).count()).toBe(1);
    expect(
      await page.getByRole('button', { name: /^Fall spot treatment of survivors.*rate warning/ }).count(),
    ).toBe(1);
    await page.close();
  });

  it('previews seedbank decay as a copied profile is edited', async () => {
    const { page, workspaceUrl } = await signIn('consultant');
    await page.goto(`${workspaceUrl}/profiles`);
    await page.getByRole('button', { name: 'Copy to edit Brookside dock (illustrative)' }).click();
    await page.waitForURL(/\/profiles\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { level: 1, name: 'Brookside dock (copy)' }).waitFor();
    await page.getByLabel('Seed decay, shallow layer', { exact: true }).fill('0.5');
    // Losing half of the seed each year halves it in exactly one year: (1 − 0.5)^1 = 0.5.
    await expect.poll(() => page.getByText('decay alone: 1 year', { exact: true }).count()).toBe(1);
    await page.getByRole('button', { name: 'Save profile' }).click();
    await expect.poll(() => page.getByText(/Saved at/).count()).toBe(1);
    await page.close();
  });

  it('shows a viewer no edit controls on strategies and profiles', async () => {
    const { page, workspaceUrl } = await signIn('grower');
    await openDemoStrategy(page, workspaceUrl);
    await page.getByRole('button', { name: /^Cut shoots before flowering/ }).click();
    await page.locator('#step-editor').waitFor();
    for (const name of [
      'Add a step',
      'Save strategy',
      'Delete strategy',
      'Remove this step',
      'Repeat this step',
    ]) {
      expect(await page.getByRole('button', { name }).count(), name).toBe(0);
    }
    expect(await page.getByRole('textbox').count()).toBe(0);

    await page.goto(`${workspaceUrl}/profiles`);
    expect(await page.getByRole('button', { name: /Copy to edit/ }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'New profile' }).count()).toBe(0);
    await page.getByRole('link', { name: 'Brookside dock (illustrative)', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'Brookside dock (illustrative)' }).waitFor();
    await page.getByText('Seedbank decay preview').waitFor();
    expect(await page.getByRole('textbox').count()).toBe(0);
    expect(await page.getByRole('button', { name: /Save profile|Copy to edit/ }).count()).toBe(0);
    await page.close();
  });

  it('creates an API token whose secret is shown once, then revokes it', async () => {
    const { page } = await signIn('consultant');
    await page.goto(`${server.url}/account`);
    const form = page.locator('form[aria-labelledby="create-token-title"]');
    await form.getByLabel('Name').fill('sweep script');
    // An editor may give a token at most the editor role.
    const roles = await form.getByLabel('Role').locator('option').allTextContents();
    expect(roles).toEqual(['Editor', 'Viewer']);
    await form.getByRole('button', { name: 'Create token' }).click();
    await page.getByText('Seedwake will not show it again', { exact: false }).waitFor();
    const secret = await page.getByLabel('The new token').inputValue();
    const row = page.getByRole('row', { name: /sweep script/ });
    const prefix = (await row.locator('td.font-mono').textContent())!.replace('…', '');
    expect(secret.startsWith(prefix)).toBe(true);
    expect(secret.length).toBeGreaterThan(prefix.length);

    await page.reload();
    await page.getByRole('row', { name: /sweep script/ }).waitFor();
    expect(await page.getByLabel('The new token').count()).toBe(0);
    await page
      .getByRole('row', { name: /sweep script/ })
      .getByRole('button', { name: /Revoke/ })
      .click();
    await page.getByRole('button', { name: 'Revoke “sweep script”' }).click();
    await expect.poll(() => page.getByRole('row', { name: /sweep script/ }).count()).toBe(0);
    await page.close();
  });
});
