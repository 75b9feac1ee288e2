import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, screenshot, startServer } from '../support/browser';
import { uniqueEmail } from '../support/test-app';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

beforeAll(async () => {
  [browser, server] = await Promise.all([launchBrowser(), startServer()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe('a new person signs up and finds their way back', () => {
  it('signs up, lands on the dashboard, signs out and back in', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    const email = uniqueEmail('browser');
    const password = 'clover meadow sundial';
    await page.goto(`${server.url}/sign-up`);
    await page.getByLabel('Your name').fill('Rowan Tester');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    // A bad password is refused beside the field and nothing typed is lost.
    await expect
      .poll(() => page.getByText('at least 12 characters', { exact: false }).count())
      .toBeGreaterThan(0);
    expect(await page.getByLabel('E-mail').inputValue()).toBe(email);

    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toContain("Rowan Tester's workspace");
    await screenshot(page, 'dashboard');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toContain("Rowan Tester's workspace");
    await page.close();
  });

  it('signs in as the demo owner and opens the members page', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await page.goto(`${server.url}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill('owner@alder-creek.example');
    await page.getByLabel('Password').fill('seedwake-demo-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/w\//);
    const workspaceUrl = page.url();
    await page.goto(`${workspaceUrl}/members`);
    await expect.poll(() => page.getByText('Dale Merrow').count()).toBeGreaterThan(0);
    await screenshot(page, 'members');
    await page.close();
  });
});
