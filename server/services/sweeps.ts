// Sensitivity sweeps: defining and sizing them, launching them onto the durable queue,
// pausing, resuming and cancelling, and reading their progress, points and analyses.
import { randomUUID } from 'node:crypto';
import type {
  SweepAnalysis,
  SweepBody,
  SweepPointsQuery,
  SweepPreview,
  SweepView,
} from '../../shared/api/sweeps';
import type { Scenario } from '../../models/scenario/types';
import { designPoints } from '../../models/sensitivity/points';
import { hasChemicalStep } from '../../shared/scenario/cautions';
import { sweepCsv } from '../../shared/sweeps/csv';
import { outcomeKinds, type OutcomeKind } from '../../shared/sweeps/outcomes';
import { sweepableParameters } from '../../shared/sweeps/parameters';
import { planSweep, type SweepPlan } from '../../shared/sweeps/plan';
import type { SweepSettings } from '../config';
import type { Database } from '../db/client';
import { findScenario } from '../db/queries/scenarios';
import {
  allPoints,
  finishIfComplete,
  findSweep,
  insertSweep,
  listSweeps,
  pageOfPoints,
  pointOrderExpression,
  recentRate,
  setSweepStatus,
  type LightSweep,
} from '../db/queries/sweeps';
import type { SweepDefinition } from '../db/schema-sweeps';
import { analyseSweep } from '../sweeps/analysis';
import { chunkRanges } from '../sweeps/chunks';
import { estimatedSeconds } from '../sweeps/estimate';
import { requireRole } from './access';
import { conflict, invalid, notFound } from './errors';
import { resolveParts } from './scenarios';
import { snapshot } from './snapshots';

const iso = (d: Date | null) => (d ? d.toISOString() : null);
const grouped = (x: number) => x.toLocaleString('en-US');

/** The engine input of one strategy of a saved scenario, as a projection of it would run. */
async function baseScenario(db: Database, workspaceId: string, scenarioId: string, strategyId: string) {
  const sc = await findScenario(db, workspaceId, scenarioId);
  if (!sc) throw notFound('Scenario');
  if (!sc.strategyIds.includes(strategyId)) {
    throw invalid('strategyId: not one of this scenario’s strategies', {
      strategyId: 'Pick one of the strategies this scenario compares',
    });
  }
  const parts = await resolveParts(db, workspaceId, sc);
  const s = parts.strategies.find((x) => x.id === strategyId)!;
  return {
    scenario: sc,
    base: snapshot(parts.profile.profile, parts.field.setting, { name: s.name, steps: s.steps }, sc),
  };
}

async function toView(db: Database, r: LightSweep): Promise<SweepView> {
  const d = r.definition;
  let pointsPerSecond: number | null = null;
  let secondsLeft: number | null = null;
  if (r.status === 'running') {
    const rate = await recentRate(db, r.id);
    if (rate && rate.recent > 0 && rate.seconds > 0) {
      pointsPerSecond = rate.recent / rate.seconds;
      secondsLeft = Math.ceil((r.totalPoints - r.pointsDone) / pointsPerSecond);
    }
  }
  return {
    id: r.id,
    name: r.name,
    scenarioId: r.scenarioId,
    strategyId: r.strategyId,
    strategyName: r.base.strategy.name,
    parameters: d.parameters.map((p) => ({
      path: p.path,
      label: p.label,
      unit: p.unit,
      min: p.min,
      max: p.max,
      base: p.base,
      integer: p.integer ?? false,
    })),
    design: d.design,
    outcomes: d.outcomes,
    outcomeYear: d.outcomeYear,
    replicatesPerPoint: d.replicatesPerPoint,
    horizonYears: r.base.horizonYears,
    seed: d.seed,
    status: r.status,
    totalPoints: r.totalPoints,
    pointsDone: r.pointsDone,
    failedPoints: r.failedPoints,
    replicateYears: r.replicateYears,
    pointsPerSecond,
    secondsLeft,
    hasChemicalStep: hasChemicalStep(r.base.strategy),
    error: r.error,
    createdAt: r.createdAt.toISOString(),
    startedAt: iso(r.startedAt),
    finishedAt: iso(r.finishedAt),
  };
}

