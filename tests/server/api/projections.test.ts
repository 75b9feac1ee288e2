import { afterAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { signUp, testApp } from '../../support/test-app';
import { buildScenario, waitForProjection } from '../../support/domain';

const t = testApp({ projectionThreads: 2 });
afterAll(() => t.close());

describe('scenarios', () => {
  it('rejects schedule years outside the horizon, naming the strategy and field', async () => {
    const u = await signUp(t.app, 'sc');
    const { scenario } = await buildScenario(u.agent, u.workspaceId);
    const res = await u.agent
      .put(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}`)
      .send({ ...scenario, id: undefined, updatedAt: undefined, horizonYears: 2 });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.fields)).toMatch(/schedule\.last.*outside the horizon 1–2/);
  });

  it('rejects a strategy from another workspace (400 naming strategyIds[0])', async () => {
    const a = await signUp(t.app, 'scA');
    const b = await signUp(t.app, 'scB');
    const own = await buildScenario(a.agent, a.workspaceId);
    const other = await buildScenario(b.agent, b.workspaceId);
    const res = await a.agent.post(`/api/workspaces/${a.workspaceId}/scenarios`).send({
      ...own.scenario,
      id: undefined,
      updatedAt: undefined,
      strategyIds: [other.strategy.id],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['strategyIds[0]']).toBeDefined();
  });
});

describe('projections in the worker pool', () => {
  it('runs a launch to done; the result equals the CLI output for the same input and seed', async () => {
    const u = await signUp(t.app, 'run');
    const { scenario } = await buildScenario(u.agent, u.workspaceId);
    const launch = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({});
    expect(launch.status).toBe(202);
    expect(launch.body.projections.map((p: { role: string }) => p.role)).toEqual(['strategy', 'baseline']);
    const done = await waitForProjection(u.agent, u.workspaceId, launch.body.projections[0].id);
    expect(done.status).toBe('done');
    expect(done.replicatesDone).toBe(60);

    // The CLI on the frozen snapshot gives the same summary, bit for bit.
    const dir = mkdtempSync(join(tmpdir(), 'seedwake-cli-'));
    const file = join(dir, 'scenario.json');
    writeFileSync(file, JSON.stringify(done.snapshot));
    const cli = JSON.parse(
      execFileSync('npx', ['tsx', 'server/cli/sim.ts', 'project', file], {
        encoding: 'utf8',
        maxBuffer: 64 << 20,
      }),
    );
    expect(done.result.summary).toEqual(cli.summary);
    expect(done.result.meanField).toEqual(cli.meanField);
    expect(done.result.matrix.ok).toBe(true);
  });

  it("a run's snapshot does not change when its scenario is edited", async () => {
    const u = await signUp(t.app, 'snap');
    const { scenario } = await buildScenario(u.agent, u.workspaceId);
    const launch = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({});
    const id = launch.body.projections[0].id;
    const before = await waitForProjection(u.agent, u.workspaceId, id);
    const edit = await u.agent
      .put(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}`)
      .send({ ...scenario, id: undefined, updatedAt: undefined, replicates: 30, seed: 7 });
    expect(edit.status).toBe(200);
    const after = (await u.agent.get(`/api/workspaces/${u.workspaceId}/projections/${id}`)).body;
    expect(after.snapshot).toEqual(before.snapshot);
    expect(after.result).toEqual(before.result);
    expect(after.snapshot.seed).toBe(4242);
  });

  it('adds the let-it-seed variant and rejects a year outside the horizon', async () => {
    const u = await signUp(t.app, 'lis');
    const { scenario, strategy } = await buildScenario(u.agent, u.workspaceId);
    const bad = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({ letItSeed: { strategyId: strategy.id, year: 11 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['letItSeed.year']).toMatch(/outside the horizon/);
    const ok = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({ letItSeed: { strategyId: strategy.id, year: 3 } });
    expect(ok.status).toBe(202);
    expect(ok.body.projections.map((p: { role: string }) => p.role)).toEqual([
      'strategy',
      'baseline',
      'let-it-seed',
    ]);
    const batch = ok.body.batchId;
    for (const p of ok.body.projections) await waitForProjection(u.agent, u.workspaceId, p.id);
    const rows = (await u.agent.get(`/api/workspaces/${u.workspaceId}/batches/${batch}`)).body;
    const plain = rows.find((r: { role: string }) => r.role === 'strategy');
    const letIt = rows.find((r: { role: string }) => r.role === 'let-it-seed');
    // Seed rain joins the seedbank at the end of the year it is shed: years before 3 match.
    expect(letIt.result.summary.series.seedbankTotal.mean.slice(0, 3)).toEqual(
      plain.result.summary.series.seedbankTotal.mean.slice(0, 3),
    );
    expect(letIt.result.summary.series.seedRain.mean[3]).toBeGreaterThan(
      plain.result.summary.series.seedRain.mean[3],
    );
  });

  it('a viewer can read projections but not launch them', async () => {
    const owner = await signUp(t.app, 'po');
    const viewer = await signUp(t.app, 'pv');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: viewer.email, role: 'viewer' });
    const { scenario } = await buildScenario(owner.agent, owner.workspaceId);
    const res = await viewer.agent
      .post(`/api/workspaces/${owner.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({});
    expect(res.status).toBe(403);
    expect((await viewer.agent.get(`/api/workspaces/${owner.workspaceId}/projections`)).status).toBe(200);
  });

  it('exports per-replicate CSV with units in the header', async () => {
    const u = await signUp(t.app, 'csv');
    const { scenario } = await buildScenario(u.agent, u.workspaceId);
    const launch = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`)
      .send({});
    const id = launch.body.projections[0].id;
    await waitForProjection(u.agent, u.workspaceId, id);
    const res = await u.agent.get(`/api/workspaces/${u.workspaceId}/projections/${id}/replicates.csv`);
    expect(res.status).toBe(200);
    const lines = res.text.trim().split('\n');
    expect(lines[1]).toContain('seedbankTotal (seeds/m²)');
    expect(lines).toHaveLength(2 + 60 * 11);
  });
});

describe('re-running a launch', () => {
  it('repeats it from the frozen inputs: the same numbers even after the scenario was edited', async () => {
    const u = await signUp(t.app, 'rerun');
    const { scenario } = await buildScenario(u.agent, u.workspaceId);
    const first = (
      await u.agent.post(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}/runs`).send({})
    ).body;
    for (const p of first.projections) await waitForProjection(u.agent, u.workspaceId, p.id);
    await u.agent
      .put(`/api/workspaces/${u.workspaceId}/scenarios/${scenario.id}`)
      .send({ ...scenario, id: undefined, updatedAt: undefined, replicates: 30 });
    const again = await u.agent.post(`/api/workspaces/${u.workspaceId}/batches/${first.batchId}/rerun`);
    expect(again.status).toBe(202);
    expect(again.body.batchId).not.toBe(first.batchId);
    const a = await waitForProjection(u.agent, u.workspaceId, first.projections[0].id);
    const b = await waitForProjection(u.agent, u.workspaceId, again.body.projections[0].id);
    expect(b.snapshot).toEqual(a.snapshot);
    expect(b.result.summary).toEqual(a.result.summary);
  });
});
