import { describe, expect, it } from 'vitest';
import mysql from 'mysql2/promise';
import { PASSWORD, browserLike, signUp, testApp } from '../../support/test-app';
import { buildScenario, waitForProjection } from '../../support/domain';

async function waitForStatus(
  get: () => Promise<{ status: string; replicatesDone: number }>,
  wanted: (p: { status: string; replicatesDone: number }) => boolean,
) {
  for (let i = 0; i < 600; i++) {
    const p = await get();
    if (wanted(p)) return p;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('timed out');
}

describe('the projection queue', () => {
  it('answers 429 with Retry-After when full', async () => {
    const t = testApp({ maxQueuedProjections: 2 });
    try {
      const u = await signUp(t.app, 'full');
      const { scenario } = await buildScenario(u.agent, u.workspaceId, {
        replicates: 5000,
        horizonYears: 40,
      });
      const first = await u.agent
        .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
        .send({});
      expect(first.status).toBe(202);
      const second = await u.agent
        .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
        .send({});
      expect(second.status).toBe(429);
      expect(Number(second.headers['retry-after'])).toBeGreaterThan(0);
      for (const p of first.body.projections)
        await u.agent.post(`/api/workspaces/${u.workspaceId}/projections/${p.id}/cancel`);
    } finally {
      await t.close();
    }
  });

  it('cancel stops a running projection', async () => {
    const t = testApp();
    try {
      const u = await signUp(t.app, 'cancel');
      const { scenario } = await buildScenario(u.agent, u.workspaceId, {
        replicates: 20000,
        horizonYears: 60,
      });
      const launch = await u.agent
        .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
        .send({});
      const [first, baseline] = launch.body.projections;
      const get = async () =>
        (await u.agent.get(`/api/workspaces/${u.workspaceId}/projections/${first.id}`)).body;
      await waitForStatus(get, (p) => p.status === 'running' && p.replicatesDone > 0);
      const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/projections/${first.id}/cancel`);
      expect(res.status).toBe(200);
      const stopped = await waitForProjection(u.agent, u.workspaceId, first.id);
      expect(stopped.status).toBe('cancelled');
      expect(stopped.replicatesDone).toBeLessThan(20000);
      // The queued baseline can be cancelled too, before it starts.
      await u.agent.post(`/api/workspaces/${u.workspaceId}/projections/${baseline.id}/cancel`);
      expect((await waitForProjection(u.agent, u.workspaceId, baseline.id)).status).toBe('cancelled');
    } finally {
      await t.close();
    }
  });

  it('a projection interrupted by a server stop is resumed at the next start, not left running', async () => {
    const first = testApp();
    const u = await signUp(first.app, 'restart');
    const { scenario } = await buildScenario(u.agent, u.workspaceId, { replicates: 6000, horizonYears: 30 });
    const launch = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({});
    const id = launch.body.projections[0].id;
    const get = async () => (await u.agent.get(`/api/workspaces/${u.workspaceId}/projections/${id}`)).body;
    await waitForStatus(get, (p) => p.status === 'running');
    await first.close();
    const connection = await mysql.createConnection(process.env.DATABASE_URL!);
    const [rows] = await connection.query('SELECT status FROM projections WHERE id = ?', [id]);
    await connection.end();
    expect((rows as { status: string }[])[0].status).toBe('running');

    const second = testApp();
    try {
      const resumed = await second.ctx.projections.runner.recover();
      expect(resumed).toBeGreaterThanOrEqual(1);
      const agent = browserLike(second.app);
      await agent.post('/api/auth/sign-in').send({ email: u.email, password: PASSWORD });
      const done = await waitForProjection(agent, u.workspaceId, id, 120_000);
      expect(done.status).toBe('done');
      expect(done.replicatesDone).toBe(6000);
    } finally {
      await second.close();
    }
  });
});