export async function sweepParameterList(
  db: Database,
  userId: string,
  workspaceId: string,
  scenarioId: string,
  strategyId: string,
) {
  await requireRole(db, userId, workspaceId, 'viewer');
  const { base } = await baseScenario(db, workspaceId, scenarioId, strategyId);
  return {
    horizonYears: base.horizonYears,
    hasChemicalStep: hasChemicalStep(base.strategy),
    parameters: sweepableParameters(base),
  };
}

/** The definition checked against its scenario and the workspace limits, or a 400 naming each problem. */
async function planned(db: Database, settings: SweepSettings, workspaceId: string, body: SweepBody) {
  const { base } = await baseScenario(db, workspaceId, body.scenarioId, body.strategyId);
  const result = planSweep(base, body);
  if (!result.ok) {
    const [first] = Object.entries(result.problems);
    throw invalid(`${first[0]}: ${first[1]}`, result.problems);
  }
  const plan = result.plan;
  const size = `${grouped(plan.points)} points × ${grouped(body.replicatesPerPoint)} replicates × ${grouped(base.horizonYears)} years = ${grouped(plan.replicateYears)} replicate-years`;
  if (plan.points > settings.maxPoints) {
    const message = `This sweep has ${grouped(plan.points)} points; a workspace may run at most ${grouped(settings.maxPoints)} points per sweep`;
    throw invalid(`size: ${message}`, { size: message });
  }
  if (plan.replicateYears > settings.maxReplicateYears) {
    const message = `This sweep is ${size}, over the workspace limit of ${grouped(settings.maxReplicateYears)} replicate-years; use fewer points, replicates or years`;
    throw invalid(`size: ${message}`, { size: message });
  }
  return { base, plan };
}

const preview = (
  settings: SweepSettings,
  base: Scenario,
  plan: SweepPlan,
  body: SweepBody,
): SweepPreview => ({
  points: plan.points,
  replicatesPerPoint: body.replicatesPerPoint,
  horizonYears: base.horizonYears,
  replicateYears: plan.replicateYears,
  limit: settings.maxReplicateYears,
  estimatedSeconds: estimatedSeconds(plan.replicateYears, settings.threads),
});

export async function previewSweep(
  db: Database,
  settings: SweepSettings,
  userId: string,
  workspaceId: string,
  body: SweepBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const { base, plan } = await planned(db, settings, workspaceId, body);
  return preview(settings, base, plan, body);
}

export async function launchSweep(
  db: Database,
  settings: SweepSettings,
  userId: string,
  workspaceId: string,
  body: SweepBody,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const { base, plan } = await planned(db, settings, workspaceId, body);
  const definition: SweepDefinition = {
    parameters: plan.parameters,
    design: body.design,
    outcomes: body.outcomes,
    outcomeYear: body.outcomeYear,
    replicatesPerPoint: body.replicatesPerPoint,
    seed: body.seed,
  };
  const points = designPoints(plan.parameters, body.design, body.seed);
  const ranges = chunkRanges(
    points.length,
    body.replicatesPerPoint * base.horizonYears,
    settings.chunkReplicateYears,
  );
  const id = randomUUID();
  await db.transaction(async (tx) => {
    await insertSweep(
      tx,
      {
        id,
        workspaceId,
        scenarioId: body.scenarioId,
        strategyId: body.strategyId,
        name: body.name,
        definition,
        base,
        points,
        totalPoints: points.length,
        totalChunks: ranges.length,
        replicateYears: plan.replicateYears,
        status: 'queued',
        createdBy: userId,
        createdAt: new Date(),
      },
      ranges.map(([first, end], i) => ({
        sweepId: id,
        chunkIndex: i,
        firstPoint: first,
        endPoint: end,
        status: 'pending' as const,
      })),
    );
  });
  return toView(db, (await findSweep(db, workspaceId, id))!);
}

