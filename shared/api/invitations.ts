import { z } from 'zod';
import { emailSchema, roleSchema } from './auth';
import { idParam, workspaceView } from './workspaces';

/** How long an invitation link works after it is sent (or sent again). */
export const INVITATION_DAYS = 7;

/** The secret of an e-mailed link: 32 random bytes, base64url without padding (43 characters). */
export const linkToken = (what: string) =>
  z.string().regex(/^[A-Za-z0-9_-]{43}$/, `Not a valid ${what} link; copy the whole link from the e-mail`);

export const invitationTokenParams = z.strictObject({ token: linkToken('invitation') });
export const invitationParams = z.strictObject({ workspaceId: idParam, invitationId: idParam });

export const createInvitationBody = z.strictObject({ email: emailSchema, role: roleSchema });
export type CreateInvitationBody = z.infer<typeof createInvitationBody>;

/** An invitation not yet accepted or revoked, as its workspace's owners see it. */
export const invitationView = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  sentAt: z.string(),
  expiresAt: z.string(),
  state: z.enum(['pending', 'expired']),
});
export type InvitationView = z.infer<typeof invitationView>;

export const invitationStates = ['pending', 'expired', 'accepted', 'revoked'] as const;
export type InvitationState = (typeof invitationStates)[number];

/** What the holder of a link learns before signing up or accepting. */
export const invitationLookup = z.object({
  state: z.enum(invitationStates),
  email: z.string(),
  role: roleSchema,
  workspaceName: z.string(),
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
  /** Whether an account uses the invited address already: the page offers sign-in, not sign-up. */
  accountExists: z.boolean(),
});
export type InvitationLookup = z.infer<typeof invitationLookup>;

export const acceptedInvitation = z.object({ workspace: workspaceView });
export type AcceptedInvitation = z.infer<typeof acceptedInvitation>;
