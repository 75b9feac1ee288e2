import type { z } from 'zod';
import { zodFieldErrors, type FieldErrors } from './forms';

type WithRepeat = Record<string, string> & { newPassword: string; repeatPassword: string };

export type CheckedPassword<T> = { ok: true; body: T } | { ok: false; errors: FieldErrors };

/**
 * Checks a form that asks for a new password twice: the body (everything but the repeat)
 * against `schema`, and the repeat against the new password.
 */
export function checkNewPassword<T>(schema: z.ZodType<T>, values: WithRepeat): CheckedPassword<T> {
  const { repeatPassword, ...body } = values;
  const parsed = schema.safeParse(body);
  const errors: FieldErrors = parsed.success ? {} : zodFieldErrors(parsed.error);
  // Checked here only: a typo in a password nobody can see would lock the person out.
  if (repeatPassword !== body.newPassword) errors.repeatPassword = 'The two new passwords are not the same';
  if (!parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}
