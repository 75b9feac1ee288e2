// The sweeps API against the real MariaDB: validation naming the problem, roles, workspace
// isolation, server pagination and sorting, pause/resume/cancel, failed points, and the
// server's points equal to the command line's for the same definition and seed.
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SweepBody } from '../../../shared/api/sweeps';
import { parseScenario } from '../../../shared/scenario/parse';
import { runLocalSweep } from '../../../server/sweeps/local-run';
import { browserLike, signUp, testApp } from '../../support/test-app';
import { buildScenario } from '../../support/domain';

// Small chunks, so even these small sweeps are cut into several claims.
const t = testApp({
  sweeps: { chunkReplicateYears: 1_000, maxReplicateYears: 50_000, leaseSeconds: 5, threads: 1 },
});
type Agent = ReturnType<typeof browserLike>;
let owner: Awaited<ReturnType<typeof signUp>>;
let built: Awaited<ReturnType<typeof buildScenario>>;
let url: string;

const body = (overrides: Partial<SweepBody> = {}): SweepBody => ({
  name: 'Decay sweep',
  scenarioId: built.scenario.id,
  strategyId: built.strategy.id,
  parameters: [
    { path: 'profile.seedDecay.shallow', min: 0.05, max: 0.3 },
    { path: 'profile.seedDecay.deep', min: 0.01, max: 0.1 },
  ],
  design: { kind: 'latin-hypercube', points: 8 },
  outcomes: ['seedbank', 'npv'],
  outcomeYear: 5,
  replicatesPerPoint: 20,
  seed: 77,
  ...overrides,
});

