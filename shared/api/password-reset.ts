import { z } from 'zod';
import { emailSchema, passwordSchema } from './auth';
import { linkToken } from './invitations';

/** How long a reset link works. */
export const RESET_LINK_MINUTES = 60;

export const passwordResetRequestBody = z.strictObject({ email: emailSchema });
export type PasswordResetRequestBody = z.infer<typeof passwordResetRequestBody>;

/** The same answer whether or not an account uses the address. */
export const passwordResetRequested = z.object({ message: z.string() });
export type PasswordResetRequested = z.infer<typeof passwordResetRequested>;

export const passwordResetParams = z.strictObject({ token: linkToken('password reset') });

export const passwordResetLookup = z.object({
  state: z.enum(['valid', 'expired', 'used']),
  email: z.string(),
  expiresAt: z.string(),
});
export type PasswordResetLookup = z.infer<typeof passwordResetLookup>;

export const passwordResetBody = z.strictObject({ newPassword: passwordSchema });
export type PasswordResetBody = z.infer<typeof passwordResetBody>;
