import { z } from 'zod';

// Shared by the server (validation at the boundary) and the client (form types and
// client-side hints). Messages are written for the person filling the form.

export const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail must be at most 254 characters')
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

/** OWASP ASVS 2.1: at least 12 characters, no composition rules, a generous maximum. */
export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(12, 'Password must be at least 12 characters')
  .max(256, 'Password must be at most 256 characters');

export const displayNameSchema = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(120, 'Name must be at most 120 characters');

export const signUpBody = z.strictObject({
  email: emailSchema,
  password: passwordSchema,
  name: displayNameSchema,
  invitationToken: z.string().max(200).optional(),
});
export type SignUpBody = z.infer<typeof signUpBody>;

export const signInBody = z.strictObject({
  email: emailSchema,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(256),
});
export type SignInBody = z.infer<typeof signInBody>;

export const changePasswordBody = z.strictObject({
  currentPassword: z.string().min(1, 'Current password is required').max(256),
  newPassword: passwordSchema,
});
export type ChangePasswordBody = z.infer<typeof changePasswordBody>;

export const updateAccountBody = z.strictObject({ name: displayNameSchema });
export type UpdateAccountBody = z.infer<typeof updateAccountBody>;

export const roles = ['owner', 'editor', 'viewer'] as const;
export const roleSchema = z.enum(roles, { error: 'Role must be owner, editor or viewer' });
export type Role = z.infer<typeof roleSchema>;

export const userView = z.object({ id: z.string(), email: z.string(), name: z.string() });
export type UserView = z.infer<typeof userView>;

export const membershipView = z.object({
  workspace: z.object({ id: z.string(), name: z.string(), personal: z.boolean() }),
  role: roleSchema,
});
export type MembershipView = z.infer<typeof membershipView>;

/** GET /api/auth/me, and the body of a successful sign-in or sign-up. */
export const sessionView = z.object({ user: userView, memberships: z.array(membershipView) });
export type SessionView = z.infer<typeof sessionView>;
