// Lessons, class links and replays against the real MariaDB.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createHash } from 'node:crypto';
import binomialPmf from '@stdlib/stats-base-dists-binomial-pmf';
import { browserLike, signUp, testApp, TEST_ORIGIN } from '../../support/test-app';
import { profileBody } from '../../support/domain';

const t = testApp();
// Its own limiter, so the other tests' replays do not count against it.
const limited = testApp({ replayLimits: { perSource: 3, perAddress: 5, windowSeconds: 600, inFlight: 8 } });
afterAll(() => Promise.all([t.close(), limited.close()]));

const DOCK = '5eedfa00-0000-4000-8000-000000000101';
const slider = (value: number) => ({ min: 0, max: 0.5, step: 0.01, value });
const decayLesson = (overrides: Record<string, unknown> = {}) => ({
  title: 'Seedbank decay for the Tuesday class',
  profileId: null,
  prompts: ['Which cohort is still there after **20 years**?'],
  definition: {
    template: 'seedbank-decay',
    settings: {
      horizonYears: 40,
      initialSeedbank: 1000,
      scale: 'linear',
      replicates: 200,
      seed: 7,
      sliders: {
        decay: slider(0.2),
        germination: slider(0.1),
        compareDecay: slider(0.04),
        compareGermination: slider(0),
      },
      ...overrides,
    },
  },
});
const values = { decay: 0.2, germination: 0.1, compareDecay: 0.04, compareGermination: 0 };

async function editorWithLesson(body: object = decayLesson(), app = t.app) {
  const u = await signUp(app, 'teacher');
  const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/lessons`).send(body);
  if (res.status !== 201) throw new Error(`lesson: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...u, lesson: res.body };
}

/** A signed-out visitor on a Seedwake page: no cookie, our Origin on POSTs. */
const visitor = () => request(t.app);

describe('lessons', () => {
  it('are written by editors, read by viewers and hidden from other workspaces', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson();
    expect(lesson).toMatchObject({
      title: 'Seedbank decay for the Tuesday class',
      template: 'seedbank-decay',
      link: null,
    });
    const viewer = await signUp(t.app, 'student-teacher');
    await agent.post(`/api/workspaces/${workspaceId}/members`).send({ email: viewer.email, role: 'viewer' });
    const path = `/api/workspaces/${workspaceId}/lessons/${lesson.id}`;
    expect((await viewer.agent.get(path)).status).toBe(200);
    expect((await viewer.agent.get(`/api/workspaces/${workspaceId}/lessons`)).body).toHaveLength(1);
    expect((await viewer.agent.put(path).send(decayLesson())).status).toBe(403);
    expect((await viewer.agent.post(`${path}/link`)).status).toBe(403);
    const stranger = await signUp(t.app, 'stranger');
    expect((await stranger.agent.get(path)).status).toBe(404);
    expect(
      (await stranger.agent.get(`/api/workspaces/${stranger.workspaceId}/lessons/${lesson.id}`)).status,
    ).toBe(404);
    const renamed = await agent.put(path).send({ ...decayLesson(), title: 'Renamed' });
    expect(renamed.body.title).toBe('Renamed');
    expect((await agent.delete(path)).status).toBe(204);
    expect((await agent.get(path)).status).toBe(404);
  });

  it('refuse a seedbank-decay axis shorter than 40 years, naming the field', async () => {
    // Common practice, no published source: buried seed stays viable for more than 40 years.
    const u = await signUp(t.app, 'short');
    const res = await u.agent
      .post(`/api/workspaces/${u.workspaceId}/lessons`)
      .send(decayLesson({ horizonYears: 30 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['definition.settings.horizonYears']).toContain('40');
  });

  it('refuse a starting value outside the slider and a profile-based template without a profile', async () => {
    const u = await signUp(t.app, 'bad');
    const bad = decayLesson();
    bad.definition.settings.sliders.decay = { min: 0, max: 0.3, step: 0.01, value: 0.4 };
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/lessons`).send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['definition.settings.sliders.decay.value']).toMatch(/outside/);
    const noProfile = await u.agent.post(`/api/workspaces/${u.workspaceId}/lessons`).send({
      title: 'Which stage',
      profileId: null,
      definition: {
        template: 'which-stage',
        settings: {
          horizonYears: 20,
          initialSeedbank: 500,
          initialPlants: 1,
          replicates: 50,
          seed: 1,
          sliders: { controlEfficacy: { min: 0, max: 1, step: 0.05, value: 0.9 } },
        },
      },
    });
    expect(noProfile.status).toBe(400);
    expect(Object.keys(noProfile.body.error.fields)).toEqual(['profileId']);
  });

  it('render Markdown prompts sanitised: a script tag or a javascript: link does nothing', async () => {
    const prompts = [
      'Think about **seed rain**. <script>window.hacked = 1</script>',
      'Read [the notes](javascript:alert(document.cookie)) and [this](https://example.org/seeds) <img src=x onerror="alert(1)">',
    ];
    const { agent, workspaceId, lesson } = await editorWithLesson({ ...decayLesson(), prompts });
    const link = await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`);
    for (const view of [lesson, (await visitor().get(`/api/class/${link.body.token}`)).body]) {
      const html = view.prompts.map((p: { html: string }) => p.html).join('\n');
      expect(html).toContain('<strong>seed rain</strong>');
      expect(html).toContain('href="https://example.org/seeds"');
      expect(html).not.toMatch(/<script|javascript:|onerror|<img/i);
    }
    // The teacher's own text is kept for editing.
    expect(lesson.prompts[0].markdown).toBe(prompts[0]);
  });

  it('need a session: the workspace API answers 401 to a signed-out visitor', async () => {
    const { workspaceId, lesson } = await editorWithLesson();
    expect((await visitor().get(`/api/workspaces/${workspaceId}/lessons`)).status).toBe(401);
    expect((await visitor().get(`/api/workspaces/${workspaceId}/lessons/${lesson.id}`)).status).toBe(401);
  });
});

