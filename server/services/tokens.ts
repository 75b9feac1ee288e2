import { createHash, randomBytes, randomUUID } from 'node:crypto';
import type { CreateTokenBody, CreatedToken, TokenView } from '../../shared/api/tokens';
import type { Database } from '../db/client';
import {
  deleteToken,
  findTokenByHash,
  insertToken,
  listTokens,
  touchToken,
  type TokenRow,
} from '../db/queries/tokens';
import { findUserById } from '../db/queries/users';
import { findMembership } from '../db/queries/workspaces';
import { rank } from './access';
import { forbidden, notFound, unauthenticated } from './errors';

const PREFIX = 'swk_';
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

const toView = (t: TokenRow, workspaceName: string): TokenView => ({
  id: t.id,
  name: t.name,
  workspaceId: t.workspaceId,
  workspaceName,
  role: t.role,
  prefix: t.prefix,
  createdAt: t.createdAt.toISOString(),
  lastUsedAt: t.lastUsedAt ? t.lastUsedAt.toISOString() : null,
});

export async function tokensOf(db: Database, userId: string) {
  return (await listTokens(db, userId)).map((r) => toView(r.token, r.workspaceName));
}

/** A token's role can be no higher than the user's own role in that workspace. */
export async function createToken(
  db: Database,
  userId: string,
  body: CreateTokenBody,
): Promise<CreatedToken> {
  const membership = await findMembership(db, body.workspaceId, userId);
  if (!membership) throw notFound('Workspace');
  if (rank[body.role] > rank[membership.role]) {
    throw forbidden(`A token cannot have more than your own role here (${membership.role})`);
  }
  const token = PREFIX + randomBytes(32).toString('base64url');
  const row = {
    id: randomUUID(),
    userId,
    workspaceId: body.workspaceId,
    name: body.name,
    role: body.role,
    tokenHash: hashToken(token),
    prefix: token.slice(0, 12),
    createdAt: new Date(),
    lastUsedAt: null,
  };
  await insertToken(db, row);
  return { ...toView(row, membership.name), token };
}

export async function revokeToken(db: Database, userId: string, tokenId: string) {
  if (!(await deleteToken(db, userId, tokenId))) throw notFound('API token');
}

/** The user and scope behind a bearer token, or 401. A token outlives no role change: it is capped at request time too. */
export async function authenticateToken(db: Database, token: string) {
  if (!token.startsWith(PREFIX)) throw unauthenticated('That API token is not valid');
  const row = await findTokenByHash(db, hashToken(token));
  const user = row && (await findUserById(db, row.userId));
  if (!row || !user) throw unauthenticated('That API token is not valid or was revoked');
  await touchToken(db, row.id, new Date());
  return { user, scope: { workspaceId: row.workspaceId, role: row.role } };
}
