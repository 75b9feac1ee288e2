import { randomUUID } from 'node:crypto';
import type { SessionView, SignInBody, SignUpBody, ChangePasswordBody } from '../../shared/api/auth';
import type { Database } from '../db/client';
import { findUserByEmail, findUserById, insertUser, updateUser, type UserRow } from '../db/queries/users';
import { insertMembership, insertWorkspace, listMembershipsOfUser } from '../db/queries/workspaces';
import { audit } from './audit';
import { conflict, invalid, unauthenticated } from './errors';
import { joinByInvitation, usableInvitation, wrongAddress } from './invitations';
import { hashPassword, timingDummyHash, verifyPassword } from './passwords';
import type { SignInLimiter } from './rate-limits';

const GENERIC_FAILURE = 'E-mail or password is incorrect';

export async function sessionViewOf(db: Database, user: UserRow): Promise<SessionView> {
  const rows = await listMembershipsOfUser(db, user.id);
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships: rows.map((r) => ({
      workspace: { id: r.id, name: r.name, personal: r.personal },
      role: r.role,
    })),
  };
}

/**
 * Creates the user and a personal workspace the user owns; with an invitation's secret,
 * the new account also joins the inviting workspace and the invitation is used up.
 */
export async function signUp(db: Database, body: SignUpBody, ip: string) {
  if (await findUserByEmail(db, body.email)) {
    throw conflict('An account with this e-mail already exists; sign in instead');
  }
  const invitation = body.invitationToken ? await usableInvitation(db, body.invitationToken) : undefined;
  if (invitation && invitation.email !== body.email) {
    throw invalid(wrongAddress(invitation), { email: wrongAddress(invitation) });
  }
  const now = new Date();
  const user = {
    id: randomUUID(),
    email: body.email,
    name: body.name,
    passwordHash: await hashPassword(body.password),
    createdAt: now,
    passwordChangedAt: now,
  };
  const workspaceId = randomUUID();
  await db.transaction(async (tx) => {
    await insertUser(tx, user);
    await insertWorkspace(tx, {
      id: workspaceId,
      name: `${body.name}'s workspace`,
      personal: true,
      createdAt: now,
    });
    await insertMembership(tx, { workspaceId, userId: user.id, role: 'owner', createdAt: now });
    if (invitation) await joinByInvitation(tx, invitation, user.id);
  });
  await audit(db, 'sign_up', { userId: user.id, ip });
  if (invitation) {
    await audit(db, 'invitation_accepted', { userId: user.id, workspaceId: invitation.workspaceId, ip });
  }
  return user;
}

/** Same answer and similar time for an unknown account and a wrong password. */
export async function signIn(db: Database, limiter: SignInLimiter, body: SignInBody, ip: string) {
  try {
    await limiter.check(body.email, ip);
  } catch (err) {
    await audit(db, 'sign_in_rate_limited', { ip }, { email: body.email });
    throw err;
  }
  const user = await findUserByEmail(db, body.email);
  const ok = await verifyPassword(user?.passwordHash ?? (await timingDummyHash()), body.password);
  if (!user || !ok) {
    await limiter.fail(body.email, ip);
    await audit(db, 'sign_in_failed', { userId: user?.id, ip }, { email: body.email });
    throw unauthenticated(GENERIC_FAILURE);
  }
  await limiter.succeed(body.email);
  await audit(db, 'sign_in', { userId: user.id, ip });
  return user;
}

/** The signed-in user, or undefined when the session is absent or predates a password change. */
export async function currentUser(db: Database, userId: string | undefined, authAt: number | undefined) {
  if (!userId) return undefined;
  const user = await findUserById(db, userId);
  if (!user || (authAt ?? 0) < user.passwordChangedAt.getTime()) return undefined;
  return user;
}

export async function changePassword(db: Database, user: UserRow, body: ChangePasswordBody, ip: string) {
  if (!(await verifyPassword(user.passwordHash, body.currentPassword))) {
    throw invalid('The current password is not right', {
      currentPassword: 'The current password is not right',
    });
  }
  const changedAt = new Date();
  await updateUser(db, user.id, {
    passwordHash: await hashPassword(body.newPassword),
    passwordChangedAt: changedAt,
  });
  await audit(db, 'password_changed', { userId: user.id, ip });
  return changedAt;
}

export async function rename(db: Database, user: UserRow, name: string) {
  await updateUser(db, user.id, { name });
  return { id: user.id, email: user.email, name };
}
