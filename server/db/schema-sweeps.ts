// Sensitivity sweeps and their durable work queue. A sweep freezes its base scenario and its
// design points at launch; the points are cut into chunks that worker loops (in the web
// server and in `npm run worker` processes, on any machine with the DATABASE_URL) claim
// under a lease. Results are keyed by (sweep, point), so a retried chunk can never store a
// point twice; every claim is logged, so who computed what can be checked afterwards.
import {
  bigint,
  char,
  datetime,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  text,
  varchar,
} from 'drizzle-orm/mysql-core';
import type { Scenario } from '../../models/scenario/types';
import type { SweepDesign } from '../../models/sensitivity/design';
import type { OutcomeKind } from '../../shared/sweeps/outcomes';
import type { SweptParameter } from '../../shared/sweeps/plan';
import { jsonColumn } from './json-column';
import { scenarios, strategies } from './schema-domain';
import { users, workspaces } from './schema';

const id = (name = 'id') => char(name, { length: 36 });
const at = (name: string) => datetime(name, { fsp: 3 });

/** What a sweep varies and records, with each parameter resolved against the base scenario. */
export type SweepDefinition = {
  parameters: SweptParameter[];
  design: SweepDesign;
  outcomes: OutcomeKind[];
  outcomeYear: number;
  replicatesPerPoint: number;
  seed: number;
};

export const sweepStatuses = ['queued', 'running', 'paused', 'done', 'failed', 'cancelled'] as const;

export const sweeps = mysqlTable(
  'sweeps',
  {
    id: id().primaryKey(),
    workspaceId: id('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    scenarioId: id('scenario_id').references(() => scenarios.id, { onDelete: 'set null' }),
    strategyId: id('strategy_id').references(() => strategies.id, { onDelete: 'set null' }),
    name: varchar('name', { length: 120 }).notNull(),
    definition: jsonColumn<SweepDefinition>('definition').notNull(),
    /** The engine input every point starts from, frozen at launch. */
    base: jsonColumn<Scenario>('base').notNull(),
    /** Design rows: points[i] holds point i's parameter values in the definition's order. */
    points: jsonColumn<number[][]>('points').notNull(),
    totalPoints: int('total_points').notNull(),
    totalChunks: int('total_chunks').notNull(),
    replicateYears: bigint('replicate_years', { mode: 'number', unsigned: true }).notNull(),
    pointsDone: int('points_done').notNull().default(0),
    failedPoints: int('failed_points').notNull().default(0),
    chunksDone: int('chunks_done').notNull().default(0),
    status: mysqlEnum('status', sweepStatuses).notNull(),
    error: text('error'),
    createdBy: id('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: at('created_at').notNull(),
    startedAt: at('started_at'),
    finishedAt: at('finished_at'),
  },
  (t) => [index('sweeps_workspace').on(t.workspaceId, t.createdAt), index('sweeps_status').on(t.status)],
);

export const sweepChunks = mysqlTable(
  'sweep_chunks',
  {
    sweepId: id('sweep_id')
      .notNull()
      .references(() => sweeps.id, { onDelete: 'cascade' }),
    chunkIndex: int('chunk_index').notNull(),
    /** Points [firstPoint, endPoint). */
    firstPoint: int('first_point').notNull(),
    endPoint: int('end_point').notNull(),
    status: mysqlEnum('status', ['pending', 'claimed', 'done']).notNull(),
    workerId: varchar('worker_id', { length: 120 }),
    leaseExpiresAt: at('lease_expires_at'),
    heartbeatAt: at('heartbeat_at'),
    attempts: int('attempts').notNull().default(0),
    /** The error of the last try that failed, kept for the sweep's message if the chunk gives up. */
    lastError: text('last_error'),
    completedAt: at('completed_at'),
  },
  (t) => [
    primaryKey({ columns: [t.sweepId, t.chunkIndex] }),
    index('sweep_chunks_claimable').on(t.status, t.leaseExpiresAt),
  ],
);

export const sweepResults = mysqlTable(
  'sweep_results',
  {
    sweepId: id('sweep_id')
      .notNull()
      .references(() => sweeps.id, { onDelete: 'cascade' }),
    pointIndex: int('point_index').notNull(),
    /** The point's parameter values (a copy of its design row, for sorting and export). */
    inputs: jsonColumn<number[]>('inputs').notNull(),
    /** Outcome values by kind; null when the point failed. */
    outcomes: jsonColumn<Partial<Record<OutcomeKind, number>>>('outcomes'),
    error: text('error'),
    createdAt: at('created_at').notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.sweepId, t.pointIndex] }),
    index('sweep_results_recent').on(t.sweepId, t.createdAt),
  ],
);

/** One row per claim of a chunk: who held it, whom it was taken from, and how the claim ended. */
export const sweepClaims = mysqlTable(
  'sweep_claims',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    sweepId: id('sweep_id')
      .notNull()
      .references(() => sweeps.id, { onDelete: 'cascade' }),
    chunkIndex: int('chunk_index').notNull(),
    workerId: varchar('worker_id', { length: 120 }).notNull(),
    claimedAt: at('claimed_at').notNull(),
    /** Set when the chunk was taken over from a worker whose lease had run out. */
    previousWorkerId: varchar('previous_worker_id', { length: 120 }),
    previousLeaseExpiresAt: at('previous_lease_expires_at'),
    finishedAt: at('finished_at'),
    /** completed: results stored; released: handed back (pause, cancel, stop); lost: another worker held it by then. */
    outcome: mysqlEnum('outcome', ['completed', 'released', 'lost']),
  },
  (t) => [index('sweep_claims_chunk').on(t.sweepId, t.chunkIndex)],
);
