import { z } from 'zod';
import { profileSchema } from '../scenario/schema';
import { idParam } from './workspaces';

/** Where a parameter's value came from, by parameter path ("seedDecay.shallow": "our 2025 soil cores"). */
export const sourceNotesSchema = z
  .record(z.string().max(120), z.string().trim().max(500, 'A source note must be at most 500 characters'))
  .refine((r) => Object.keys(r).length <= 200, 'At most 200 source notes');

export const profileBody = z.strictObject({
  profile: profileSchema,
  sources: sourceNotesSchema.default({}),
});
export type ProfileBody = z.infer<typeof profileBody>;

export const profileParams = z.strictObject({ workspaceId: idParam, profileId: idParam });

export const profileView = z.object({
  id: z.string(),
  name: z.string(),
  builtIn: z.boolean(),
  profile: profileSchema,
  sources: z.record(z.string(), z.string()),
  copiedFrom: z.string().nullable(),
  updatedAt: z.string(),
});
export type ProfileView = z.infer<typeof profileView>;
