import { z } from 'zod';
import { idParam } from './workspaces';

export const shareParams = z.strictObject({ workspaceId: idParam, batchId: idParam, userId: idParam });

export const shareView = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  sharedAt: z.string(),
});
export type ShareView = z.infer<typeof shareView>;

/** A comparison shared with the signed-in viewer, for their home page. */
export const sharedComparison = z.object({
  batchId: z.string(),
  scenarioId: z.string().nullable(),
  title: z.string(),
  strategies: z.array(z.string()),
  sharedAt: z.string(),
});
export type SharedComparison = z.infer<typeof sharedComparison>;

export const reportQuery = z.strictObject({
  units: z.enum(['metric', 'us'], { error: 'units must be metric or us' }).default('metric'),
});