async function waitFor(agent: Agent, id: string, done: (s: { status: string }) => boolean, ms = 60_000) {
  const until = Date.now() + ms;
  for (;;) {
    const res = await agent.get(`${url}/${id}`);
    if (done(res.body)) return res.body;
    if (Date.now() > until) throw new Error(`sweep ${id} still ${res.body.status}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

beforeAll(async () => {
  owner = await signUp(t.app, 'sweeper');
  built = await buildScenario(owner.agent, owner.workspaceId);
  url = `/api/workspaces/${owner.workspaceId}/sweeps`;
});
afterAll(async () => {
  await t.ctx.sweeps.worker.stop();
  await t.close();
});

describe('sweep validation', () => {
  it('names an unknown parameter path', async () => {
    const res = await owner.agent
      .post(url)
      .send(body({ parameters: [{ path: 'profile.seedDecay.middle', min: 0, max: 1 }] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['parameters[0].path']).toMatch(
      /"profile\.seedDecay\.middle" is not a numeric parameter/,
    );
  });

  it('names min > max, and a bound outside the parameter’s valid range', async () => {
    const res = await owner.agent.post(url).send(
      body({
        parameters: [
          { path: 'profile.seedDecay.shallow', min: 0.3, max: 0.05 },
          // A decay is a fraction per year: 0–1 (parameter catalogue, as the README lists it).
          { path: 'profile.seedDecay.deep', min: 0.01, max: 1.5 },
        ],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields['parameters[0].min']).toBe('min 0.3 is above max 0.05 (fraction per year)');
    expect(res.body.error.fields['parameters[1].max']).toMatch(/1\.5 is outside the valid range 0–1/);
  });

  it('refuses a design with zero points', async () => {
    const res = await owner.agent.post(url).send(body({ design: { kind: 'latin-hypercube', points: 0 } }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.design).toMatch(/zero points/);
    const sobol = await owner.agent.post(url).send(body({ design: { kind: 'sobol', baseSamples: 0 } }));
    expect(sobol.body.error.fields.design).toMatch(/zero points/);
  });

  it('refuses a sweep over the workspace size limit, stating its size', async () => {
    // 100 points × 100 replicates × 10 years = 100,000 replicate-years (arithmetic), over 50,000.
    const res = await owner.agent
      .post(`${url}/preview`)
      .send(body({ design: { kind: 'latin-hypercube', points: 100 }, replicatesPerPoint: 100 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.size).toContain(
      '100 points × 100 replicates × 10 years = 100,000 replicate-years, over the workspace limit of 50,000',
    );
  });

  it('refuses a strategy the scenario does not compare, and a year T beyond the horizon', async () => {
    const other = (
      await owner.agent.post(`/api/workspaces/${owner.workspaceId}/strategies`).send({
        strategy: { name: 'Other', steps: [] },
      })
    ).body;
    const res = await owner.agent.post(url).send(body({ strategyId: other.id }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.strategyId).toBeDefined();
    const late = await owner.agent.post(url).send(body({ outcomeYear: 11 }));
    expect(late.body.error.fields.outcomeYear).toBe('Year 11 is outside the horizon 1–10 (years)');
  });

  it('previews the size without saving: a one-at-a-time design has 2k + 1 points', async () => {
    const res = await owner.agent.post(`${url}/preview`).send(body({ design: { kind: 'one-at-a-time' } }));
    expect(res.status).toBe(200);
    // One-at-a-time: the shared base point plus each of k parameters at min and at max
    // (Saltelli et al. 2008, Global Sensitivity Analysis: The Primer — recalled from memory).
    expect(res.body.points).toBe(2 * 2 + 1);
    expect(res.body.replicateYears).toBe(5 * 20 * 10);
    expect(res.body.estimatedSeconds).toBeGreaterThan(0);
    const list = await owner.agent.get(url);
    expect(list.body).toEqual([]);
  });

  it('lists the sweepable parameters with unit, valid range and the scenario’s value', async () => {
    const res = await owner.agent
      .get(`${url}/parameters`)
      .query({ scenarioId: built.scenario.id, strategyId: built.strategy.id });
    expect(res.status).toBe(200);
    const example = JSON.parse(readFileSync('models/examples/demo-perennial-dock.json', 'utf8'));
    const deep = res.body.parameters.find((p: { path: string }) => p.path === 'profile.seedDecay.deep');
    expect(deep).toMatchObject({
      unit: 'fraction per year',
      min: 0,
      max: 1,
      base: example.profile.seedDecay.deep,
    });
    // Step paths are instantiated per step of the chosen strategy.
    const steps = example.strategy.steps.length;
    for (let i = 0; i < steps; i++)
      expect(
        res.body.parameters.some((p: { path: string }) => p.path === `strategy.steps[${i}].cost.application`),
      ).toBe(true);
    expect(res.body.parameters.some((p: { path: string }) => p.path.endsWith('chemical.rate'))).toBe(false);
  });
});

describe('roles and workspaces', () => {
  it('lets viewers read but not launch, and hides another workspace’s sweeps', async () => {
    const viewer = await signUp(t.app, 'sweep-viewer');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: viewer.email, role: 'viewer' })
      .expect(201);
    const launched = await owner.agent.post(url).send(body());
    expect(launched.status).toBe(201);
    const id = launched.body.id;
    expect((await viewer.agent.get(url)).status).toBe(200);
    expect((await viewer.agent.get(`${url}/${id}`)).body.name).toBe('Decay sweep');
    expect((await viewer.agent.post(url).send(body())).status).toBe(403);
    expect((await viewer.agent.post(`${url}/${id}/pause`)).status).toBe(403);

    const stranger = await signUp(t.app, 'sweep-stranger');
    expect((await stranger.agent.get(`${url}/${id}`)).status).toBe(404);
    expect((await stranger.agent.get(`${url}/${id}/points`)).status).toBe(404);
    // The stranger's own workspace does not reach the owner's sweep or scenario either.
    const theirs = `/api/workspaces/${stranger.workspaceId}/sweeps`;
    expect((await stranger.agent.get(`${theirs}/${id}`)).status).toBe(404);
    expect((await stranger.agent.post(theirs).send(body())).status).toBe(404);
    await owner.agent.post(`${url}/${id}/cancel`).expect(200);
  });
});

describe('control', () => {
  it('pauses, resumes and cancels by status; a finished state refuses more', async () => {
    const id = (await owner.agent.post(url).send(body())).body.id;
    // No worker runs yet, so the sweep waits in the queue.
    expect((await owner.agent.get(`${url}/${id}`)).body.status).toBe('queued');
    expect((await owner.agent.post(`${url}/${id}/pause`)).body.status).toBe('paused');
    expect((await owner.agent.post(`${url}/${id}/pause`)).status).toBe(409);
    expect((await owner.agent.post(`${url}/${id}/resume`)).body.status).toBe('running');
    expect((await owner.agent.post(`${url}/${id}/cancel`)).body.status).toBe('cancelled');
    expect((await owner.agent.post(`${url}/${id}/resume`)).status).toBe(409);
  });
});

describe('a finished sweep', () => {
  let sweep: { id: string; totalPoints: number };
  let failing: { id: string };

  beforeAll(async () => {
    sweep = (await owner.agent.post(url).send(body({ design: { kind: 'latin-hypercube', points: 12 } })))
      .body;
    // profile.ageClasses = 1 cannot hold the profile's two germination values: that point fails.
    failing = (
      await owner.agent.post(url).send(
        body({
          name: 'Age classes',
          parameters: [{ path: 'profile.ageClasses', min: 1, max: 4 }],
          design: { kind: 'one-at-a-time' },
        }),
      )
    ).body;
    t.ctx.sweeps.worker.start();
    await waitFor(owner.agent, sweep.id, (s) => s.status === 'done');
    await waitFor(owner.agent, failing.id, (s) => s.status === 'done');
  });

  it('holds every point once, equal to the command line’s run of the same definition and seed', async () => {
    const results = (await owner.agent.get(`${url}/${sweep.id}/results.json`)).body;
    expect(results.points.map((p: { index: number }) => p.index)).toEqual([...Array(12).keys()]);
    const parsed = parseScenario(results.base);
    if (!parsed.ok) throw new Error('the base must be a valid scenario');
    const { parameters, outcomes, outcomeYear, replicatesPerPoint, seed } = body();
    const spec = {
      parameters,
      outcomes,
      outcomeYear,
      replicatesPerPoint,
      seed,
      design: { kind: 'latin-hypercube' as const, points: 12 },
    };
    const local = await runLocalSweep(parsed.scenario, spec, 2);
    if (!local.ok) throw new Error('the definition must plan');
    expect(results.points).toEqual(JSON.parse(JSON.stringify(local.result.points)));
  });

  it('pages and sorts on the server', async () => {
    const all = (await owner.agent.get(`${url}/${sweep.id}/results.json`)).body.points as {
      index: number;
      inputs: number[];
      outcomes: Record<string, number>;
    }[];
    // Reference order computed here with Array.prototype.sort (ECMAScript, stable).
    const byDeepDesc = [...all].sort((a, b) => b.inputs[1] - a.inputs[1]);
    const page = await owner.agent
      .get(`${url}/${sweep.id}/points`)
      .query({ page: 2, pageSize: 5, sort: 'p1', order: 'desc' });
    expect(page.status).toBe(200);
    expect(page.body.total).toBe(12);
    expect(page.body.points.map((p: { index: number }) => p.index)).toEqual(
      byDeepDesc.slice(5, 10).map((p) => p.index),
    );
    const bySeedbank = [...all].sort((a, b) => a.outcomes.seedbank - b.outcomes.seedbank);
    const last = await owner.agent
      .get(`${url}/${sweep.id}/points`)
      .query({ page: 3, pageSize: 5, sort: 'seedbank' });
    expect(last.body.points.map((p: { index: number }) => p.index)).toEqual(
      bySeedbank.slice(10).map((p) => p.index),
    );
    const bad = await owner.agent.get(`${url}/${sweep.id}/points`).query({ sort: 'p2' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.sort).toMatch(/varies 2 parameters/);
    const notRecorded = await owner.agent.get(`${url}/${sweep.id}/points`).query({ sort: 'plants' });
    expect(notRecorded.status).toBe(400);
  });

  it('reports progress as points done of the total', async () => {
    const view = (await owner.agent.get(`${url}/${sweep.id}`)).body;
    expect(view).toMatchObject({ status: 'done', pointsDone: 12, totalPoints: 12, failedPoints: 0 });
    expect(view.finishedAt).not.toBeNull();
  });

  it('lists failed points with their error and says why the design’s analysis is missing', async () => {
    const view = (await owner.agent.get(`${url}/${failing.id}`)).body;
    // One-at-a-time over one parameter: base (4), min (1), max (4): 3 points; only min fails.
    expect(view).toMatchObject({ totalPoints: 3, pointsDone: 3, failedPoints: 1 });
    const failed = (await owner.agent.get(`${url}/${failing.id}/points`).query({ filter: 'failed' })).body;
    expect(failed.total).toBe(1);
    expect(failed.points[0]).toMatchObject({ index: 1, inputs: [1], outcomes: null });
    expect(failed.points[0].error).toMatch(/germination\.shallowByAge: has 2 values for 1 age classes/);
    const analysis = (await owner.agent.get(`${url}/${failing.id}/analysis`)).body;
    expect(analysis.tornado).toBeNull();
    expect(analysis.pending).toMatch(/^Point 1 has no value/);
  });

  it('analyses a Latin hypercube with PRCC and serves tidy CSV', async () => {
    const analysis = (await owner.agent.get(`${url}/${sweep.id}/analysis`).query({ outcome: 'npv' })).body;
    expect(analysis.prcc).toHaveLength(2);
    // N − 2 − p degrees of freedom with p = k − 1 parameters partialled out (Marino et al. 2008).
    expect(analysis.prcc[0].degreesOfFreedom).toBe(12 - 2 - 1);
    expect(analysis.scatter.outcome).toHaveLength(12);
    const csv = await owner.agent.get(`${url}/${sweep.id}/results.csv`);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trimEnd().split('\r\n');
    expect(lines[0]).toBe(
      'point,point_seed,profile.seedDecay.shallow (fraction per year),profile.seedDecay.deep (fraction per year),outcome,year,value,unit,error',
    );
    // Tidy: one row per point × outcome (Wickham 2014, J. Stat. Softw. 59(10)).
    expect(lines).toHaveLength(1 + 12 * 2);
  });
});

describe('sign-in', () => {
  it('is needed', async () => {
    expect((await browserLike(t.app).get(url)).status).toBe(401);
  });
});
