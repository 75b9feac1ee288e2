import { afterAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { browserLike, signUp, testApp } from '../../support/test-app';

const t = testApp();
afterAll(() => t.close());

describe('API conventions', () => {
  it('answers malformed JSON with 400 malformed_json, never 500', async () => {
    const res = await browserLike(t.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('answers an oversized body with 413', async () => {
    const res = await browserLike(t.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@b.example', password: 'x'.repeat(2 * 1024 * 1024) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });

  it('names unknown fields and invalid values', async () => {
    const res = await browserLike(t.app)
      .post('/api/auth/sign-up')
      .send({ email: 'not-an-email', password: 'short', name: 'X', admin: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid');
    expect(res.body.error.fields).toMatchObject({
      email: 'Enter a valid e-mail address',
      password: 'Password must be at least 12 characters',
      admin: 'Unknown field "admin"',
    });
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await browserLike(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('reports the database in /api/health', async () => {
    const res = await browserLike(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.database.status).toBe('ok');
  });

  it('needs a session for account routes', async () => {
    expect((await browserLike(t.app).get('/api/auth/me')).status).toBe(401);
    expect((await browserLike(t.app).get('/api/workspaces')).status).toBe(401);
  });
});

describe('random bodies never produce a 500 (fast-check)', () => {
  const anyBody = fc.oneof(
    fc.anything(),
    fc.record(
      {
        email: fc.oneof(fc.string(), fc.emailAddress(), fc.integer()),
        password: fc.oneof(fc.string(), fc.constant(null)),
        name: fc.string(),
      },
      { requiredKeys: [] },
    ),
  );
  for (const path of [
    '/api/auth/sign-up',
    '/api/auth/sign-in',
    '/api/auth/sign-out',
    '/api/account/password',
  ]) {
    it(`POST ${path}`, async () => {
      const { agent } = await signUp(t.app, 'fuzz');
      await fc.assert(
        fc.asyncProperty(anyBody, async (body) => {
          const res = await agent
            .post(path)
            .set('Content-Type', 'application/json')
            .send(JSON.stringify(body) ?? 'null');
          expect(res.status).toBeLessThan(500);
        }),
        { numRuns: 40, seed: 20261201 },
      );
    });
  }
  it('PATCH /api/account', async () => {
    const { agent } = await signUp(t.app, 'fuzz2');
    await fc.assert(
      fc.asyncProperty(anyBody, async (body) => {
        const res = await agent
          .patch('/api/account')
          .set('Content-Type', 'application/json')
          .send(JSON.stringify(body) ?? 'null');
        expect(res.status).toBeLessThan(500);
      }),
      { numRuns: 40, seed: 20261202 },
    );
  });
});
