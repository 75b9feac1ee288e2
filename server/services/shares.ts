import type { ShareView, SharedComparison } from '../../shared/api/shares';
import type { Database } from '../db/client';
import { listBatch } from '../db/queries/projections';
import { findScenario } from '../db/queries/scenarios';
import { deleteShare, insertShare, listShares, sharedBatchIds } from '../db/queries/shares';
import { findMembership } from '../db/queries/workspaces';
import { requireRole } from './access';
import { notFound } from './errors';

async function batchOf(db: Database, workspaceId: string, batchId: string) {
  const rows = await listBatch(db, workspaceId, batchId);
  if (!rows.length) throw notFound('Projection batch');
  return rows;
}

export async function sharesOf(
  db: Database,
  userId: string,
  workspaceId: string,
  batchId: string,
): Promise<ShareView[]> {
  await requireRole(db, userId, workspaceId, 'editor');
  await batchOf(db, workspaceId, batchId);
  return (await listShares(db, workspaceId, batchId)).map((s) => ({
    userId: s.userId,
    name: s.name,
    email: s.email,
    sharedAt: s.createdAt.toISOString(),
  }));
}

/** Editors share a comparison with a member; for a viewer it is then all they see of it. */
export async function share(
  db: Database,
  actorId: string,
  workspaceId: string,
  batchId: string,
  userId: string,
) {
  await requireRole(db, actorId, workspaceId, 'editor');
  await batchOf(db, workspaceId, batchId);
  if (!(await findMembership(db, workspaceId, userId))) throw notFound('Member');
  await insertShare(db, { workspaceId, batchId, userId, sharedBy: actorId, createdAt: new Date() });
  return sharesOf(db, actorId, workspaceId, batchId);
}

export async function unshare(
  db: Database,
  actorId: string,
  workspaceId: string,
  batchId: string,
  userId: string,
) {
  await requireRole(db, actorId, workspaceId, 'editor');
  await deleteShare(db, workspaceId, batchId, userId);
}

export async function sharedWithMe(
  db: Database,
  userId: string,
  workspaceId: string,
): Promise<SharedComparison[]> {
  await requireRole(db, userId, workspaceId, 'viewer');
  const out: SharedComparison[] = [];
  for (const batchId of await sharedBatchIds(db, workspaceId, userId)) {
    const rows = await listBatch(db, workspaceId, batchId);
    if (!rows.length) continue;
    const scenario = rows[0].scenarioId ? await findScenario(db, workspaceId, rows[0].scenarioId) : undefined;
    out.push({
      batchId,
      scenarioId: rows[0].scenarioId,
      title: scenario?.name ?? rows[0].label,
      strategies: rows.filter((r) => r.role === 'strategy').map((r) => r.label),
      sharedAt: rows[0].queuedAt.toISOString(),
    });
  }
  return out;
}
