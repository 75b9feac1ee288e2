import { randomUUID } from 'node:crypto';
import type { StrategyBody, StrategyView } from '../../shared/api/strategies';
import { hasChemicalStep } from '../../shared/scenario/cautions';
import type { Database } from '../db/client';
import { findField } from '../db/queries/fields';
import {
  deleteStrategy,
  findStrategy,
  insertStrategy,
  listStrategies,
  updateStrategy,
  type StrategyRow,
} from '../db/queries/strategies';
import { requireRole } from './access';
import { conflict, invalid, notFound } from './errors';
import { rateWarnings } from './rate-warnings';
import { isReferenced } from './references';
import { canSee, visibilityFor } from './visibility';

async function toView(db: Database, r: StrategyRow): Promise<StrategyView> {
  const crop = r.fieldId ? ((await findField(db, r.workspaceId, r.fieldId))?.crop ?? null) : null;
  const strategy = { name: r.name, steps: r.steps };
  return {
    id: r.id,
    name: r.name,
    description: r.description,
    fieldId: r.fieldId,
    strategy,
    maxRates: r.maxRates,
    rateWarnings: rateWarnings(strategy, r.maxRates, crop),
    hasChemicalStep: hasChemicalStep(strategy),
    updatedAt: r.updatedAt.toISOString(),
  };
}

async function existing(db: Database, workspaceId: string, id: string) {
  const row = await findStrategy(db, workspaceId, id);
  if (!row) throw notFound('Strategy');
  return row;
}

async function checkField(db: Database, workspaceId: string, fieldId: string | null) {
  if (fieldId && !(await findField(db, workspaceId, fieldId)))
    throw invalid('fieldId: no such field in this workspace', { fieldId: 'No such field in this workspace' });
}

export async function listStrategyViews(db: Database, userId: string, workspaceId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const v = await visibilityFor(db, workspaceId, userId, role);
  const rows = (await listStrategies(db, workspaceId)).filter((s) => canSee(v, 'strategyIds', s.id));
  return Promise.all(rows.map((r) => toView(db, r)));
}

export async function getStrategy(db: Database, userId: string, workspaceId: string, id: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  if (!canSee(await visibilityFor(db, workspaceId, userId, role), 'strategyIds', id))
    throw notFound('Strategy');
  return toView(db, await existing(db, workspaceId, id));
}

export async function createStrategy(db: Database, userId: string, workspaceId: string, body: StrategyBody) {
  await requireRole(db, userId, workspaceId, 'editor');
  await checkField(db, workspaceId, body.fieldId);
  const now = new Date();
  const id = randomUUID();
  await insertStrategy(db, {
    id,
    workspaceId,
    fieldId: body.fieldId,
    name: body.strategy.name,
    description: body.description,
    steps: body.strategy.steps,
    maxRates: body.maxRates,
    createdAt: now,
    updatedAt: now,
  });
  return toView(db, await existing(db, workspaceId, id));
}

export async function replaceStrategy(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  body: StrategyBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  await checkField(db, workspaceId, body.fieldId);
  await updateStrategy(db, id, {
    fieldId: body.fieldId,
    name: body.strategy.name,
    description: body.description,
    steps: body.strategy.steps,
    maxRates: body.maxRates,
    updatedAt: new Date(),
  });
  return toView(db, await existing(db, workspaceId, id));
}

export async function removeStrategy(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'editor');
  await existing(db, workspaceId, id);
  if (await isReferenced(db, workspaceId, { strategyId: id }))
    throw conflict('A scenario compares this strategy; remove it from that scenario first');
  await deleteStrategy(db, id);
}
