import { z } from 'zod';
import { idParam } from './workspaces';

export const projectionStatus = z.enum(['queued', 'running', 'done', 'failed', 'cancelled']);
export type ProjectionStatus = z.infer<typeof projectionStatus>;

export const projectionParams = z.strictObject({ workspaceId: idParam, projectionId: idParam });
export const batchParams = z.strictObject({ workspaceId: idParam, batchId: idParam });

export const listProjectionsQuery = z.strictObject({
  limit: z.coerce.number().int().min(1).max(100).default(20),
  scenarioId: idParam.optional(),
});

/** A projection without its (large) result, for lists and progress polling. */
export const projectionListItem = z.object({
  id: z.string(),
  batchId: z.string(),
  scenarioId: z.string().nullable(),
  strategyId: z.string().nullable(),
  label: z.string(),
  /** baseline: the no-control reference every batch carries; letItSeed: the priced missed year. */
  role: z.enum(['strategy', 'baseline', 'let-it-seed']),
  seed: z.number(),
  status: projectionStatus,
  replicates: z.number(),
  replicatesDone: z.number(),
  error: z.string().nullable(),
  queuedAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type ProjectionListItem = z.infer<typeof projectionListItem>;

/** A projection with its frozen input and, once done, its result (summary, mean field, matrix view). */
export const projectionView = projectionListItem.extend({
  letItSeedYear: z.number().nullable(),
  snapshot: z.unknown(),
  result: z.unknown().nullable(),
  hasChemicalStep: z.boolean(),
});
export type ProjectionView = z.infer<typeof projectionView>;

export const launchResponse = z.object({ batchId: z.string(), projections: z.array(projectionListItem) });
export type LaunchResponse = z.infer<typeof launchResponse>;
