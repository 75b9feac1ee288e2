import type { Database } from '../db/client';
import { sharedBatchIds, sharedReferences } from '../db/queries/shares';
import { findScenario } from '../db/queries/scenarios';

/**
 * What a member may see. Editors and owners see the whole workspace; a viewer sees only
 * the comparisons shared with them and what those comparisons are made of — so draft
 * strategies and unshared runs stay out of a grower's view.
 */
export type Visibility =
  | { all: true }
  | {
      all: false;
      batchIds: Set<string>;
      scenarioIds: Set<string>;
      strategyIds: Set<string>;
      fieldIds: Set<string>;
      profileIds: Set<string>;
    };

export async function visibilityFor(
  db: Database,
  workspaceId: string,
  userId: string,
  role: string,
): Promise<Visibility> {
  if (role !== 'viewer') return { all: true };
  const batchIds = await sharedBatchIds(db, workspaceId, userId);
  const { scenarioIds, strategyIds } = await sharedReferences(db, workspaceId, batchIds);
  const fieldIds = new Set<string>();
  const profileIds = new Set<string>();
  for (const id of scenarioIds) {
    const sc = await findScenario(db, workspaceId, id);
    if (sc) {
      fieldIds.add(sc.fieldId);
      profileIds.add(sc.profileId);
    }
  }
  return { all: false, batchIds: new Set(batchIds), scenarioIds, strategyIds, fieldIds, profileIds };
}

type Kind = 'batchIds' | 'scenarioIds' | 'strategyIds' | 'fieldIds' | 'profileIds';

export const canSee = (v: Visibility, kind: Kind, id: string | null | undefined) =>
  v.all || (!!id && v[kind].has(id));