describe('class links', () => {
  it('show one lesson signed out — its definition, profile parameters and card — and nothing else', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson({ ...decayLesson(), profileId: DOCK });
    const other = await agent
      .post(`/api/workspaces/${workspaceId}/lessons`)
      .send({ ...decayLesson(), title: 'A second, private lesson' });
    const own = await agent.post(`/api/workspaces/${workspaceId}/profiles`).send(profileBody());
    await agent.put(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`).send({
      identificationNotes: 'Broad leaves.',
      lookAlikes: [],
      lifeForm: 'Perennial',
      status: 'Introduced',
    });
    const created = await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`);
    expect(created.status).toBe(201);
    const token: string = created.body.token;
    // 32 random bytes in base64url; only a SHA-256 of it is stored.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const [rows] = await t.ctx.pool.query('SELECT token_hash FROM lesson_links WHERE lesson_id = ?', [
      lesson.id,
    ]);
    expect((rows as { token_hash: string }[])[0].token_hash).toBe(
      createHash('sha256').update(token).digest('hex'),
    );
    expect(JSON.stringify(rows)).not.toContain(token);

    const res = await visitor().get(`/api/class/${token}`);
    expect(res.status).toBe(200);
    expect(res.body.title).toBe('Seedbank decay for the Tuesday class');
    expect(res.body.definition.template).toBe('seedbank-decay');
    expect(res.body.profile.profile.seedDecay).toBeDefined();
    expect(res.body.card).toMatchObject({ identificationNotes: 'Broad leaves.', lifeForm: 'Perennial' });
    const text = JSON.stringify(res.body);
    for (const hidden of [
      workspaceId,
      lesson.id,
      other.body.id,
      own.body.id,
      DOCK,
      'A second, private lesson',
    ])
      expect(text).not.toContain(hidden);
    // Everything else stays behind sign-in or does not exist for the visitor.
    expect((await visitor().get(`/api/workspaces/${workspaceId}/profiles`)).status).toBe(401);
    expect((await visitor().get(`/api/workspaces/${workspaceId}/lessons/${other.body.id}`)).status).toBe(401);
    expect((await visitor().get(`/api/workspaces/${workspaceId}`)).status).toBe(401);
    expect((await visitor().get(`/api/class/${token}/lessons`)).status).toBe(404);
    expect((await visitor().get(`/api/class/${'A'.repeat(43)}`)).status).toBe(404);
    expect((await visitor().get('/api/class/not-a-token')).status).toBe(404);
    // The token is no key to the workspace API.
    expect(
      (await visitor().get(`/api/workspaces/${workspaceId}/lessons`).set('Authorization', `Bearer ${token}`))
        .status,
    ).toBe(401);
  });

  it('stop working when revoked, and when replaced by a new link', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson();
    const first = (await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`)).body.token;
    const second = (await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`)).body.token;
    expect((await visitor().get(`/api/class/${first}`)).status).toBe(404);
    expect((await visitor().get(`/api/class/${second}`)).status).toBe(200);
    expect((await agent.get(`/api/workspaces/${workspaceId}/lessons/${lesson.id}`)).body.link.prefix).toBe(
      second.slice(0, 6),
    );
    expect((await agent.delete(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`)).status).toBe(204);
    expect((await visitor().get(`/api/class/${second}`)).status).toBe(404);
    const replay = await visitor()
      .post(`/api/class/${second}/replay`)
      .set('Origin', TEST_ORIGIN)
      .send({ values, seed: 1 });
    expect(replay.status).toBe(404);
    expect((await agent.delete(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`)).status).toBe(404);
    expect((await agent.get(`/api/workspaces/${workspaceId}/lessons/${lesson.id}`)).body.link).toBeNull();
  });
});

