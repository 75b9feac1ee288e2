import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import type { Executor } from '../client';
import { invitations } from '../schema-invitations';
import { users, workspaces } from '../schema';

export type InvitationRow = typeof invitations.$inferSelect;

export async function insertInvitation(db: Executor, row: typeof invitations.$inferInsert) {
  await db.insert(invitations).values(row);
}

const withInviter = {
  invitation: invitations,
  inviterName: users.name,
};

/** Invitations neither accepted nor revoked (expired ones too, so they can be sent again). */
export function listOpenInvitations(db: Executor, workspaceId: string) {
  return db
    .select(withInviter)
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(
      and(
        eq(invitations.workspaceId, workspaceId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .orderBy(asc(invitations.email));
}

export async function findOpenInvitation(db: Executor, workspaceId: string, id: string) {
  const [row] = await db
    .select(withInviter)
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(
      and(
        eq(invitations.id, id),
        eq(invitations.workspaceId, workspaceId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    );
  return row;
}

export async function findOpenInvitationForEmail(db: Executor, workspaceId: string, email: string) {
  const [row] = await db
    .select({ id: invitations.id })
    .from(invitations)
    .where(
      and(
        eq(invitations.workspaceId, workspaceId),
        eq(invitations.email, email),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    );
  return row;
}

/** The invitation behind a link, with what its page shows. */
export async function findInvitationByHash(db: Executor, tokenHash: string) {
  const [row] = await db
    .select({ ...withInviter, workspaceName: workspaces.name })
    .from(invitations)
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash));
  return row;
}

export async function updateInvitation(
  db: Executor,
  id: string,
  patch: Partial<typeof invitations.$inferInsert>,
) {
  await db.update(invitations).set(patch).where(eq(invitations.id, id));
}

/**
 * Marks the invitation used, only if it still can be: of two acceptances racing for one
 * link, exactly one changes the row.
 */
export async function claimInvitation(db: Executor, id: string, userId: string, now: Date) {
  const [result] = await db
    .update(invitations)
    .set({ acceptedAt: now, acceptedBy: userId })
    .where(
      and(
        eq(invitations.id, id),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, now),
      ),
    );
  return result.affectedRows === 1;
}
