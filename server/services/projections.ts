import { randomUUID } from 'node:crypto';
import type { LaunchBody } from '../../shared/api/scenarios';
import type { LaunchResponse, ProjectionListItem, ProjectionView } from '../../shared/api/projections';
import { hasChemicalStep } from '../../shared/scenario/cautions';
import type { Scenario } from '../../models/scenario/types';
import type { Database } from '../db/client';
import {
  findProjection,
  insertProjections,
  listBatch,
  listProjections,
  type ProjectionRow,
} from '../db/queries/projections';
import { findScenario } from '../db/queries/scenarios';
import type { ProjectionRunner } from '../projections/runner';
import { requireRole } from './access';
import { invalid, notFound, rateLimited } from './errors';
import { resolveParts } from './scenarios';
import { noControl, snapshot } from './snapshots';
import { canSee, visibilityFor } from './visibility';

type Light = Omit<ProjectionRow, 'snapshot' | 'result' | 'createdBy'>;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export const toListItem = (r: Light): ProjectionListItem => ({
  id: r.id,
  batchId: r.batchId,
  scenarioId: r.scenarioId,
  strategyId: r.strategyId,
  label: r.label,
  role: r.role,
  seed: r.seed,
  status: r.status,
  replicates: r.replicates,
  replicatesDone: r.replicatesDone,
  error: r.error,
  queuedAt: r.queuedAt.toISOString(),
  startedAt: iso(r.startedAt),
  finishedAt: iso(r.finishedAt),
});

const toView = (r: ProjectionRow): ProjectionView => ({
  ...toListItem(r),
  letItSeedYear: r.letItSeedYear,
  snapshot: r.snapshot,
  result: r.result ?? null,
  hasChemicalStep: hasChemicalStep((r.snapshot as Scenario).strategy),
});

/** What a batch is built from (rows from resolveParts, or the demo's literals). */
type Parts = {
  profile: { profile: Scenario['profile'] };
  field: { setting: Scenario['field'] };
  strategies: { id: string; name: string; steps: Scenario['strategy']['steps'] }[];
};
type Settings = Parameters<typeof snapshot>[3];

export type PlannedProjection = {
  label: string;
  role: ProjectionRow['role'];
  strategyId: string | null;
  scenario: Scenario;
  year: number | null;
};

/**
 * One launch of a scenario: one projection per strategy, the no-control baseline and,
 * when asked, the "let it seed" variant of one strategy — all with the same seed, so
 * their differences are the strategies' and not chance's.
 */
export function planBatch(
  parts: Parts,
  settings: Settings,
  seed: number,
  letItSeed?: LaunchBody['letItSeed'],
): PlannedProjection[] {
  const make = (name: string, steps: Scenario['strategy']['steps'], year?: number) =>
    snapshot(parts.profile.profile, parts.field.setting, { name, steps }, settings, seed, year);
  const planned: PlannedProjection[] = [
    ...parts.strategies.map((s) => ({
      label: s.name,
      role: 'strategy' as const,
      strategyId: s.id,
      scenario: make(s.name, s.steps),
      year: null,
    })),
    {
      label: noControl().name,
      role: 'baseline',
      strategyId: null,
      scenario: make(noControl().name, []),
      year: null,
    },
  ];
  if (letItSeed) {
    const s = parts.strategies.find((x) => x.id === letItSeed.strategyId);
    if (!s) {
      throw invalid('letItSeed.strategyId: not one of this scenario’s strategies', {
        'letItSeed.strategyId': 'Pick one of the strategies this scenario compares',
      });
    }
    if (letItSeed.year > settings.horizonYears) {
      const message = `Year ${letItSeed.year} is outside the horizon 1–${settings.horizonYears} (years)`;
      throw invalid(`letItSeed.year: ${message}`, { 'letItSeed.year': message });
    }
    const label = `${s.name} — seed set allowed in year ${letItSeed.year}`;
    planned.push({
      label,
      role: 'let-it-seed',
      strategyId: s.id,
      scenario: make(s.name, s.steps, letItSeed.year),
      year: letItSeed.year,
    });
  }
  return planned;
}

/** The rows that record a planned batch, queued. */
export function batchRows(
  planned: PlannedProjection[],
  ids: { workspaceId: string; scenarioId: string; batchId: string; userId: string | null },
  now: Date,
) {
  return planned.map((p) => ({
    id: randomUUID(),
    workspaceId: ids.workspaceId,
    scenarioId: ids.scenarioId,
    batchId: ids.batchId,
    strategyId: p.strategyId,
    label: p.label,
    role: p.role,
    letItSeedYear: p.year,
    snapshot: p.scenario,
    seed: p.scenario.seed,
    replicates: p.scenario.replicates,
    status: 'queued' as ProjectionRow['status'],
    replicatesDone: 0,
    createdBy: ids.userId,
    queuedAt: now,
  }));
}

