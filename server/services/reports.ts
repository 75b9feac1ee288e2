import type { ProjectionSummary } from '../../models/projection/summarise';
import type { Scenario } from '../../models/scenario/types';
import type { Database } from '../db/client';
import { findField } from '../db/queries/fields';
import { findProfile } from '../db/queries/profiles';
import { findScenario } from '../db/queries/scenarios';
import type { ProjectionOutcome } from '../projections/outcome';
import { growerReport } from '../reports/grower-report';
import type { ReportUnits } from '../reports/units';
import { invalid } from './errors';
import { getBatch } from './projections';
import { requireRole } from './access';

/** The grower report of a finished comparison; anyone who may read the batch may print it. */
export async function batchReport(
  db: Database,
  userId: string,
  workspaceId: string,
  batchId: string,
  units: ReportUnits,
) {
  const membership = await requireRole(db, userId, workspaceId, 'viewer');
  const views = await getBatch(db, userId, workspaceId, batchId);
  if (views.some((v) => v.status !== 'done')) {
    throw invalid(
      'The report needs every projection of this comparison finished; wait for them or run it again',
    );
  }
  const scenario = views[0].scenarioId ? await findScenario(db, workspaceId, views[0].scenarioId) : undefined;
  const field = scenario ? await findField(db, workspaceId, scenario.fieldId) : undefined;
  const profile = scenario ? await findProfile(db, workspaceId, scenario.profileId) : undefined;
  return growerReport({
    workspaceName: membership.name,
    scenarioName: scenario?.name ?? views[0].label,
    crop: field?.crop ?? null,
    profileSources: profile?.sources ?? {},
    runs: views.map((v) => ({
      id: v.id,
      label: v.label,
      role: v.role,
      seed: v.seed,
      snapshot: v.snapshot as Scenario,
      summary: (v.result as ProjectionOutcome).summary as ProjectionSummary,
    })),
    units,
    generatedAt: new Date(),
  });
}
