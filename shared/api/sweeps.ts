// Request and response schemas of sensitivity sweeps (server routes, client, OpenAPI).
import { z } from 'zod';
import { outcomeKinds } from '../sweeps/outcomes';
import { sweepDesignSchema, sweepSpecShape } from '../sweeps/schema';
import { idParam } from './workspaces';

export const sweepBody = z.strictObject({
  name: z.string().trim().min(1, 'Name is required').max(120, 'Name must be at most 120 characters'),
  scenarioId: idParam,
  /** One of the scenario's strategies: the sweep varies that strategy's projection. */
  strategyId: idParam,
  ...sweepSpecShape,
});
export type SweepBody = z.infer<typeof sweepBody>;

export const sweepParams = z.strictObject({ workspaceId: idParam, sweepId: idParam });

export const sweepParametersQuery = z.strictObject({ scenarioId: idParam, strategyId: idParam });

export const sweepableParameterView = z.object({
  path: z.string(),
  key: z.string(),
  label: z.string(),
  meaning: z.string(),
  unit: z.string(),
  min: z.number(),
  max: z.number(),
  minExclusive: z.boolean(),
  integer: z.boolean(),
  base: z.number(),
});
export type SweepableParameterView = z.infer<typeof sweepableParameterView>;

export const sweepParametersView = z.object({
  horizonYears: z.number(),
  hasChemicalStep: z.boolean(),
  parameters: z.array(sweepableParameterView),
});
export type SweepParametersView = z.infer<typeof sweepParametersView>;

/** The size of a definition, without saving it: shown before launch. */
export const sweepPreview = z.object({
  points: z.number(),
  replicatesPerPoint: z.number(),
  horizonYears: z.number(),
  replicateYears: z.number(),
  /** The workspace limit on replicate-years. */
  limit: z.number(),
  /** From the measured engine speed and the worker threads; a guide, not a promise. */
  estimatedSeconds: z.number(),
});
export type SweepPreview = z.infer<typeof sweepPreview>;

export const sweepStatus = z.enum(['queued', 'running', 'paused', 'done', 'failed', 'cancelled']);
export type SweepStatus = z.infer<typeof sweepStatus>;

export const sweptParameterView = z.object({
  path: z.string(),
  label: z.string(),
  unit: z.string(),
  min: z.number(),
  max: z.number(),
  base: z.number(),
  integer: z.boolean(),
});
export type SweptParameterView = z.infer<typeof sweptParameterView>;

export const sweepView = z.object({
  id: z.string(),
  name: z.string(),
  scenarioId: z.string().nullable(),
  strategyId: z.string().nullable(),
  /** The strategy's name in the frozen base scenario. */
  strategyName: z.string(),
  parameters: z.array(sweptParameterView),
  design: sweepDesignSchema,
  outcomes: z.array(z.enum(outcomeKinds)),
  outcomeYear: z.number(),
  replicatesPerPoint: z.number(),
  horizonYears: z.number(),
  seed: z.number(),
  status: sweepStatus,
  totalPoints: z.number(),
  pointsDone: z.number(),
  failedPoints: z.number(),
  replicateYears: z.number(),
  /** Points per second over the last minute; null before any point is done or when nothing ran lately. */
  pointsPerSecond: z.number().nullable(),
  /** Remaining points at that rate; null when there is no rate. */
  secondsLeft: z.number().nullable(),
  hasChemicalStep: z.boolean(),
  error: z.string().nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type SweepView = z.infer<typeof sweepView>;

/** Sort keys of the points table: the point index, a parameter (p0, p1, …) or an outcome. */
export const pointSortKey = z
  .string()
  .regex(
    new RegExp(`^(index|p\\d{1,2}|${outcomeKinds.join('|')})$`),
    `Sort by index, a parameter (p0, p1, …) or an outcome (${outcomeKinds.join(', ')})`,
  );

export const sweepPointsQuery = z.strictObject({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  sort: pointSortKey.default('index'),
  order: z.enum(['asc', 'desc']).default('asc'),
  /** failed: only the points that could not be computed, with their error. */
  filter: z.enum(['all', 'failed']).default('all'),
});
export type SweepPointsQuery = z.infer<typeof sweepPointsQuery>;

export const sweepPointView = z.object({
  index: z.number(),
  /** Parameter values in the order of the sweep's parameters. */
  inputs: z.array(z.number()),
  outcomes: z.record(z.string(), z.number()).nullable(),
  error: z.string().nullable(),
});
export type SweepPointView = z.infer<typeof sweepPointView>;

export const sweepPointsPage = z.object({
  page: z.number(),
  pageSize: z.number(),
  /** Points finished so far that match the filter. */
  total: z.number(),
  points: z.array(sweepPointView),
});
export type SweepPointsPage = z.infer<typeof sweepPointsPage>;

export const sweepAnalysisQuery = z.strictObject({
  outcome: z.enum(outcomeKinds, { error: `Outcome must be one of ${outcomeKinds.join(', ')}` }).optional(),
});

const estimate = z.object({
  value: z.number().nullable(),
  low: z.number().nullable(),
  high: z.number().nullable(),
});

export const sweepAnalysis = z.object({
  outcome: z.enum(outcomeKinds),
  /** Points with a value for this outcome, and how many the design has. */
  pointsUsed: z.number(),
  totalPoints: z.number(),
  /** Why the design's own analysis is not available yet (too few points, a failed point). */
  pending: z.string().nullable(),
  tornado: z
    .object({
      baseOutcome: z.number(),
      bars: z.array(
        z.object({
          path: z.string(),
          low: z.number(),
          high: z.number(),
          outcomeAtLow: z.number(),
          outcomeAtHigh: z.number(),
          swing: z.number(),
        }),
      ),
    })
    .nullable(),
  prcc: z
    .array(
      z.object({
        path: z.string(),
        coefficient: z.number().nullable(),
        pValue: z.number().nullable(),
        degreesOfFreedom: z.number(),
      }),
    )
    .nullable(),
  sobol: z
    .object({
      baseSamples: z.number(),
      confidence: z.number(),
      bootstrapDraws: z.number(),
      variance: z.number(),
      indices: z.array(z.object({ path: z.string(), first: estimate, total: estimate })),
    })
    .nullable(),
  mainEffects: z
    .array(
      z.object({
        path: z.string(),
        levels: z.array(z.number()),
        means: z.array(z.number()),
        range: z.number(),
      }),
    )
    .nullable(),
  /** Outcome against each parameter; at most a few thousand points, evenly thinned by index. */
  scatter: z.object({
    index: z.array(z.number()),
    inputs: z.array(z.array(z.number())),
    outcome: z.array(z.number()),
    thinned: z.boolean(),
  }),
});
export type SweepAnalysis = z.infer<typeof sweepAnalysis>;

/**
 * results.json: the sweep, the frozen base scenario every point started from (with the
 * definition, enough to re-run it with `sim sweep`), and every finished point.
 */
export const sweepResults = z.object({
  sweep: sweepView,
  base: z.unknown(),
  points: z.array(sweepPointView),
});
export type SweepResults = z.infer<typeof sweepResults>;
