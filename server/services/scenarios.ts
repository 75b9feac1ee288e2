import { randomUUID } from 'node:crypto';
import type { ScenarioBody, ScenarioView } from '../../shared/api/scenarios';
import type { Database } from '../db/client';
import { findField } from '../db/queries/fields';
import { findProfile } from '../db/queries/profiles';
import {
  deleteScenario,
  findScenario,
  insertScenario,
  listScenarios,
  updateScenario,
  type ScenarioRow,
} from '../db/queries/scenarios';
import { findStrategies } from '../db/queries/strategies';
import { requireRole } from './access';
import { invalid, notFound } from './errors';
import { snapshot } from './snapshots';
import { canSee, visibilityFor } from './visibility';

export const toScenarioView = (r: ScenarioRow): ScenarioView => ({
  id: r.id,
  name: r.name,
  fieldId: r.fieldId,
  profileId: r.profileId,
  strategyIds: r.strategyIds,
  horizonYears: r.horizonYears,
  replicates: r.replicates,
  seed: r.seed,
  efficacyDraw: r.efficacyDraw,
  depletionThreshold: r.depletionThreshold,
  discountRate: r.discountRate,
  updatedAt: r.updatedAt.toISOString(),
});

/** Loads what a scenario refers to, all from the same workspace, or a 400 naming the missing one. */
export async function resolveParts(
  db: Database,
  workspaceId: string,
  body: Pick<ScenarioBody, 'fieldId' | 'profileId' | 'strategyIds'>,
) {
  const [field, profile, strategies] = await Promise.all([
    findField(db, workspaceId, body.fieldId),
    findProfile(db, workspaceId, body.profileId),
    findStrategies(db, workspaceId, body.strategyIds),
  ]);
  const fields: Record<string, string> = {};
  if (!field) fields.fieldId = 'No such field in this workspace';
  if (!profile) fields.profileId = 'No such species profile in this workspace';
  body.strategyIds.forEach((id, i) => {
    if (!strategies.some((s) => s.id === id))
      fields[`strategyIds[${i}]`] = 'No such strategy in this workspace';
  });
  if (Object.keys(fields).length)
    throw invalid(`Invalid body: ${Object.entries(fields)[0].join(': ')}`, fields);
  const ordered = body.strategyIds.map((id) => strategies.find((s) => s.id === id)!);
  return { field: field!, profile: profile!, strategies: ordered };
}

async function validated(db: Database, workspaceId: string, body: ScenarioBody) {
  const parts = await resolveParts(db, workspaceId, body);
  for (const s of parts.strategies)
    snapshot(parts.profile.profile, parts.field.setting, { name: s.name, steps: s.steps }, body);
  return parts;
}

async function existing(db: Database, workspaceId: string, id: string) {
  const row = await findScenario(db, workspaceId, id);
  if (!row) throw notFound('Scenario');
  return row;
}

export async function listScenarioViews(db: Database, userId: string, workspaceId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const v = await visibilityFor(db, workspaceId, userId, role);
  return (await listScenarios(db, workspaceId))
    .filter((s) => canSee(v, 'scenarioIds', s.id))
    .map(toScenarioView);
}

export async function getScenario(db: Database, userId: string, workspaceId: string, id: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  if (!canSee(await visibilityFor(db, workspaceId, userId, role), 'scenarioIds', id))
    throw notFound('Scenario');
  return toScenarioView(await existing(db, workspaceId, id));
}

export async function createScenario(db: Database, userId: string, workspaceId: string, body: ScenarioBody) {
  await requireRole(db, userId, workspaceId, 'editor');
  await validated(db, workspaceId, body);
  const now = new Date();
  const id = randomUUID();
  await insertScenario(db, { id, workspaceId, ...body, createdAt: now, updatedAt: now });
  return toScenarioView(await existing(db, workspaceId, id));
}

export async function replaceScenario(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  body: ScenarioBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await validated(db, workspaceId, body);
  await updateScenario(db, id, { ...body, updatedAt: new Date() });
  return toScenarioView(await existing(db, workspaceId, id));
}

export async function removeScenario(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await deleteScenario(db, id);
}
