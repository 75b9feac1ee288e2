import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RowDataPacket } from 'mysql2';
import { INVITATION_DAYS } from '../../../shared/api/invitations';
import { PASSWORD, browserLike, signUp, testApp, uniqueEmail } from '../../support/test-app';
import { fieldBody } from '../../support/domain';
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

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

async function invitationRow(id: string) {
  const [rows] = await t.ctx.pool.query<RowDataPacket[]>('SELECT * FROM invitations WHERE id = ?', [id]);
  return rows[0];
}

/** An owner with a workspace of their own that is not personal, and an invitation from it. */
async function ownerInvites(role: 'owner' | 'editor' | 'viewer', email = uniqueEmail('invitee')) {
  const owner = await signUp(t.app, 'owner');
  const ws = (await owner.agent.post('/api/workspaces').send({ name: 'Ridge Orchard' })).body.id as string;
  const res = await owner.agent.post(`/api/workspaces/${ws}/invitations`).send({ email, role });
  expect(res.status).toBe(201);
  const [message] = await box.waitFor(email);
  return { owner, ws, email, invitation: res.body, message, ...linkIn(message.text, '/invitations') };
}

describe('invitations by e-mail', () => {
  it('mails a single-use link; a new person signs up with it and joins with the invited role', async () => {
    const { owner, ws, email, invitation, message, token, url } = await ownerInvites('viewer');
    expect(invitation).toMatchObject({ email, role: 'viewer', state: 'pending' });
    // The product rule: an invitation link works for 7 days.
    expect(Date.parse(invitation.expiresAt) - Date.parse(invitation.sentAt)).toBe(
      INVITATION_DAYS * 86_400_000,
    );
    expect(message.subject).toContain('Ridge Orchard');
    expect(url.startsWith('http://seedwake.test/invitations/')).toBe(true);
    expect(message.html).toContain(`href="${url}"`);

    // Only a SHA-256 of the secret is kept (FIPS 180-4 digest from node:crypto, not our code).
    const row = await invitationRow(invitation.id);
    expect(row.token_hash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);

    const anonymous = browserLike(t.app);
    const lookup = await anonymous.get(`/api/invitations/${token}`);
    expect(lookup.status).toBe(200);
    expect(lookup.body).toMatchObject({
      state: 'pending',
      role: 'viewer',
      workspaceName: 'Ridge Orchard',
      invitedBy: 'Test owner',
      accountExists: false,
    });

    const joined = await anonymous
      .post('/api/auth/sign-up')
      .send({ email, password: PASSWORD, name: 'Dale Grower', invitationToken: token });
    expect(joined.status).toBe(201);
    expect(joined.body.memberships).toEqual(
      expect.arrayContaining([
        { workspace: { id: ws, name: 'Ridge Orchard', personal: false }, role: 'viewer' },
      ]),
    );
    // Viewer rights: reads the workspace, changes nothing.
    expect((await anonymous.get(`/api/workspaces/${ws}`)).body.role).toBe('viewer');
    expect((await anonymous.get(`/api/workspaces/${ws}/members`)).status).toBe(200);
    expect((await anonymous.post(`/api/workspaces/${ws}/fields`).send(fieldBody())).status).toBe(403);

    // Single use: the link now says it was used and lets nobody else in.
    expect((await browserLike(t.app).get(`/api/invitations/${token}`)).body.state).toBe('accepted');
    const again = await browserLike(t.app)
      .post('/api/auth/sign-up')
      .send({ email: uniqueEmail('late'), password: PASSWORD, name: 'Late', invitationToken: token });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('gone');
    expect((await owner.agent.get(`/api/workspaces/${ws}/invitations`)).body).toEqual([]);
  });

  it('lets an existing account accept while signed in, only with the address it was sent to', async () => {
    const invited = await signUp(t.app, 'existing');
    const { ws, token } = await ownerInvites('editor', invited.email);
    expect((await browserLike(t.app).get(`/api/invitations/${token}`)).body.accountExists).toBe(true);

    const someoneElse = await signUp(t.app, 'forwarded');
    const wrong = await someoneElse.agent.post(`/api/invitations/${token}/accept`);
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.message).toContain(invited.email);
    expect((await browserLike(t.app).post(`/api/invitations/${token}/accept`)).status).toBe(401);

    const ok = await invited.agent.post(`/api/invitations/${token}/accept`);
    expect(ok.status).toBe(200);
    expect(ok.body.workspace).toMatchObject({ id: ws, role: 'editor' });
    expect((await invited.agent.post(`/api/invitations/${token}/accept`)).status).toBe(410);
  });

  it('refuses an expired link, for sign-up and for accepting alike', async () => {
    const { invitation, email, token } = await ownerInvites('viewer');
    await t.ctx.pool.query('UPDATE invitations SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE id = ?', [
      invitation.id,
    ]);
    expect((await browserLike(t.app).get(`/api/invitations/${token}`)).body.state).toBe('expired');
    const signUpRes = await browserLike(t.app)
      .post('/api/auth/sign-up')
      .send({ email, password: PASSWORD, name: 'Too late', invitationToken: token });
    expect(signUpRes.status).toBe(410);
    expect(signUpRes.body.error.message).toMatch(/expired/);
    // The refused sign-up left no account behind.
    expect(
      (await browserLike(t.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status,
    ).toBe(401);
  });

  it('sends again with a new link (the old one stops working) and withdraws', async () => {
    const { owner, ws, email, invitation, token } = await ownerInvites('viewer');
    const list = await owner.agent.get(`/api/workspaces/${ws}/invitations`);
    expect(list.body.map((i: { email: string }) => i.email)).toEqual([email]);

    const resent = await owner.agent.post(`/api/workspaces/${ws}/invitations/${invitation.id}/resend`);
    expect(resent.status).toBe(200);
    const messages = await box.waitFor(email, 2);
    const second = linkIn(messages[1].text, '/invitations').token;
    expect(second).not.toBe(token);
    expect((await browserLike(t.app).get(`/api/invitations/${token}`)).status).toBe(404);
    expect((await browserLike(t.app).get(`/api/invitations/${second}`)).body.state).toBe('pending');

    expect((await owner.agent.delete(`/api/workspaces/${ws}/invitations/${invitation.id}`)).status).toBe(204);
    expect((await browserLike(t.app).get(`/api/invitations/${second}`)).body.state).toBe('revoked');
    const late = await browserLike(t.app)
      .post('/api/auth/sign-up')
      .send({ email, password: PASSWORD, name: 'Withdrawn', invitationToken: second });
    expect(late.status).toBe(410);
    expect((await owner.agent.get(`/api/workspaces/${ws}/invitations`)).body).toEqual([]);
  });

  it('refuses to invite a member or an address with an open invitation (409)', async () => {
    const { owner, ws, email } = await ownerInvites('viewer');
    const twice = await owner.agent.post(`/api/workspaces/${ws}/invitations`).send({ email, role: 'editor' });
    expect(twice.status).toBe(409);
    const self = await owner.agent
      .post(`/api/workspaces/${ws}/invitations`)
      .send({ email: owner.email, role: 'viewer' });
    expect(self.status).toBe(409);
  });

  it('a viewer or an editor cannot invite, list or withdraw (403); a non-member gets 404', async () => {
    const { owner, ws, invitation } = await ownerInvites('viewer');
    const viewer = await signUp(t.app, 'viewer');
    const editor = await signUp(t.app, 'editor');
    const stranger = await signUp(t.app, 'stranger');
    for (const [who, role] of [
      [viewer, 'viewer'],
      [editor, 'editor'],
    ] as const) {
      await owner.agent.post(`/api/workspaces/${ws}/members`).send({ email: who.email, role });
      const res = await who.agent
        .post(`/api/workspaces/${ws}/invitations`)
        .send({ email: uniqueEmail('x'), role: 'viewer' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
      expect((await who.agent.get(`/api/workspaces/${ws}/invitations`)).status).toBe(403);
      expect((await who.agent.delete(`/api/workspaces/${ws}/invitations/${invitation.id}`)).status).toBe(403);
    }
    const res = await stranger.agent
      .post(`/api/workspaces/${ws}/invitations`)
      .send({ email: uniqueEmail('x'), role: 'viewer' });
    expect(res.status).toBe(404);
  });

  it('answers 404 for an unknown link and 400 for a malformed one', async () => {
    const unknown = await browserLike(t.app).get(`/api/invitations/${'A'.repeat(43)}`);
    expect(unknown.status).toBe(404);
    const malformed = await browserLike(t.app).get('/api/invitations/not-a-token');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.token).toBeDefined();
  });

  it('shows every message in the development outbox', async () => {
    const { email } = await ownerInvites('viewer');
    const res = await browserLike(t.app).get('/api/dev/outbox');
    expect(res.status).toBe(200);
    const mine = res.body.find((m: { to: string }) => m.to === email);
    expect(mine.subject).toContain('Ridge Orchard');
    expect(mine.html).toContain('<a href=');
    expect(mine.text).toContain('/invitations/');
  });
});

describe('invitation endpoints are rate-limited', () => {
  const limited = testApp({
    linkLimits: {
      resetPerEmail: { points: 100, windowSeconds: 60 },
      resetPerAddress: { points: 100, windowSeconds: 60 },
      invitationsPerUser: { points: 3, windowSeconds: 60 },
      linksPerAddress: { points: 4, windowSeconds: 60 },
    },
  });
  afterAll(() => limited.close());

  it('limits invitations per owner and link look-ups per address, with Retry-After', async () => {
    const owner = await signUp(limited.app, 'busy');
    const post = () =>
      owner.agent
        .post(`/api/workspaces/${owner.workspaceId}/invitations`)
        .send({ email: uniqueEmail('many'), role: 'viewer' });
    for (let i = 0; i < 3; i++) expect((await post()).status).toBe(201);
    const blocked = await post();
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);

    const look = () => browserLike(limited.app).get(`/api/invitations/${'B'.repeat(43)}`);
    for (let i = 0; i < 4; i++) expect((await look()).status).toBe(404);
    const tooMany = await look();
    expect(tooMany.status).toBe(429);
    expect(tooMany.body.error.code).toBe('rate_limited');
  });
});
