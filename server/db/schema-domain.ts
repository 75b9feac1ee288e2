// Domain tables: species profiles, fields, strategies, scenarios and projections, all
// scoped to a workspace. The engine's inputs are kept as JSON documents validated by the
// schemas in shared/scenario, so a table never disagrees with what the engine reads.
import {
  boolean,
  char,
  datetime,
  double,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  varchar,
  text,
} from 'drizzle-orm/mysql-core';
import type { FieldSetting, SpeciesProfile, Step } from '../../models/scenario/types';
import { jsonColumn } from './json-column';
import { users, workspaces } from './schema';

const id = (name = 'id') => char(name, { length: 36 });
const workspaceRef = () =>
  id('workspace_id')
    .notNull()
    .references(() => workspaces.id, { onDelete: 'cascade' });
const stamps = {
  createdAt: datetime('created_at', { fsp: 3 }).notNull(),
  updatedAt: datetime('updated_at', { fsp: 3 }).notNull(),
};

/** Source note per parameter path, e.g. { "seedDecay.shallow": "from our 2025 soil cores" }. */
export type SourceNotes = Record<string, string>;

export const speciesProfiles = mysqlTable(
  'species_profiles',
  {
    id: id().primaryKey(),
    /** Null for the built-in (invented, illustrative) profiles every workspace can copy. */
    workspaceId: id('workspace_id').references(() => workspaces.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 120 }).notNull(),
    builtIn: boolean('built_in').notNull().default(false),
    profile: jsonColumn<SpeciesProfile>('profile').notNull(),
    sources: jsonColumn<SourceNotes>('sources').notNull(),
    copiedFrom: id('copied_from'),
    ...stamps,
  },
  (t) => [index('profiles_workspace').on(t.workspaceId, t.name)],
);

export const fields = mysqlTable(
  'fields',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    name: varchar('name', { length: 120 }).notNull(),
    crop: varchar('crop', { length: 120 }).notNull(),
    plantingYear: int('planting_year'),
    notes: text('notes').notNull(),
    setting: jsonColumn<FieldSetting>('setting').notNull(),
    ...stamps,
  },
  (t) => [index('fields_workspace').on(t.workspaceId, t.name)],
);

/** A per-crop maximum rate the user recorded from a label, to warn when a step exceeds it. */
export type RecordedMaxRate = { activeIngredient: string; crop: string; maxRate: number; rateUnit: string };

export const strategies = mysqlTable(
  'strategies',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    fieldId: id('field_id').references(() => fields.id, { onDelete: 'set null' }),
    name: varchar('name', { length: 120 }).notNull(),
    description: text('description').notNull(),
    steps: jsonColumn<Step[]>('steps').notNull(),
    maxRates: jsonColumn<RecordedMaxRate[]>('max_rates').notNull(),
    ...stamps,
  },
  (t) => [index('strategies_workspace').on(t.workspaceId, t.name)],
);

export const scenarios = mysqlTable(
  'scenarios',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    name: varchar('name', { length: 120 }).notNull(),
    fieldId: id('field_id')
      .notNull()
      .references(() => fields.id, { onDelete: 'cascade' }),
    profileId: id('profile_id')
      .notNull()
      .references(() => speciesProfiles.id, { onDelete: 'restrict' }),
    strategyIds: jsonColumn<string[]>('strategy_ids').notNull(),
    horizonYears: int('horizon_years').notNull(),
    replicates: int('replicates').notNull(),
    seed: int('seed', { unsigned: true }).notNull(),
    efficacyDraw: mysqlEnum('efficacy_draw', ['per-replicate', 'per-application']).notNull(),
    depletionThreshold: double('depletion_threshold').notNull(),
    discountRate: double('discount_rate').notNull(),
    ...stamps,
  },
  (t) => [index('scenarios_workspace').on(t.workspaceId, t.updatedAt)],
);

export const projectionStatuses = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;

export const projections = mysqlTable(
  'projections',
  {
    id: id().primaryKey(),
    workspaceId: workspaceRef(),
    scenarioId: id('scenario_id').references(() => scenarios.id, { onDelete: 'set null' }),
    /** One launch of a scenario makes one projection per strategy, grouped by batch. */
    batchId: id('batch_id').notNull(),
    strategyId: id('strategy_id'),
    label: varchar('label', { length: 200 }).notNull(),
    role: mysqlEnum('role', ['strategy', 'baseline', 'let-it-seed']).notNull(),
    letItSeedYear: int('let_it_seed_year'),
    /** The exact engine input (a full Scenario), frozen at launch. */
    snapshot: jsonColumn<unknown>('snapshot').notNull(),
    seed: int('seed', { unsigned: true }).notNull(),
    replicates: int('replicates').notNull(),
    status: mysqlEnum('status', projectionStatuses).notNull(),
    replicatesDone: int('replicates_done').notNull().default(0),
    error: text('error'),
    result: jsonColumn<unknown>('result'),
    createdBy: id('created_by').references(() => users.id, { onDelete: 'set null' }),
    queuedAt: datetime('queued_at', { fsp: 3 }).notNull(),
    startedAt: datetime('started_at', { fsp: 3 }),
    finishedAt: datetime('finished_at', { fsp: 3 }),
  },
  (t) => [
    index('projections_workspace').on(t.workspaceId, t.queuedAt),
    index('projections_batch').on(t.batchId),
    index('projections_status').on(t.status),
  ],
);
