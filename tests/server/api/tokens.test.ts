import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { signUp, testApp } from '../../support/test-app';
import { fieldBody } from '../../support/domain';

const t = testApp();
afterAll(() => t.close());

describe('personal API tokens', () => {
  it('lets a script read and write its workspace without a session, then stops working when revoked', async () => {
    const u = await signUp(t.app, 'tok');
    const created = await u.agent
      .post('/api/account/tokens')
      .send({ name: 'sweep script', workspaceId: u.workspaceId, role: 'editor' });
    expect(created.status).toBe(201);
    const token: string = created.body.token;
    expect(token).toMatch(/^swk_/);
    const [rows] = await t.ctx.pool.query('SELECT token_hash FROM api_tokens WHERE id = ?', [
      created.body.id,
    ]);
    expect((rows as { token_hash: string }[])[0].token_hash).not.toContain(token.slice(4));
    // No cookie and no Origin: a bearer token carries no ambient credential, so no CSRF check.
    const auth = { Authorization: `Bearer ${token}` };
    const post = await request(t.app)
      .post(`/api/workspaces/${u.workspaceId}/fields`)
      .set(auth)
      .send(fieldBody());
    expect(post.status).toBe(201);
    expect((await request(t.app).get(`/api/workspaces/${u.workspaceId}/fields`).set(auth)).status).toBe(200);
    const list = await u.agent.get('/api/account/tokens');
    expect(list.body[0]).toMatchObject({ name: 'sweep script', role: 'editor', prefix: token.slice(0, 12) });
    expect(list.body[0].lastUsedAt).not.toBeNull();
    expect(JSON.stringify(list.body)).not.toContain(token);
    expect((await u.agent.delete(`/api/account/tokens/${created.body.id}`)).status).toBe(204);
    expect((await request(t.app).get(`/api/workspaces/${u.workspaceId}/fields`).set(auth)).status).toBe(401);
  });

  it('is limited to its workspace, its role and workspace routes', async () => {
    const u = await signUp(t.app, 'scope');
    const other = await u.agent.post('/api/workspaces').send({ name: 'Second farm' });
    const created = await u.agent
      .post('/api/account/tokens')
      .send({ name: 'read only', workspaceId: u.workspaceId, role: 'viewer' });
    const auth = { Authorization: `Bearer ${created.body.token}` };
    expect((await request(t.app).get(`/api/workspaces/${u.workspaceId}/fields`).set(auth)).status).toBe(200);
    expect(
      (await request(t.app).post(`/api/workspaces/${u.workspaceId}/fields`).set(auth).send(fieldBody()))
        .status,
    ).toBe(403);
    expect((await request(t.app).get(`/api/workspaces/${other.body.id}/fields`).set(auth)).status).toBe(404);
    expect((await request(t.app).get('/api/auth/me').set(auth)).status).toBe(403);
    expect((await request(t.app).post('/api/account/tokens').set(auth).send({})).status).toBe(403);
  });

  it('cannot be created with a role above the user’s own', async () => {
    const owner = await signUp(t.app, 'tokowner');
    const viewer = await signUp(t.app, 'tokviewer');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: viewer.email, role: 'viewer' });
    const res = await viewer.agent
      .post('/api/account/tokens')
      .send({ name: 'x', workspaceId: owner.workspaceId, role: 'editor' });
    expect(res.status).toBe(403);
  });

  it('rejects a made-up token with 401', async () => {
    const res = await request(t.app)
      .get('/api/workspaces/5eedfa00-0000-4000-8000-000000000001/fields')
      .set('Authorization', 'Bearer swk_made_up');
    expect(res.status).toBe(401);
  });
});
