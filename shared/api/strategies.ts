import { z } from 'zod';
import { strategySchema } from '../scenario/schema';
import { idParam } from './workspaces';

/** A maximum rate the user copied from a product label for one crop; never a product default. */
export const recordedMaxRate = z.strictObject({
  activeIngredient: z.string().trim().min(1, 'Active ingredient is required').max(120),
  crop: z.string().trim().min(1, 'Crop is required').max(120),
  maxRate: z.number({ error: 'Maximum rate must be a number' }).positive('Maximum rate must be above 0'),
  rateUnit: z.string().trim().min(1, 'Rate unit is required').max(40),
});
export type RecordedMaxRate = z.infer<typeof recordedMaxRate>;

export const strategyBody = z.strictObject({
  strategy: strategySchema,
  description: z.string().max(2000, 'Description must be at most 2,000 characters').default(''),
  fieldId: idParam.nullable().default(null),
  maxRates: z.array(recordedMaxRate).max(50, 'At most 50 recorded maximum rates').default([]),
});
export type StrategyBody = z.infer<typeof strategyBody>;

export const strategyParams = z.strictObject({ workspaceId: idParam, strategyId: idParam });

export const rateWarning = z.object({ stepIndex: z.number(), message: z.string() });
export type RateWarning = z.infer<typeof rateWarning>;

export const strategyView = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  fieldId: z.string().nullable(),
  strategy: strategySchema,
  maxRates: z.array(recordedMaxRate),
  /** Steps whose entered rate exceeds a recorded maximum for the field's crop. */
  rateWarnings: z.array(rateWarning),
  hasChemicalStep: z.boolean(),
  updatedAt: z.string(),
});
export type StrategyView = z.infer<typeof strategyView>;
