import { and, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { scenarios } from '../db/schema-domain';

/** Whether any scenario of the workspace uses the profile, field or strategy. */
export async function isReferenced(
  db: Database,
  workspaceId: string,
  ref: { profileId?: string; fieldId?: string; strategyId?: string },
) {
  const rows = await db
    .select({
      profileId: scenarios.profileId,
      fieldId: scenarios.fieldId,
      strategyIds: scenarios.strategyIds,
    })
    .from(scenarios)
    .where(and(eq(scenarios.workspaceId, workspaceId)));
  return rows.some(
    (r) =>
      r.profileId === ref.profileId ||
      r.fieldId === ref.fieldId ||
      (ref.strategyId !== undefined && r.strategyIds.includes(ref.strategyId)),
  );
}
