import { z } from 'zod';
import { roleSchema } from './auth';
import { idParam } from './workspaces';

/** Personal API tokens let an analyst's script call the API without a browser session. */
export const createTokenBody = z.strictObject({
  name: z
    .string()
    .trim()
    .min(1, 'Name the token, e.g. "sweep script"')
    .max(80, 'Name must be at most 80 characters'),
  workspaceId: idParam,
  /** No higher than the user's own role in the workspace; checked on the server. */
  role: roleSchema,
});
export type CreateTokenBody = z.infer<typeof createTokenBody>;

export const tokenParams = z.strictObject({ tokenId: idParam });

export const tokenView = z.object({
  id: z.string(),
  name: z.string(),
  workspaceId: z.string(),
  workspaceName: z.string(),
  role: roleSchema,
  /** The first characters, to tell tokens apart; the secret itself is shown once. */
  prefix: z.string(),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
});
export type TokenView = z.infer<typeof tokenView>;

/** Only the creation answer carries the secret; it is stored hashed. */
export const createdToken = tokenView.extend({ token: z.string() });
export type CreatedToken = z.infer<typeof createdToken>;
