import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RowDataPacket } from 'mysql2';
import { PASSWORD, browserLike, signUp, testApp, uniqueEmail } from '../../support/test-app';
import { linkIn, mailbox } from '../../support/mail';

const t = testApp();
let box: Awaited<ReturnType<typeof mailbox>>;
beforeAll(async () => {
  box = await mailbox(t.ctx);
});
afterAll(async () => {
  await box.close();
  await t.close();
});

const NEW_PASSWORD = 'rhubarb lantern orchard';
const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');
const ask = (email: string, app = t.app) => browserLike(app).post('/api/auth/password-reset').send({ email });

/** Waits until the request handled after its answer has been recorded. */
async function requestRecorded(email: string) {
  for (let i = 0; i < 200; i++) {
    const [rows] = await t.ctx.pool.query<RowDataPacket[]>(
      "SELECT 1 FROM audit_log WHERE event = 'password_reset_requested' AND JSON_VALUE(detail, '$.email') = ?",
      [email],
    );
    if (rows.length) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error('the reset request was never handled');
}

describe('password reset', () => {
  it('works end to end through the mailbox, and every old session stops working', async () => {
    const { agent, email } = await signUp(t.app, 'forgetful');
    const other = browserLike(t.app);
    expect((await other.post('/api/auth/sign-in').send({ email, password: PASSWORD })).status).toBe(200);

    const res = await ask(email);
    expect(res.status).toBe(202);
    const [message] = await box.waitFor(email);
    expect(message.subject).toContain('Reset');
    const { url, token } = linkIn(message.text, '/reset-password');
    expect(url.startsWith('http://seedwake.test/reset-password/')).toBe(true);
    // Stored hashed (OWASP Forgot Password cheat sheet); the digest is node:crypto's SHA-256.
    const [rows] = await t.ctx.pool.query<RowDataPacket[]>(
      'SELECT token_hash FROM password_resets WHERE token_hash = ?',
      [sha256(token)],
    );
    expect(rows).toHaveLength(1);

    const lookup = await browserLike(t.app).get(`/api/auth/password-reset/${token}`);
    expect(lookup.body).toMatchObject({ state: 'valid', email });
    // One hour, as the product asks.
    expect(Date.parse(lookup.body.expiresAt) - Date.now()).toBeGreaterThan(59 * 60_000);
    expect(Date.parse(lookup.body.expiresAt) - Date.now()).toBeLessThanOrEqual(60 * 60_000);

    const weak = await browserLike(t.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ newPassword: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.newPassword).toBeDefined();

    const done = await browserLike(t.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ newPassword: NEW_PASSWORD });
    expect(done.status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect((await other.get('/api/auth/me')).status).toBe(401);
    expect(
      (await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status,
    ).toBe(401);
    expect(
      (await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: NEW_PASSWORD })).status,
    ).toBe(200);

    // Single use.
    const again = await browserLike(t.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ newPassword: 'another fresh passphrase' });
    expect(again.status).toBe(410);
    expect((await browserLike(t.app).get(`/api/auth/password-reset/${token}`)).body.state).toBe('used');
  });

  it('gives the same answer for an unknown address and sends nothing', async () => {
    const { email } = await signUp(t.app, 'known');
    const unknown = uniqueEmail('nobody');
    const a = await ask(email);
    const b = await ask(unknown);
    expect(a.status).toBe(202);
    expect(b.status).toBe(202);
    expect(b.body).toEqual(a.body);
    await requestRecorded(unknown);
    const [rows] = await t.ctx.pool.query<RowDataPacket[]>('SELECT 1 FROM mail_queue WHERE to_address = ?', [
      unknown,
    ]);
    expect(rows).toEqual([]);
  });

  it('refuses an expired link and leaves the password as it was', async () => {
    const { email } = await signUp(t.app, 'slow');
    await ask(email);
    const { token } = linkIn((await box.waitFor(email))[0].text, '/reset-password');
    await t.ctx.pool.query(
      'UPDATE password_resets SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE token_hash = ?',
      [sha256(token)],
    );
    expect((await browserLike(t.app).get(`/api/auth/password-reset/${token}`)).body.state).toBe('expired');
    const res = await browserLike(t.app)
      .post(`/api/auth/password-reset/${token}`)
      .send({ newPassword: NEW_PASSWORD });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/);
    expect(
      (await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status,
    ).toBe(200);
  });

  it('voids the other links of the account once one is used', async () => {
    const { email } = await signUp(t.app, 'twice');
    await ask(email);
    await box.waitFor(email, 1);
    await ask(email);
    const [first, second] = (await box.waitFor(email, 2)).map((m) => linkIn(m.text, '/reset-password').token);
    expect(
      (
        await browserLike(t.app)
          .post(`/api/auth/password-reset/${second}`)
          .send({ newPassword: NEW_PASSWORD })
      ).status,
    ).toBe(204);
    const stale = await browserLike(t.app)
      .post(`/api/auth/password-reset/${first}`)
      .send({ newPassword: 'yet another passphrase' });
    expect(stale.status).toBe(410);
  });

  it('answers 404 for an unknown link', async () => {
    const res = await browserLike(t.app)
      .post(`/api/auth/password-reset/${'C'.repeat(43)}`)
      .send({ newPassword: NEW_PASSWORD });
    expect(res.status).toBe(404);
  });
});

describe('password reset is rate-limited', () => {
  const limited = testApp({
    linkLimits: {
      resetPerEmail: { points: 2, windowSeconds: 60 },
      resetPerAddress: { points: 5, windowSeconds: 60 },
      invitationsPerUser: { points: 100, windowSeconds: 60 },
      linksPerAddress: { points: 100, windowSeconds: 60 },
    },
  });
  afterAll(() => limited.close());

  it('per e-mail address and per client address, known or not, with Retry-After', async () => {
    const target = uniqueEmail('target');
    expect((await ask(target, limited.app)).status).toBe(202);
    expect((await ask(target, limited.app)).status).toBe(202);
    const perEmail = await ask(target, limited.app);
    expect(perEmail.status).toBe(429);
    expect(Number(perEmail.headers['retry-after'])).toBeGreaterThan(0);
    // Three requests came from this address so far; two more fit, the sixth does not.
    expect((await ask(uniqueEmail('a'), limited.app)).status).toBe(202);
    expect((await ask(uniqueEmail('b'), limited.app)).status).toBe(202);
    const perAddress = await ask(uniqueEmail('c'), limited.app);
    expect(perAddress.status).toBe(429);
    expect(perAddress.body.error.code).toBe('rate_limited');
  });
});
