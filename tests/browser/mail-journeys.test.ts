import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import AxeBuilder from '@axe-core/playwright';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot, startServer } from '../support/browser';
import { uniqueEmail } from '../support/test-app';
import { linkIn, received } from '../support/mail';

let browser: Browser;
let server: Awaited<ReturnType<typeof startServer>>;

beforeAll(async () => {
  [browser, server] = await Promise.all([launchBrowser(), startServer()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

const DEMO_WORKSPACE = 'Alder Creek Berry Farm';

/** The server's mail loop sends within a fraction of a second; this waits for the message. */
async function mailTo(email: string, count = 1) {
  let got = await received(server.ctx, email);
  for (let i = 0; got.length < count && i < 200; i++) {
    await new Promise((r) => setTimeout(r, 50));
    got = await received(server.ctx, email);
  }
  expect(got.length).toBeGreaterThanOrEqual(count);
  return got[count - 1];
}

/** WCAG checks by axe-core; serious and critical findings fail the test. */
async function expectAccessible(page: Page) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
}

async function signInAsOwner(page: Page) {
  await page.goto(`${server.url}/sign-in`);
  await page.getByLabel('E-mail').fill('owner@alder-creek.example');
  await page.getByLabel('Password').fill('seedwake-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
  return page.url().match(/\/w\/([0-9a-f-]{36})$/)![1];
}

describe('an invitation by e-mail', () => {
  it('brings a new grower in as a viewer, and its link then refuses a second use', async () => {
    const owner = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const ws = await signInAsOwner(owner);
    await owner.goto(`${server.url}/w/${ws}/members`);
    const email = uniqueEmail('grower');
    const form = owner.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('E-mail').fill(email);
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => owner.getByText(`Invitation sent to ${email}`).count()).toBe(1);
    // The open invitations list shows it.
    await expect.poll(() => owner.getByRole('row', { name: new RegExp(email) }).count()).toBe(1);

    const message = await mailTo(email);
    expect(message.subject).toBe(`Hollis Varga invited you to ${DEMO_WORKSPACE} on Seedwake`);
    const { url } = linkIn(message.text, '/invitations');
    expect(url.startsWith(`${server.url}/invitations/`)).toBe(true);

    const grower = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    await grower.goto(url);
    await expect
      .poll(() => grower.getByRole('heading', { level: 1 }).textContent())
      .toBe(`Hollis Varga invited you to ${DEMO_WORKSPACE}`);
    await expectAccessible(grower);
    await screenshot(grower, 'invitation');
    await grower.getByRole('link', { name: 'Create your account' }).click();
    await grower.waitForURL(/\/sign-up\?invitation=/);
    // The invited address is filled in; the person adds a name and a password.
    expect(await grower.getByLabel('E-mail').inputValue()).toBe(email);
    await grower.getByLabel('Your name').fill('Wren Grower');
    await grower.getByLabel('Password').fill('blackcurrant hedgerow dawn');
    await grower.getByRole('button', { name: 'Create account' }).click();
    await grower.waitForURL(`${server.url}/w/${ws}`);
    await expect
      .poll(() => grower.getByRole('heading', { level: 1 }).textContent())
      .toContain(DEMO_WORKSPACE);

    // Viewer rights: the members page explains the role and offers no controls.
    await grower.goto(`${server.url}/w/${ws}/members`);
    await expect.poll(() => grower.getByText('You are a viewer in this workspace').count()).toBe(1);
    expect(await grower.getByRole('button', { name: 'Send invitation' }).count()).toBe(0);
    expect(await grower.getByRole('button', { name: 'Remove' }).count()).toBe(0);

    // The same link, followed again, is refused with a page that says why.
    const again = await (await browser.newContext()).newPage();
    await again.goto(url);
    await expect
      .poll(() => again.getByRole('heading', { level: 1 }).textContent())
      .toBe('This invitation has already been used');
    await screenshot(again, 'invitation-used');
    await Promise.all([owner.close(), grower.close(), again.close()]);
  });

  it('refuses an expired or unknown link with a clear page', async () => {
    const owner = await browser.newPage();
    const ws = await signInAsOwner(owner);
    const email = uniqueEmail('late');
    const res = await owner.request.post(`${server.url}/api/workspaces/${ws}/invitations`, {
      data: { email, role: 'viewer' },
      headers: { Origin: server.url },
    });
    expect(res.status()).toBe(201);
    const { url } = linkIn((await mailTo(email)).text, '/invitations');
    await server.ctx.pool.query(
      'UPDATE invitations SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE email = ?',
      [email],
    );
    const page = await (await browser.newContext()).newPage();
    await page.goto(url);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('This invitation has expired');
    expect(await page.getByText('Ask Hollis Varga to send it again').count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, 'invitation-expired');

    await page.goto(`${server.url}/invitations/${'Z'.repeat(43)}`);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('This invitation link does not work');
    await Promise.all([owner.close(), page.close()]);
  });
});

describe('a forgotten password', () => {
  it('is reset through the e-mailed link, and the sessions from before stop working', async () => {
    const email = uniqueEmail('forgetful');
    const oldPassword = 'gooseberry winter path';
    const before = await (await browser.newContext()).newPage();
    const signUp = await before.request.post(`${server.url}/api/auth/sign-up`, {
      data: { email, password: oldPassword, name: 'Sage Forgetful' },
      headers: { Origin: server.url },
    });
    expect(signUp.status()).toBe(201);
    await before.goto(`${server.url}/account`);
    await expect.poll(() => before.getByRole('heading', { level: 1 }).textContent()).toBe('Your account');

    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.waitForURL(/\/forgot-password$/);
    // What was typed on the sign-in page comes along.
    expect(await page.getByLabel('E-mail').inputValue()).toBe(email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await expect.poll(() => page.getByText('a link to choose a new password is on its way').count()).toBe(1);
    await expectAccessible(page);

    const { url } = linkIn((await mailTo(email)).text, '/reset-password');
    await page.goto(url);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('Choose a new password');
    const newPassword = 'quince lantern meadow';
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('New password again').fill('quince lantern meadoww');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await expect.poll(() => page.getByText('The two new passwords are not the same').count()).toBe(1);
    await page.getByLabel('New password again').fill(newPassword);
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.waitForURL(/\/sign-in\?reset=done$/);
    await expect.poll(() => page.getByText('Your password was changed').count()).toBe(1);
    await screenshot(page, 'password-reset-done');
    expect(await page.getByLabel('E-mail').inputValue()).toBe(email);
    await page.getByLabel('Password').fill(newPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);

    // The session from before the reset is over: the account page sends it to sign in.
    await before.reload();
    await before.waitForURL(/\/sign-in\?next=%2Faccount$/);
    // The link works once.
    await page.goto(url);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('This reset link has already been used');
    await Promise.all([before.close(), page.close()]);
  });
});
