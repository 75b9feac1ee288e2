import { randomUUID } from 'node:crypto';
import type { AddMemberBody, MemberView, WorkspaceView } from '../../shared/api/workspaces';
import type { Role } from '../../shared/api/auth';
import type { Database } from '../db/client';
import { findUserByEmail } from '../db/queries/users';
import {
  countOwners,
  deleteMembership,
  findMembership,
  insertMembership,
  insertWorkspace,
  listMembers,
  listMembershipsOfUser,
  updateRole,
} from '../db/queries/workspaces';
import { requireRole } from './access';
import { audit } from './audit';
import { conflict, notFound } from './errors';

export async function listWorkspaces(db: Database, userId: string): Promise<WorkspaceView[]> {
  return listMembershipsOfUser(db, userId);
}

export async function createWorkspace(db: Database, userId: string, name: string): Promise<WorkspaceView> {
  const id = randomUUID();
  const now = new Date();
  await db.transaction(async (tx) => {
    await insertWorkspace(tx, { id, name, personal: false, createdAt: now });
    await insertMembership(tx, { workspaceId: id, userId, role: 'owner', createdAt: now });
  });
  return { id, name, personal: false, role: 'owner' };
}

export async function getWorkspace(
  db: Database,
  userId: string,
  workspaceId: string,
): Promise<WorkspaceView> {
  const m = await requireRole(db, userId, workspaceId, 'viewer');
  return { id: workspaceId, name: m.name, personal: m.personal, role: m.role };
}

export async function members(db: Database, userId: string, workspaceId: string): Promise<MemberView[]> {
  await requireRole(db, userId, workspaceId, 'viewer');
  const rows = await listMembers(db, workspaceId);
  return rows.map((r) => ({
    user: { id: r.id, email: r.email, name: r.name },
    role: r.role,
    joinedAt: r.joinedAt.toISOString(),
  }));
}

async function memberView(db: Database, workspaceId: string, userId: string) {
  const all = await listMembers(db, workspaceId);
  const r = all.find((m) => m.id === userId);
  if (!r) throw notFound('Member');
  return {
    user: { id: r.id, email: r.email, name: r.name },
    role: r.role,
    joinedAt: r.joinedAt.toISOString(),
  };
}

/** Owners add an existing account; e-mail invitations for new people come separately. */
export async function addMember(
  db: Database,
  actorId: string,
  workspaceId: string,
  body: AddMemberBody,
  ip: string,
) {
  await requireRole(db, actorId, workspaceId, 'owner');
  const user = await findUserByEmail(db, body.email);
  if (!user) throw notFound('An account with that e-mail');
  if (await findMembership(db, workspaceId, user.id))
    throw conflict('That person is already a member of this workspace');
  await insertMembership(db, { workspaceId, userId: user.id, role: body.role, createdAt: new Date() });
  await audit(db, 'member_added', { userId: actorId, workspaceId, ip }, { member: user.id, role: body.role });
  return memberView(db, workspaceId, user.id);
}

/** Refuses to demote or remove the last owner, so a workspace is never left unmanaged. */
async function guardLastOwner(db: Database, workspaceId: string, userId: string, newRole: Role | null) {
  const target = await findMembership(db, workspaceId, userId);
  if (!target) throw notFound('Member');
  if (target.role === 'owner' && newRole !== 'owner' && (await countOwners(db, workspaceId)) <= 1) {
    throw conflict('A workspace needs at least one owner; make someone else owner first');
  }
  return target;
}

export async function changeRole(
  db: Database,
  actorId: string,
  workspaceId: string,
  userId: string,
  role: Role,
  ip: string,
) {
  await requireRole(db, actorId, workspaceId, 'owner');
  const target = await guardLastOwner(db, workspaceId, userId, role);
  if (target.role !== role) {
    await updateRole(db, workspaceId, userId, role);
    await audit(
      db,
      'role_changed',
      { userId: actorId, workspaceId, ip },
      { member: userId, from: target.role, to: role },
    );
  }
  return memberView(db, workspaceId, userId);
}

export async function removeMember(
  db: Database,
  actorId: string,
  workspaceId: string,
  userId: string,
  ip: string,
) {
  await requireRole(db, actorId, workspaceId, 'owner');
  await guardLastOwner(db, workspaceId, userId, null);
  await deleteMembership(db, workspaceId, userId);
  await audit(db, 'member_removed', { userId: actorId, workspaceId, ip }, { member: userId });
}