export async function sweepList(db: Database, userId: string, workspaceId: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  const rows = await listSweeps(db, workspaceId);
  return Promise.all(rows.map((r) => toView(db, r)));
}

async function existing(db: Database, workspaceId: string, id: string) {
  const row = await findSweep(db, workspaceId, id);
  if (!row) throw notFound('Sweep');
  return row;
}

export async function getSweep(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  return toView(db, await existing(db, workspaceId, id));
}

const controls = {
  pause: { from: ['queued', 'running'], to: 'paused', verb: 'paused' },
  resume: { from: ['paused'], to: 'running', verb: 'resumed' },
  cancel: { from: ['queued', 'running', 'paused'], to: 'cancelled', verb: 'cancelled' },
} as const;

/**
 * Pause, resume or cancel: only the sweep's status changes. Worker loops read it at every
 * heartbeat and hand a chunk of a sweep that is no longer running back to the queue.
 */
export async function controlSweep(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  action: keyof typeof controls,
) {
  await requireRole(db, userId, workspaceId, 'editor');
  const row = await existing(db, workspaceId, id);
  const c = controls[action];
  const moved = await setSweepStatus(db, id, c.from, c.to, action === 'cancel');
  if (!moved) throw conflict(`A ${row.status} sweep cannot be ${c.verb}`);
  if (action === 'resume') await finishIfComplete(db, id);
  return toView(db, await existing(db, workspaceId, id));
}

export async function sweepPoints(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  q: SweepPointsQuery,
) {
  await requireRole(db, userId, workspaceId, 'viewer');
  const row = await existing(db, workspaceId, id);
  const k = row.definition.parameters.length;
  const parameter = /^p(\d+)$/.exec(q.sort);
  if (parameter && Number(parameter[1]) >= k) {
    const message = `This sweep varies ${k} parameter${k === 1 ? '' : 's'} (p0–p${k - 1})`;
    throw invalid(`sort: ${message}`, { sort: message });
  }
  if (
    (outcomeKinds as readonly string[]).includes(q.sort) &&
    !row.definition.outcomes.includes(q.sort as OutcomeKind)
  ) {
    const message = `This sweep does not record ${q.sort}; it records ${row.definition.outcomes.join(', ')}`;
    throw invalid(`sort: ${message}`, { sort: message });
  }
  const { rows, total } = await pageOfPoints(db, id, {
    order: { by: pointOrderExpression(q.sort), descending: q.order === 'desc' },
    failedOnly: q.filter === 'failed',
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  return { page: q.page, pageSize: q.pageSize, total, points: rows };
}

export async function sweepAnalysis(
  db: Database,
  userId: string,
  workspaceId: string,
  id: string,
  outcome: OutcomeKind | undefined,
): Promise<SweepAnalysis> {
  await requireRole(db, userId, workspaceId, 'viewer');
  const row = await existing(db, workspaceId, id);
  const chosen = outcome ?? row.definition.outcomes[0];
  if (!row.definition.outcomes.includes(chosen)) {
    const message = `This sweep does not record ${chosen}; it records ${row.definition.outcomes.join(', ')}`;
    throw invalid(`outcome: ${message}`, { outcome: message });
  }
  return analyseSweep(row.definition, row.totalPoints, await allPoints(db, id), chosen);
}

/** Every finished point with the sweep's view, for results.json and results.csv. */
export async function sweepResults(db: Database, userId: string, workspaceId: string, id: string) {
  await requireRole(db, userId, workspaceId, 'viewer');
  const row = await existing(db, workspaceId, id);
  return { sweep: await toView(db, row), base: row.base, points: await allPoints(db, id) };
}

export function resultsCsv(results: Awaited<ReturnType<typeof sweepResults>>) {
  return sweepCsv(results.sweep, results.points);
}
