import type { ProjectionListItem, ProjectionView } from '../../../../shared/api/projections';
import type { MatrixAnalysis } from '../../../../models/matrix/analysis';
import type { ProjectionSummary } from '../../../../models/projection/summarise';
import type { SeriesName } from '../../../../models/projection/trajectories';
import type { Scenario } from '../../../../models/scenario/types';

/*
 * What a finished projection's `result` holds (the server stores the engine's summary,
 * the mean-field trajectory and the matrix view). JSON has no Infinity, so a damping
 * ratio without a second eigenvalue arrives as null.
 */
export type MatrixView =
  | ({ ok: true; stages: string[] } & Omit<MatrixAnalysis, 'dampingRatio'> & { dampingRatio: number | null })
  | { ok: false; reason: string };

export type ProjectionResult = {
  summary: ProjectionSummary;
  meanField: Record<SeriesName, number[]>;
  matrix: MatrixView;
};

export type FinishedProjection = ProjectionView & { result: ProjectionResult; snapshot: Scenario };

export function isFinished(view: ProjectionView): view is FinishedProjection {
  return view.status === 'done' && view.result !== null;
}

export const snapshotOf = (view: ProjectionView): Scenario => view.snapshot as Scenario;

export const statusNames: Record<ProjectionListItem['status'], string> = {
  queued: 'Waiting in the queue',
  running: 'Running',
  done: 'Finished',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

/** The order projections are shown in: the strategies as the batch lists them, then No control, then let-it-seed. */
const roleOrder: Record<ProjectionListItem['role'], number> = { strategy: 0, baseline: 1, 'let-it-seed': 2 };

export function inDisplayOrder<T extends Pick<ProjectionListItem, 'role'>>(items: readonly T[]): T[] {
  return items
    .map((item, i) => ({ item, i }))
    .sort((a, b) => roleOrder[a.item.role] - roleOrder[b.item.role] || a.i - b.i)
    .map(({ item }) => item);
}