export async function launch(
  db: Database,
  runner: ProjectionRunner,
  userId: string,
  workspaceId: string,
  scenarioId: string,
  body: LaunchBody,
): Promise<LaunchResponse> {
  await requireRole(db, userId, workspaceId, 'editor');
  const sc = await findScenario(db, workspaceId, scenarioId);
  if (!sc) throw notFound('Scenario');
  const planned = planBatch(
    await resolveParts(db, workspaceId, sc),
    sc,
    body.seed ?? sc.seed,
    body.letItSeed,
  );
  if (!runner.hasRoomFor(planned.length)) {
    throw rateLimited(30, `The projection queue is full (${runner.queued()} waiting); try again in a moment`);
  }
  const batchId = randomUUID();
  const rows = batchRows(planned, { workspaceId, scenarioId, batchId, userId }, new Date());
  await insertProjections(db, rows);
  runner.enqueue(rows.map((r) => r.id));
  return {
    batchId,
    projections: rows.map((r) => toListItem({ ...r, error: null, startedAt: null, finishedAt: null })),
  };
}

/**
 * Repeats a launch from its frozen inputs and seed — an exact reproduction, whatever has
 * been edited since — as a new batch.
 */
export async function rerunBatch(
  db: Database,
  runner: ProjectionRunner,
  userId: string,
  workspaceId: string,
  batchId: string,
): Promise<LaunchResponse> {
  await requireRole(db, userId, workspaceId, 'editor');
  const old = await listBatch(db, workspaceId, batchId);
  if (!old.length) throw notFound('Projection batch');
  if (!runner.hasRoomFor(old.length)) {
    throw rateLimited(30, `The projection queue is full (${runner.queued()} waiting); try again in a moment`);
  }
  const planned: PlannedProjection[] = old.map((r) => ({
    label: r.label,
    role: r.role,
    strategyId: r.strategyId,
    scenario: r.snapshot as Scenario,
    year: r.letItSeedYear,
  }));
  const newBatch = randomUUID();
  const rows = batchRows(
    planned,
    { workspaceId, scenarioId: old[0].scenarioId ?? '', batchId: newBatch, userId },
    new Date(),
  ).map((r) => ({ ...r, scenarioId: old[0].scenarioId }));
  await insertProjections(db, rows);
  runner.enqueue(rows.map((r) => r.id));
  return {
    batchId: newBatch,
    projections: rows.map((r) => toListItem({ ...r, error: null, startedAt: null, finishedAt: null })),
  };
}

export async function recentProjections(
  db: Database,
  userId: string,
  workspaceId: string,
  limit: number,
  scenarioId?: string,
) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const v = await visibilityFor(db, workspaceId, userId, role);
  const rows = await listProjections(db, workspaceId, v.all ? limit : 1000, scenarioId);
  return rows
    .filter((r) => canSee(v, 'batchIds', r.batchId))
    .slice(0, limit)
    .map(toListItem);
}

/** A projection the user may read: a viewer only those in comparisons shared with them. */
async function readable(db: Database, userId: string, workspaceId: string, id: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const row = await findProjection(db, workspaceId, id);
  if (!row || !canSee(await visibilityFor(db, workspaceId, userId, role), 'batchIds', row.batchId)) {
    throw notFound('Projection');
  }
  return row;
}

export async function getProjection(db: Database, userId: string, workspaceId: string, id: string) {
  return toView(await readable(db, userId, workspaceId, id));
}

export async function getBatch(db: Database, userId: string, workspaceId: string, batchId: string) {
  const { role } = await requireRole(db, userId, workspaceId, 'viewer');
  const rows = await listBatch(db, workspaceId, batchId);
  if (!rows.length || !canSee(await visibilityFor(db, workspaceId, userId, role), 'batchIds', batchId)) {
    throw notFound('Projection batch');
  }
  return rows.map(toView);
}

export async function cancelProjection(
  db: Database,
  runner: ProjectionRunner,
  userId: string,
  workspaceId: string,
  id: string,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const row = await findProjection(db, workspaceId, id);
  if (!row) throw notFound('Projection');
  if (row.status === 'queued' || row.status === 'running') await runner.cancel(id);
  return toView((await findProjection(db, workspaceId, id))!);
}

/** The frozen input of a projection the user may read, for re-running it per replicate. */
export async function projectionSnapshot(db: Database, userId: string, workspaceId: string, id: string) {
  return (await readable(db, userId, workspaceId, id)).snapshot as Scenario;
}
