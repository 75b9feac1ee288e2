// Valid bodies for the domain API, built from the engine's example files (the same inputs
// the CLI tests use), so a test only spells out what it changes.
import { readFileSync } from 'node:fs';
import type { FieldBody } from '../../shared/api/fields';
import type { ProfileBody } from '../../shared/api/profiles';
import type { StrategyBody } from '../../shared/api/strategies';
import type { browserLike } from './test-app';

const example = () => JSON.parse(readFileSync('models/examples/demo-perennial-dock.json', 'utf8'));

export const profileBody = (): ProfileBody => ({
  profile: example().profile,
  sources: { 'seedDecay.shallow': 'test note' },
});
export const fieldBody = (): FieldBody => ({
  crop: 'raspberry',
  plantingYear: 2020,
  notes: '',
  setting: example().field,
});
export const strategyBody = (fieldId: string | null = null): StrategyBody => ({
  strategy: example().strategy,
  description: 'test strategy',
  fieldId,
  maxRates: [],
});

type Agent = ReturnType<typeof browserLike>;

/** A field, a profile, a strategy and a small scenario in the agent's workspace. */
export async function buildScenario(agent: Agent, ws: string, overrides: Record<string, unknown> = {}) {
  const field = (await agent.post(`/api/workspaces/${ws}/fields`).send(fieldBody())).body;
  const profile = (await agent.post(`/api/workspaces/${ws}/profiles`).send(profileBody())).body;
  const strategy = (await agent.post(`/api/workspaces/${ws}/strategies`).send(strategyBody(field.id))).body;
  const res = await agent.post(`/api/workspaces/${ws}/scenarios`).send({
    name: 'Test scenario',
    fieldId: field.id,
    profileId: profile.id,
    strategyIds: [strategy.id],
    horizonYears: 10,
    replicates: 60,
    seed: 4242,
    efficacyDraw: 'per-replicate',
    depletionThreshold: 1,
    discountRate: 0.05,
    ...overrides,
  });
  if (res.status !== 201) throw new Error(`scenario: ${res.status} ${JSON.stringify(res.body)}`);
  return { field, profile, strategy, scenario: res.body };
}

/** Polls a projection until it leaves queued/running. */
export async function waitForProjection(agent: Agent, ws: string, id: string, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const res = await agent.get(`/api/workspaces/${ws}/projections/${id}`);
    if (!['queued', 'running'].includes(res.body.status)) return res.body;
    if (Date.now() > until) throw new Error(`projection ${id} still ${res.body.status}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
