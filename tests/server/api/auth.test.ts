import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { PASSWORD, TEST_ORIGIN, browserLike, signUp, testApp, uniqueEmail } from '../../support/test-app';

const t = testApp({ signInLimits: { perAccount: 3, perAddress: 1000, windowSeconds: 60 } });
afterAll(() => t.close());

describe('sign-up, sign-in, sign-out', () => {
  it('signs up, creates a personal workspace owned by the user, and keeps the session', async () => {
    const { agent, email } = await signUp(t.app, 'alpha');
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
    expect(me.body.memberships).toHaveLength(1);
    expect(me.body.memberships[0]).toMatchObject({ role: 'owner', workspace: { personal: true } });
  });

  it('signs out, then signs back in with a fresh session id', async () => {
    const { agent, email } = await signUp(t.app, 'beta');
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    const signIn = await agent.post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(signIn.status).toBe(200);
    expect(signIn.headers['set-cookie']?.[0]).toMatch(/seedwake\.sid=.*HttpOnly.*SameSite=Lax/i);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });

  it('gives the same answer for an unknown account and a wrong password', async () => {
    const { email } = await signUp(t.app, 'gamma');
    const wrong = await browserLike(t.app)
      .post('/api/auth/sign-in')
      .send({ email, password: 'not the password' });
    const unknown = await browserLike(t.app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('rate-limits failed sign-ins per account with Retry-After, even for the right password', async () => {
    const { email } = await signUp(t.app, 'delta');
    for (let i = 0; i < 3; i++) {
      expect(
        (
          await browserLike(t.app)
            .post('/api/auth/sign-in')
            .send({ email, password: 'guess ' + i })
        ).status,
      ).toBe(401);
    }
    const blocked = await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect(blocked.body.error.code).toBe('rate_limited');
  });

  it('rejects a duplicate sign-up with 409', async () => {
    const { email } = await signUp(t.app, 'eps');
    const again = await browserLike(t.app)
      .post('/api/auth/sign-up')
      .send({ email, password: PASSWORD, name: 'Again' });
    expect(again.status).toBe(409);
  });

  it('changes the password: the old one stops working and other sessions end', async () => {
    const { agent, email } = await signUp(t.app, 'zeta');
    const other = browserLike(t.app);
    expect((await other.post('/api/auth/sign-in').send({ email, password: PASSWORD })).status).toBe(200);
    const bad = await agent
      .post('/api/account/password')
      .send({ currentPassword: 'wrong one', newPassword: 'a brand new passphrase' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.currentPassword).toBeDefined();
    // Session timestamps are in ms; make sure the change is strictly later than the other sign-in.
    await new Promise((r) => setTimeout(r, 5));
    const ok = await agent
      .post('/api/account/password')
      .send({ currentPassword: PASSWORD, newPassword: 'a brand new passphrase' });
    expect(ok.status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await other.get('/api/auth/me')).status).toBe(401);
    expect(
      (await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status,
    ).toBe(401);
  });

  it('stores an argon2id hash, never the password (OWASP Password Storage Cheat Sheet parameters)', async () => {
    const { email } = await signUp(t.app, 'eta');
    const [rows] = await t.ctx.pool.query('SELECT password_hash FROM users WHERE email = ?', [email]);
    const hash = (rows as { password_hash: string }[])[0].password_hash;
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,p=1,t=2\$/);
    expect(hash).not.toContain(PASSWORD);
  });

  it('records sign-in and failed sign-in in the audit log', async () => {
    const { email, user } = await signUp(t.app, 'theta');
    await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: 'nope nope nope' });
    await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    const [rows] = await t.ctx.pool.query('SELECT event FROM audit_log WHERE user_id = ? ORDER BY id', [
      user.id,
    ]);
    expect((rows as { event: string }[]).map((r) => r.event)).toEqual([
      'sign_up',
      'sign_in_failed',
      'sign_in',
    ]);
  });
});

describe('sessions live in MariaDB', () => {
  it('a session survives a server restart', async () => {
    const first = testApp();
    const signUpRes = await request(first.app)
      .post('/api/auth/sign-up')
      .set('Origin', TEST_ORIGIN)
      .send({ email: uniqueEmail('restart'), password: PASSWORD, name: 'Restart' });
    expect(signUpRes.status).toBe(201);
    const cookie = signUpRes.headers['set-cookie'][0].split(';')[0];
    await first.close();
    const second = testApp();
    try {
      const res = await request(second.app).get('/api/auth/me').set('Cookie', cookie);
      expect(res.status).toBe(200);
      expect(res.body.user.name).toBe('Restart');
    } finally {
      await second.close();
    }
  });
});

describe('CSRF: verified Origin', () => {
  it('refuses a state-changing request from another origin, accepts our own', async () => {
    const body = { email: uniqueEmail('csrf'), password: PASSWORD, name: 'Csrf' };
    const foreign = await request(t.app)
      .post('/api/auth/sign-up')
      .set('Origin', 'http://evil.example')
      .send(body);
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe('csrf');
    const none = await request(t.app).post('/api/auth/sign-up').send(body);
    expect(none.status).toBe(403);
    const ours = await request(t.app).post('/api/auth/sign-up').set('Origin', TEST_ORIGIN).send(body);
    expect(ours.status).toBe(201);
  });
});
