import { and, asc, count, eq } from 'drizzle-orm';
import type { Executor as Database } from '../client';
import { memberships, users, workspaces } from '../schema';
import type { Role } from '../../../shared/api/auth';

export async function insertWorkspace(db: Database, row: typeof workspaces.$inferInsert) {
  await db.insert(workspaces).values(row);
}

export async function insertMembership(db: Database, row: typeof memberships.$inferInsert) {
  await db.insert(memberships).values(row);
}

export function listMembershipsOfUser(db: Database, userId: string) {
  return db
    .select({
      id: workspaces.id,
      name: workspaces.name,
      personal: workspaces.personal,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(workspaces.personal), asc(workspaces.name));
}

export async function findMembership(db: Database, workspaceId: string, userId: string) {
  const [row] = await db
    .select({ role: memberships.role, name: workspaces.name, personal: workspaces.personal })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)))
    .limit(1);
  return row;
}

export function listMembers(db: Database, workspaceId: string) {
  return db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(asc(users.name));
}

export async function updateRole(db: Database, workspaceId: string, userId: string, role: Role) {
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
}

export async function deleteMembership(db: Database, workspaceId: string, userId: string) {
  await db
    .delete(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
}

export async function countOwners(db: Database, workspaceId: string) {
  const [row] = await db
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')));
  return row?.n ?? 0;
}
