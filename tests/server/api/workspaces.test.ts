import { afterAll, describe, expect, it } from 'vitest';
import { signUp, testApp } from '../../support/test-app';

const t = testApp();
afterAll(() => t.close());

describe('workspaces and roles', () => {
  it('an owner adds an existing user, changes the role, and removes them', async () => {
    const owner = await signUp(t.app, 'owner');
    const other = await signUp(t.app, 'member');
    const add = await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: other.email, role: 'viewer' });
    expect(add.status).toBe(201);
    expect(add.body.role).toBe('viewer');
    const dup = await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: other.email, role: 'viewer' });
    expect(dup.status).toBe(409);
    const change = await owner.agent
      .patch(`/api/workspaces/${owner.workspaceId}/members/${other.user.id}`)
      .send({ role: 'editor' });
    expect(change.status).toBe(200);
    expect(change.body.role).toBe('editor');
    const list = await other.agent.get(`/api/workspaces/${owner.workspaceId}/members`);
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(2);
    const [audit] = await t.ctx.pool.query('SELECT event FROM audit_log WHERE workspace_id = ? ORDER BY id', [
      owner.workspaceId,
    ]);
    expect((audit as { event: string }[]).map((r) => r.event)).toEqual(['member_added', 'role_changed']);
    expect(
      (await owner.agent.delete(`/api/workspaces/${owner.workspaceId}/members/${other.user.id}`)).status,
    ).toBe(204);
    expect((await other.agent.get(`/api/workspaces/${owner.workspaceId}/members`)).status).toBe(404);
  });

  it('a viewer cannot change members (403) but can read them', async () => {
    const owner = await signUp(t.app, 'owner2');
    const viewer = await signUp(t.app, 'viewer');
    const third = await signUp(t.app, 'third');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: viewer.email, role: 'viewer' });
    expect((await viewer.agent.get(`/api/workspaces/${owner.workspaceId}/members`)).status).toBe(200);
    const add = await viewer.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: third.email, role: 'owner' });
    expect(add.status).toBe(403);
    expect(add.body.error.code).toBe('forbidden');
    const promote = await viewer.agent
      .patch(`/api/workspaces/${owner.workspaceId}/members/${viewer.user.id}`)
      .send({ role: 'owner' });
    expect(promote.status).toBe(403);
  });

  it('an editor cannot change members either', async () => {
    const owner = await signUp(t.app, 'owner3');
    const editor = await signUp(t.app, 'editor');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: editor.email, role: 'editor' });
    const res = await editor.agent.delete(`/api/workspaces/${owner.workspaceId}/members/${owner.user.id}`);
    expect(res.status).toBe(403);
  });

  it("a member of workspace A gets 404 for workspace B's objects", async () => {
    const a = await signUp(t.app, 'wsA');
    const b = await signUp(t.app, 'wsB');
    expect((await a.agent.get(`/api/workspaces/${b.workspaceId}`)).status).toBe(404);
    expect((await a.agent.get(`/api/workspaces/${b.workspaceId}/members`)).status).toBe(404);
    const add = await a.agent
      .post(`/api/workspaces/${b.workspaceId}/members`)
      .send({ email: a.email, role: 'owner' });
    expect(add.status).toBe(404);
  });

  it('never leaves a workspace without an owner', async () => {
    const owner = await signUp(t.app, 'lone');
    const demote = await owner.agent
      .patch(`/api/workspaces/${owner.workspaceId}/members/${owner.user.id}`)
      .send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    const remove = await owner.agent.delete(`/api/workspaces/${owner.workspaceId}/members/${owner.user.id}`);
    expect(remove.status).toBe(409);
  });

  it('creates a shared workspace owned by its creator', async () => {
    const u = await signUp(t.app, 'creator');
    const res = await u.agent.post('/api/workspaces').send({ name: 'Ridge Orchard' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Ridge Orchard', role: 'owner', personal: false });
    const list = await u.agent.get('/api/workspaces');
    expect(list.body.map((w: { name: string }) => w.name)).toContain('Ridge Orchard');
  });

  it('rejects a malformed id in the path with 400', async () => {
    const u = await signUp(t.app, 'badid');
    const res = await u.agent.get('/api/workspaces/not-an-id/members');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.workspaceId).toBeDefined();
  });
});
