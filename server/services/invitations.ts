import { randomUUID } from 'node:crypto';
import {
  INVITATION_DAYS,
  type AcceptedInvitation,
  type CreateInvitationBody,
  type InvitationLookup,
  type InvitationView,
} from '../../shared/api/invitations';
import type { Database, Executor } from '../db/client';
import {
  claimInvitation,
  findInvitationByHash,
  findOpenInvitation,
  findOpenInvitationForEmail,
  insertInvitation,
  listOpenInvitations,
  updateInvitation,
  type InvitationRow,
} from '../db/queries/invitations';
import { findUserByEmail, type UserRow } from '../db/queries/users';
import { findMembership, insertMembership, listMembers } from '../db/queries/workspaces';
import { invitationMail } from '../mail/templates';
import { requireRole } from './access';
import { audit } from './audit';
import { AppError, conflict, forbidden, gone, notFound } from './errors';
import { hashLinkToken, newLinkToken } from './link-tokens';
import { queueMail } from './mail';

const DAY_MS = 24 * 3600_000;

const stateOf = (r: InvitationRow, now: Date) =>
  r.revokedAt ? 'revoked' : r.acceptedAt ? 'accepted' : r.expiresAt <= now ? 'expired' : 'pending';

function toView(r: InvitationRow, inviterName: string | null, now = new Date()): InvitationView {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    invitedBy: r.invitedBy && inviterName ? { id: r.invitedBy, name: inviterName } : null,
    sentAt: r.sentAt.toISOString(),
    expiresAt: r.expiresAt.toISOString(),
    state: r.expiresAt <= now ? 'expired' : 'pending',
  };
}

/** A fresh secret and expiry, and the mail that carries the link (queued, not sent here). */
async function sendLink(
  db: Executor,
  row: Pick<InvitationRow, 'email' | 'role'>,
  names: { inviter: string; workspace: string },
  origin: string,
) {
  const { token, hash } = newLinkToken();
  const sentAt = new Date();
  const expiresAt = new Date(sentAt.getTime() + INVITATION_DAYS * DAY_MS);
  await queueMail(
    db,
    row.email,
    invitationMail({
      inviter: names.inviter,
      workspace: names.workspace,
      role: row.role,
      link: `${origin}/invitations/${token}`,
      expiresAt,
    }),
  );
  return { tokenHash: hash, sentAt, expiresAt };
}

export async function listInvitations(db: Database, actorId: string, workspaceId: string) {
  await requireRole(db, actorId, workspaceId, 'owner');
  const now = new Date();
  return (await listOpenInvitations(db, workspaceId)).map((r) => toView(r.invitation, r.inviterName, now));
}

/** Owners invite an address with a role; one open invitation per address and workspace. */
export async function invite(
  db: Database,
  actor: UserRow,
  workspaceId: string,
  body: CreateInvitationBody,
  origin: string,
  ip: string,
): Promise<InvitationView> {
  const workspace = await requireRole(db, actor.id, workspaceId, 'owner');
  const members = await listMembers(db, workspaceId);
  if (members.some((m) => m.email === body.email))
    throw conflict('That person is already a member of this workspace');
  if (await findOpenInvitationForEmail(db, workspaceId, body.email))
    throw conflict('That address already has an open invitation; send it again from the list instead');
  const row = { id: randomUUID(), workspaceId, email: body.email, role: body.role, invitedBy: actor.id };
  let created!: InvitationRow;
  await db.transaction(async (tx) => {
    const link = await sendLink(tx, row, { inviter: actor.name, workspace: workspace.name }, origin);
    created = {
      ...row,
      ...link,
      createdAt: link.sentAt,
      acceptedAt: null,
      acceptedBy: null,
      revokedAt: null,
    };
    await insertInvitation(tx, created);
  });
  await audit(
    db,
    'invitation_sent',
    { userId: actor.id, workspaceId, ip },
    { email: body.email, role: body.role },
  );
  return toView(created, actor.name);
}

