import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RowDataPacket } from 'mysql2';
import { signUp, testApp } from '../../support/test-app';
import { buildScenario } from '../../support/domain';
import { mailbox, received } from '../../support/mail';
import { projectionNotifier } from '../../../server/services/notifications';

// 60 replicates × 10 years × 2 projections (the strategy and the no-control baseline) is
// 1,200 replicate-years: long for this app, short by the product's own threshold.
const t = testApp({ longProjections: { replicateYears: 1_000, seconds: 10 } });
const standard = testApp();
let box: Awaited<ReturnType<typeof mailbox>>;
beforeAll(async () => {
  box = await mailbox(t.ctx);
});
afterAll(async () => {
  await box.close();
  await t.close();
  await standard.close();
});

async function launchAndWait(app: typeof t, agent: Awaited<ReturnType<typeof signUp>>['agent'], ws: string) {
  const { scenario } = await buildScenario(agent, ws);
  const res = await agent.post(`/api/workspaces/${ws}/scenarios/${scenario.id}/runs`).send({});
  expect(res.status).toBe(202);
  // The runner calls the notifier before it takes the next projection, so idle means told.
  for (;;) {
    await app.ctx.projections.runner.idle();
    const list = await agent.get(`/api/workspaces/${ws}/projections?scenarioId=${scenario.id}`);
    if (list.body.every((p: { status: string }) => !['queued', 'running'].includes(p.status))) break;
  }
  return { scenario, batchId: res.body.batchId as string };
}

describe('notices when long projections end', () => {
  it('tells the launcher once per launch, in the app and by e-mail, and marks it read', async () => {
    const u = await signUp(t.app, 'analyst');
    const { scenario, batchId } = await launchAndWait(t, u.agent, u.workspaceId);
    const list = await u.agent.get('/api/notifications');
    expect(list.status).toBe(200);
    expect(list.body.unread).toBe(1);
    expect(list.body.items).toHaveLength(1);
    const [notice] = list.body.items;
    expect(notice).toMatchObject({
      kind: 'projections_done',
      title: `Projections finished: ${scenario.name}`,
      link: `/w/${u.workspaceId}/batches/${batchId}`,
      readAt: null,
    });
    expect(notice.body).toContain('2 finished');

    const [message] = await box.waitFor(u.email);
    expect(message.subject).toBe(notice.title);
    expect(message.text).toContain(`http://seedwake.test/w/${u.workspaceId}/batches/${batchId}`);

    expect((await u.agent.post(`/api/notifications/${notice.id}/read`)).status).toBe(204);
    expect((await u.agent.get('/api/notifications')).body.unread).toBe(0);
    // Someone else's notice is not theirs to read.
    const other = await signUp(t.app, 'nosy');
    expect((await other.agent.post(`/api/notifications/${notice.id}/read`)).status).toBe(404);
  });

  it('keeps the in-app notice but sends no e-mail to someone who turned it off', async () => {
    const u = await signUp(t.app, 'quiet');
    expect((await u.agent.get('/api/account/notifications')).body).toEqual({ email: true });
    const off = await u.agent.patch('/api/account/notifications').send({ email: false });
    expect(off.body).toEqual({ email: false });
    expect((await u.agent.get('/api/account/notifications')).body).toEqual({ email: false });
    await launchAndWait(t, u.agent, u.workspaceId);
    expect((await u.agent.get('/api/notifications')).body.unread).toBe(1);
    await box.queue.drainOnce();
    expect(await received(t.ctx, u.email)).toEqual([]);
  });

  it('says nothing about short projections', async () => {
    const u = await signUp(standard.app, 'brief');
    await launchAndWait(standard, u.agent, u.workspaceId);
    expect((await u.agent.get('/api/notifications')).body).toEqual({ unread: 0, items: [] });
  });

  it('names what failed and why', async () => {
    const u = await signUp(t.app, 'unlucky');
    const { batchId } = await launchAndWait(t, u.agent, u.workspaceId);
    // A failure is made by hand: the engine does not fail on valid input.
    await t.ctx.pool.query(
      "UPDATE projections SET status = 'failed', error = 'worker stopped' WHERE batch_id = ? AND role = 'baseline'",
      [batchId],
    );
    await t.ctx.pool.query('DELETE FROM notifications WHERE user_id = ?', [u.user.id]);
    const [rows] = await t.ctx.pool.query<RowDataPacket[]>('SELECT id FROM projections WHERE batch_id = ?', [
      batchId,
    ]);
    await projectionNotifier(t.ctx.db, t.ctx.logger, {
      origin: 'http://seedwake.test',
      long: { replicateYears: 1_000, seconds: 10 },
    })(rows[0].id);
    const [notice] = (await u.agent.get('/api/notifications')).body.items;
    expect(notice.kind).toBe('projections_failed');
    expect(notice.body).toContain('1 finished, 1 failed');
    expect(notice.body).toContain('No control failed: worker stopped');
  });

  it('a server that started with nothing to resume still runs, and tells about, what is launched later', async () => {
    // npm start calls recover() first; an empty queue then must not leave the runner idle for good.
    const fresh = testApp({ longProjections: { replicateYears: 1_000, seconds: 10 } });
    try {
      await fresh.ctx.projections.runner.recover();
      await fresh.ctx.projections.runner.idle();
      const u = await signUp(fresh.app, 'restarted');
      await launchAndWait(fresh, u.agent, u.workspaceId);
      expect((await u.agent.get('/api/notifications')).body.unread).toBe(1);
    } finally {
      await fresh.close();
    }
  });

  it('rejects a setting that is not true or false', async () => {
    const u = await signUp(t.app, 'typo');
    const res = await u.agent.patch('/api/account/notifications').send({ email: 'yes' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toBeDefined();
  });
});
