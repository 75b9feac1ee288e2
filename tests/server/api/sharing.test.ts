import { afterAll, describe, expect, it } from 'vitest';
import { browserLike, signUp, testApp } from '../../support/test-app';
import { buildScenario, strategyBody, waitForProjection } from '../../support/domain';

const t = testApp();
afterAll(() => t.close());

describe('sharing a comparison with a viewer', () => {
  it('the viewer sees exactly what was shared — not draft strategies, other runs or other fields', async () => {
    const editor = await signUp(t.app, 'shareEditor');
    const grower = await signUp(t.app, 'shareGrower');
    const ws = editor.workspaceId;
    await editor.agent.post(`/api/workspaces/${ws}/members`).send({ email: grower.email, role: 'viewer' });
    const { scenario, strategy, field } = await buildScenario(editor.agent, ws);
    const draft = (
      await editor.agent
        .post(`/api/workspaces/${ws}/strategies`)
        .send({ ...strategyBody(field.id), strategy: { name: 'Draft idea', steps: [] } })
    ).body;
    const shared = (await editor.agent.post(`/api/workspaces/${ws}/scenarios/${scenario.id}/runs`).send({}))
      .body;
    const unshared = (
      await editor.agent.post(`/api/workspaces/${ws}/scenarios/${scenario.id}/runs`).send({ seed: 99 })
    ).body;
    for (const p of [...shared.projections, ...unshared.projections])
      await waitForProjection(editor.agent, ws, p.id);

    const g = grower.agent;
    expect((await g.get(`/api/workspaces/${ws}/batches/${shared.batchId}`)).status).toBe(404);
    expect((await g.get(`/api/workspaces/${ws}/shared-with-me`)).body).toEqual([]);
    // A viewer cannot share.
    expect(
      (await g.put(`/api/workspaces/${ws}/batches/${shared.batchId}/shares/${grower.user.id}`)).status,
    ).toBe(403);

    const res = await editor.agent.put(
      `/api/workspaces/${ws}/batches/${shared.batchId}/shares/${grower.user.id}`,
    );
    expect(res.status).toBe(200);
    expect(res.body.map((s: { email: string }) => s.email)).toEqual([grower.email.toLowerCase()]);

    const home = (await g.get(`/api/workspaces/${ws}/shared-with-me`)).body;
    expect(home).toHaveLength(1);
    expect(home[0]).toMatchObject({
      batchId: shared.batchId,
      title: 'Test scenario',
      strategies: [strategy.name],
    });
    expect((await g.get(`/api/workspaces/${ws}/batches/${shared.batchId}`)).status).toBe(200);
    expect((await g.get(`/api/workspaces/${ws}/batches/${unshared.batchId}`)).status).toBe(404);
    expect((await g.get(`/api/workspaces/${ws}/projections/${unshared.projections[0].id}`)).status).toBe(404);
    const runs = (await g.get(`/api/workspaces/${ws}/projections`)).body;
    expect(new Set(runs.map((r: { batchId: string }) => r.batchId))).toEqual(new Set([shared.batchId]));
    const strategies = (await g.get(`/api/workspaces/${ws}/strategies`)).body.map(
      (s: { id: string }) => s.id,
    );
    expect(strategies).toEqual([strategy.id]);
    expect((await g.get(`/api/workspaces/${ws}/strategies/${draft.id}`)).status).toBe(404);
    expect((await g.get(`/api/workspaces/${ws}/fields/${field.id}`)).status).toBe(200);
    // Read-only all the same.
    expect((await g.post(`/api/workspaces/${ws}/scenarios/${scenario.id}/runs`).send({})).status).toBe(403);

    expect(
      (await editor.agent.delete(`/api/workspaces/${ws}/batches/${shared.batchId}/shares/${grower.user.id}`))
        .status,
    ).toBe(204);
    expect((await g.get(`/api/workspaces/${ws}/batches/${shared.batchId}`)).status).toBe(404);
  });

  it('the demo comparison is shared with the demo grower', async () => {
    const g = browserLike(t.app);
    await g
      .post('/api/auth/sign-in')
      .send({ email: 'grower@alder-creek.example', password: 'seedwake-demo-2026' });
    const home = (await g.get('/api/workspaces/5eedfa00-0000-4000-8000-000000000001/shared-with-me')).body;
    expect(home.map((h: { title: string }) => h.title)).toEqual(['Hollow Lane ten-year plan']);
  });
});
