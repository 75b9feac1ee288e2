import type { Role } from '../../shared/api/auth';
import type { Database } from '../db/client';
import { findMembership } from '../db/queries/workspaces';
import { forbidden, notFound } from './errors';
import { currentTokenScope } from './request-scope';

export const rank: Record<Role, number> = { viewer: 0, editor: 1, owner: 2 };

/**
 * The one authorisation rule: a non-member gets 404 (a workspace's existence is not
 * revealed); a member below the needed role gets 403.
 */
export async function requireRole(db: Database, userId: string, workspaceId: string, needed: Role) {
  const scope = currentTokenScope();
  // A token reaches only its own workspace; elsewhere it sees what a non-member sees.
  if (scope && scope.workspaceId !== workspaceId) throw notFound('Workspace');
  const membership = await findMembership(db, workspaceId, userId);
  if (!membership) throw notFound('Workspace');
  if (scope && rank[scope.role] < rank[needed]) {
    throw forbidden(`This API token has the ${scope.role} role; the request needs ${needed}`);
  }
  if (rank[membership.role] < rank[needed]) {
    throw forbidden(
      `This needs the ${needed} role; you are ${membership.role === 'editor' ? 'an' : 'a'} ${membership.role} here`,
    );
  }
  return membership;
}
