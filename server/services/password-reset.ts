import { randomUUID } from 'node:crypto';
import { RESET_LINK_MINUTES, type PasswordResetLookup } from '../../shared/api/password-reset';
import type { Database } from '../db/client';
import {
  claimPasswordReset,
  findPasswordResetByHash,
  insertPasswordReset,
  voidPasswordResets,
} from '../db/queries/password-resets';
import { findUserByEmail, updateUser } from '../db/queries/users';
import { passwordResetMail } from '../mail/templates';
import { audit } from './audit';
import { AppError, gone } from './errors';
import { hashLinkToken, newLinkToken } from './link-tokens';
import { queueMail } from './mail';
import { hashPassword } from './passwords';

/** Said whether or not an account uses the address, so the answer reveals nothing. */
export const RESET_REQUESTED =
  'If a Seedwake account uses that address, a link to choose a new password is on its way. It works once, for 1 hour.';

/**
 * Makes a link and queues its mail when an account uses the address; nothing otherwise.
 * The route answers before calling this (OWASP Forgot Password cheat sheet: consistent
 * response time), so how long the lookup takes cannot tell an account apart.
 */
export async function requestPasswordReset(db: Database, email: string, origin: string, ip: string) {
  const user = await findUserByEmail(db, email);
  await audit(db, 'password_reset_requested', { userId: user?.id, ip }, { email });
  if (!user) return;
  const { token, hash } = newLinkToken();
  const now = new Date();
  await db.transaction(async (tx) => {
    await insertPasswordReset(tx, {
      id: randomUUID(),
      userId: user.id,
      tokenHash: hash,
      createdAt: now,
      expiresAt: new Date(now.getTime() + RESET_LINK_MINUTES * 60_000),
      usedAt: null,
    });
    await queueMail(
      tx,
      user.email,
      passwordResetMail({
        name: user.name,
        link: `${origin}/reset-password/${token}`,
        minutes: RESET_LINK_MINUTES,
      }),
    );
  });
}

async function byToken(db: Database, token: string) {
  const found = await findPasswordResetByHash(db, hashLinkToken(token));
  if (!found) {
    throw new AppError(
      404,
      'not_found',
      'This reset link is not valid; ask for a new one from the sign-in page',
    );
  }
  return found;
}

const stateOf = (r: { usedAt: Date | null; expiresAt: Date }, now: Date) =>
  r.usedAt ? 'used' : r.expiresAt <= now ? 'expired' : 'valid';

export async function lookUpPasswordReset(db: Database, token: string): Promise<PasswordResetLookup> {
  const { reset, email } = await byToken(db, token);
  return { state: stateOf(reset, new Date()), email, expiresAt: reset.expiresAt.toISOString() };
}

const unusable = {
  used: 'This reset link has already been used; each link works once. Ask for a new one if you need it',
  expired: 'This reset link has expired; ask for a new one from the sign-in page',
} as const;

/**
 * Sets the new password and ends every session of the user: sessions that began before
 * passwordChangedAt are void (services/auth.ts currentUser). The person then signs in
 * as usual (OWASP Forgot Password cheat sheet: do not sign them in automatically).
 */
export async function resetPassword(db: Database, token: string, newPassword: string, ip: string) {
  const { reset } = await byToken(db, token);
  const state = stateOf(reset, new Date());
  if (state !== 'valid') throw gone(unusable[state]);
  const passwordHash = await hashPassword(newPassword);
  const now = new Date();
  await db.transaction(async (tx) => {
    if (!(await claimPasswordReset(tx, reset.id, now))) throw gone(unusable.used);
    await voidPasswordResets(tx, reset.userId, now);
    await updateUser(tx, reset.userId, { passwordHash, passwordChangedAt: now });
  });
  await audit(db, 'password_reset', { userId: reset.userId, ip });
}
