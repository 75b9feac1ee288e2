import { afterAll, describe, expect, it } from 'vitest';
import { signUp, testApp } from '../../support/test-app';
import { fieldBody, profileBody, strategyBody } from '../../support/domain';

const t = testApp();
afterAll(() => t.close());

describe('species profiles', () => {
  it('lists the built-in illustrative profiles, copies one to edit, refuses to edit the built-in', async () => {
    const u = await signUp(t.app, 'prof');
    const list = await u.agent.get(`/api/workspaces/${u.workspaceId}/profiles`);
    expect(list.status).toBe(200);
    const builtIn = list.body.find((p: { builtIn: boolean }) => p.builtIn);
    expect(builtIn.name).toMatch(/illustrative/);
    const put = await u.agent
      .put(`/api/workspaces/${u.workspaceId}/profiles/${builtIn.id}`)
      .send(profileBody());
    expect(put.status).toBe(403);
    const copy = await u.agent.post(`/api/workspaces/${u.workspaceId}/profiles/${builtIn.id}/copy`);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ builtIn: false, copiedFrom: builtIn.id });
    const body = profileBody();
    body.profile.seedDecay.shallow = 0.2;
    const edit = await u.agent.put(`/api/workspaces/${u.workspaceId}/profiles/${copy.body.id}`).send(body);
    expect(edit.status).toBe(200);
    expect(edit.body.profile.seedDecay.shallow).toBe(0.2);
    expect(edit.body.sources['seedDecay.shallow']).toBe('test note');
  });

  it('rejects an out-of-range probability naming the field, the value and the range', async () => {
    const u = await signUp(t.app, 'prof2');
    const body = profileBody() as { profile: { seedDecay: { shallow: number } } };
    body.profile.seedDecay.shallow = 1.4;
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/profiles`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['profile.seedDecay.shallow']).toMatch(/1\.4.*0.*1/);
  });

  it('rejects unknown fields and bad units', async () => {
    const u = await signUp(t.app, 'prof3');
    const body = profileBody() as unknown as { profile: Record<string, unknown> };
    body.profile.seedDecayPercent = 12;
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/profiles`).send(body);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('profile.seedDecayPercent');
  });
});

describe('fields and strategies', () => {
  it('creates, reads, updates and deletes a field', async () => {
    const u = await signUp(t.app, 'field');
    const created = await u.agent.post(`/api/workspaces/${u.workspaceId}/fields`).send(fieldBody());
    expect(created.status).toBe(201);
    const id = created.body.id;
    const body = fieldBody();
    body.setting.areaHa = 3.5;
    expect(
      (await u.agent.put(`/api/workspaces/${u.workspaceId}/fields/${id}`).send(body)).body.setting.areaHa,
    ).toBe(3.5);
    expect((await u.agent.get(`/api/workspaces/${u.workspaceId}/fields/${id}`)).status).toBe(200);
    expect((await u.agent.delete(`/api/workspaces/${u.workspaceId}/fields/${id}`)).status).toBe(204);
    expect((await u.agent.get(`/api/workspaces/${u.workspaceId}/fields/${id}`)).status).toBe(404);
  });

  it('rejects a negative area with a message naming the field', async () => {
    const u = await signUp(t.app, 'field2');
    const body = fieldBody();
    body.setting.areaHa = -1;
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/fields`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['setting.areaHa']).toContain('-1');
  });

  it('rejects an unknown step kind and a bad timing', async () => {
    const u = await signUp(t.app, 'strat');
    const body = strategyBody();
    (body.strategy.steps[0] as { kind: string }).kind = 'flame-weeding';
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/strategies`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.fields)).toContain('flame-weeding');
  });

  it('warns when an entered rate exceeds a maximum the user recorded for the crop', async () => {
    const u = await signUp(t.app, 'rates');
    const field = (await u.agent.post(`/api/workspaces/${u.workspaceId}/fields`).send(fieldBody())).body;
    const body = strategyBody(field.id);
    const spot = body.strategy.steps[2] as { chemical?: object };
    spot.chemical = { activeIngredient: 'glyphosate', rate: 3, rateUnit: 'L/ha' };
    body.maxRates = [{ activeIngredient: 'Glyphosate', crop: 'Raspberry', maxRate: 2, rateUnit: 'L/ha' }];
    const res = await u.agent.post(`/api/workspaces/${u.workspaceId}/strategies`).send(body);
    expect(res.status).toBe(201);
    expect(res.body.hasChemicalStep).toBe(true);
    expect(res.body.rateWarnings).toHaveLength(1);
    expect(res.body.rateWarnings[0]).toMatchObject({ stepIndex: 2 });
    expect(res.body.rateWarnings[0].message).toContain('exceeds');
  });
});

describe('roles and isolation', () => {
  it('a viewer cannot write (403) and does not see what is not shared (404); another workspace gets 404', async () => {
    const owner = await signUp(t.app, 'o');
    const viewer = await signUp(t.app, 'v');
    const stranger = await signUp(t.app, 's');
    await owner.agent
      .post(`/api/workspaces/${owner.workspaceId}/members`)
      .send({ email: viewer.email, role: 'viewer' });
    const field = (await owner.agent.post(`/api/workspaces/${owner.workspaceId}/fields`).send(fieldBody()))
      .body;
    expect((await viewer.agent.get(`/api/workspaces/${owner.workspaceId}/fields/${field.id}`)).status).toBe(
      404,
    );
    expect((await viewer.agent.get(`/api/workspaces/${owner.workspaceId}/fields`)).body).toEqual([]);
    expect(
      (await viewer.agent.post(`/api/workspaces/${owner.workspaceId}/fields`).send(fieldBody())).status,
    ).toBe(403);
    expect(
      (await viewer.agent.put(`/api/workspaces/${owner.workspaceId}/fields/${field.id}`).send(fieldBody()))
        .status,
    ).toBe(403);
    expect(
      (await viewer.agent.delete(`/api/workspaces/${owner.workspaceId}/fields/${field.id}`)).status,
    ).toBe(403);
    expect((await stranger.agent.get(`/api/workspaces/${owner.workspaceId}/fields/${field.id}`)).status).toBe(
      404,
    );
    // Even through the stranger's own workspace, the object is not there.
    expect(
      (await stranger.agent.get(`/api/workspaces/${stranger.workspaceId}/fields/${field.id}`)).status,
    ).toBe(404);
  });
});