/** A new link (the old one stops working) and a new expiry. */
export async function resendInvitation(
  db: Database,
  actor: UserRow,
  workspaceId: string,
  invitationId: string,
  origin: string,
  ip: string,
): Promise<InvitationView> {
  const workspace = await requireRole(db, actor.id, workspaceId, 'owner');
  const found = await findOpenInvitation(db, workspaceId, invitationId);
  if (!found) throw notFound('Invitation');
  let link!: Awaited<ReturnType<typeof sendLink>>;
  await db.transaction(async (tx) => {
    link = await sendLink(tx, found.invitation, { inviter: actor.name, workspace: workspace.name }, origin);
    await updateInvitation(tx, invitationId, link);
  });
  await audit(
    db,
    'invitation_resent',
    { userId: actor.id, workspaceId, ip },
    { email: found.invitation.email },
  );
  return toView({ ...found.invitation, ...link }, found.inviterName);
}

export async function revokeInvitation(
  db: Database,
  actorId: string,
  workspaceId: string,
  invitationId: string,
  ip: string,
) {
  await requireRole(db, actorId, workspaceId, 'owner');
  const found = await findOpenInvitation(db, workspaceId, invitationId);
  if (!found) throw notFound('Invitation');
  await updateInvitation(db, invitationId, { revokedAt: new Date() });
  await audit(
    db,
    'invitation_revoked',
    { userId: actorId, workspaceId, ip },
    { email: found.invitation.email },
  );
}

async function byToken(db: Executor, token: string) {
  const found = await findInvitationByHash(db, hashLinkToken(token));
  if (!found) {
    throw new AppError(
      404,
      'not_found',
      'This invitation link is not valid. It may be mistyped, or replaced by a newer invitation sent to you',
    );
  }
  return found;
}

/** What the link's page shows; any state but unknown, so the page can say what happened. */
export async function lookUpInvitation(db: Database, token: string): Promise<InvitationLookup> {
  const found = await byToken(db, token);
  const r = found.invitation;
  return {
    state: stateOf(r, new Date()),
    email: r.email,
    role: r.role,
    workspaceName: found.workspaceName,
    invitedBy: found.inviterName,
    expiresAt: r.expiresAt.toISOString(),
    accountExists: !!(await findUserByEmail(db, r.email)),
  };
}

const unusable = {
  expired: 'This invitation has expired; ask the person who invited you to send it again',
  accepted: 'This invitation has already been used; each link works once',
  revoked: 'This invitation was withdrawn by the workspace’s owners',
} as const;

/** The invitation behind a link that can still be used, or why it cannot. */
export async function usableInvitation(db: Executor, token: string) {
  const found = await byToken(db, token);
  const state = stateOf(found.invitation, new Date());
  if (state !== 'pending') throw gone(unusable[state]);
  return found.invitation;
}

/**
 * The link is bound to the address it was sent to, so a forwarded link does not let
 * someone else in; this is what the person is told when the addresses differ.
 */
export const wrongAddress = (invitation: InvitationRow) =>
  `This invitation was sent to ${invitation.email}; sign in or sign up with that address to accept it`;

/** Uses the invitation inside the caller's transaction; a member already keeps their role. */
export async function joinByInvitation(tx: Executor, invitation: InvitationRow, userId: string) {
  if (!(await claimInvitation(tx, invitation.id, userId, new Date()))) throw gone(unusable.accepted);
  if (!(await findMembership(tx, invitation.workspaceId, userId))) {
    await insertMembership(tx, {
      workspaceId: invitation.workspaceId,
      userId,
      role: invitation.role,
      createdAt: new Date(),
    });
  }
}

export async function acceptInvitation(
  db: Database,
  user: UserRow,
  token: string,
  ip: string,
): Promise<AcceptedInvitation> {
  const invitation = await usableInvitation(db, token);
  if (invitation.email !== user.email) throw forbidden(wrongAddress(invitation));
  await db.transaction((tx) => joinByInvitation(tx, invitation, user.id));
  await audit(db, 'invitation_accepted', { userId: user.id, workspaceId: invitation.workspaceId, ip });
  const m = (await findMembership(db, invitation.workspaceId, user.id))!;
  return { workspace: { id: invitation.workspaceId, name: m.name, personal: m.personal, role: m.role } };
}