describe('replays', () => {
  it('run seeded replicates whose band holds the binomial thinning of one seed cohort', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson();
    const res = await agent
      .post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/replay`)
      .send({ values, seed: 11 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ seed: 11, replicates: 200 });
    expect(res.body.years).toHaveLength(41);
    const [a] = res.body.runs;
    expect(a.id).toBe('cohort-a');
    // Each of the 1000 seeds on the lesson's 1 m² survives a year with k = (1 − g)(1 − d) = 0.72,
    // independently, so after t years the count is Binomial(1000, k^t) (thinning of binomials).
    // Its 5 % and 95 % quantiles from @stdlib's binomial pmf; the replicates' quantiles
    // lie within a few counts of them.
    const t = 5;
    const p = 0.72 ** t;
    let cdf = 0;
    let lo = -1;
    let hi = -1;
    for (let k = 0; k <= 1000; k++) {
      cdf += binomialPmf(k, 1000, p);
      if (lo < 0 && cdf >= 0.05) lo = k;
      if (hi < 0 && cdf >= 0.95) hi = k;
    }
    expect(Math.abs(a.seedbankTotal.q05[t] - lo)).toBeLessThanOrEqual(4);
    expect(Math.abs(a.seedbankTotal.q95[t] - hi)).toBeLessThanOrEqual(4);
    expect(a.seedbankTotal.q50[0]).toBe(1000);
    // Same seed, same band.
    const again = await agent
      .post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/replay`)
      .send({ values, seed: 11 });
    expect(again.body.runs).toEqual(res.body.runs);
  });

  it('refuse slider values outside the lesson’s ranges, naming the slider', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson();
    const res = await agent
      .post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/replay`)
      .send({ values: { ...values, decay: 0.9 }, seed: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['values.decay']).toContain('0–0.5');
  });

  it('are rate-limited per class link and per address', async () => {
    const one = await editorWithLesson(decayLesson(), limited.app);
    const two = await editorWithLesson(decayLesson(), limited.app);
    const tokenOne = (
      await one.agent.post(`/api/workspaces/${one.workspaceId}/lessons/${one.lesson.id}/link`)
    ).body.token;
    const tokenTwo = (
      await two.agent.post(`/api/workspaces/${two.workspaceId}/lessons/${two.lesson.id}/link`)
    ).body.token;
    const replay = (token: string) =>
      request(limited.app)
        .post(`/api/class/${token}/replay`)
        .set('Origin', TEST_ORIGIN)
        .send({ values, seed: 2 });
    // This app allows 3 replays per link and 5 per address.
    for (let i = 0; i < 3; i++) expect((await replay(tokenOne)).status).toBe(200);
    const refused = await replay(tokenOne);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(refused.body.error.code).toBe('rate_limited');
    expect((await replay(tokenTwo)).status).toBe(200);
    expect((await replay(tokenTwo)).status).toBe(200);
    // The address has now used its 5.
    expect((await replay(tokenTwo)).status).toBe(429);
  });

  it('from a class link need the page’s Origin like every state-changing request', async () => {
    const { agent, workspaceId, lesson } = await editorWithLesson();
    const token = (await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.id}/link`)).body.token;
    expect((await visitor().post(`/api/class/${token}/replay`).send({ values, seed: 1 })).status).toBe(403);
    expect(
      (await browserLike(t.app).post(`/api/class/${token}/replay`).send({ values, seed: 1 })).status,
    ).not.toBe(403);
  });
});
