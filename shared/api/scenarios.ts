import { z } from 'zod';
import { numberField } from '../scenario/fields';
import { idParam } from './workspaces';

export const scenarioBody = z.strictObject({
  name: z.string().trim().min(1, 'Name is required').max(120, 'Name must be at most 120 characters'),
  fieldId: idParam,
  profileId: idParam,
  strategyIds: z
    .array(idParam)
    .min(1, 'Pick at least one strategy')
    .max(6, 'Compare at most 6 strategies')
    .refine((ids) => new Set(ids).size === ids.length, 'A strategy is listed twice'),
  horizonYears: numberField('horizonYears'),
  replicates: numberField('replicates'),
  seed: numberField('seed'),
  efficacyDraw: z.enum(['per-replicate', 'per-application'], {
    error: 'Efficacy draw must be per-replicate or per-application',
  }),
  depletionThreshold: numberField('depletionThreshold'),
  discountRate: numberField('discountRate'),
});
export type ScenarioBody = z.infer<typeof scenarioBody>;

export const scenarioParams = z.strictObject({ workspaceId: idParam, scenarioId: idParam });

export const scenarioView = scenarioBody.extend({ id: z.string(), updatedAt: z.string() });
export type ScenarioView = z.infer<typeof scenarioView>;

/** POST …/scenarios/:id/runs. A re-run passes the seed of the run it repeats. */
export const launchBody = z.strictObject({
  seed: numberField('seed').optional(),
  /** "Let it seed": one strategy again, with its seed-set steps skipped in one year, to price that year. */
  letItSeed: z
    .strictObject({
      strategyId: idParam,
      year: z
        .number({ error: 'Year must be a number' })
        .int('Year must be a whole number')
        .min(1, 'Year must be 1 or later'),
    })
    .optional(),
});
export type LaunchBody = z.infer<typeof launchBody>;
