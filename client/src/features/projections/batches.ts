import type { ProjectionListItem } from '../../../../shared/api/projections';
import { isActive } from './api';

export type BatchSummary = {
  batchId: string;
  scenarioId: string | null;
  seed: number;
  queuedAt: string;
  projections: ProjectionListItem[];
  /** queued/running while any projection is; otherwise done when all are; else the first problem. */
  status: ProjectionListItem['status'];
  strategies: number;
  hasLetItSeed: boolean;
};

/** The newest projections grouped into their launches, newest launch first. */
export function groupBatches(items: readonly ProjectionListItem[]): BatchSummary[] {
  const byBatch = new Map<string, ProjectionListItem[]>();
  for (const item of items) byBatch.set(item.batchId, [...(byBatch.get(item.batchId) ?? []), item]);
  return [...byBatch.entries()]
    .map(([batchId, projections]) => {
      const status: ProjectionListItem['status'] = projections.some(isActive)
        ? projections.some((p) => p.status === 'running')
          ? 'running'
          : 'queued'
        : projections.every((p) => p.status === 'done')
          ? 'done'
          : projections.some((p) => p.status === 'failed')
            ? 'failed'
            : 'cancelled';
      return {
        batchId,
        scenarioId: projections[0].scenarioId,
        seed: projections[0].seed,
        queuedAt: projections.reduce((a, p) => (p.queuedAt < a ? p.queuedAt : a), projections[0].queuedAt),
        projections,
        status,
        strategies: projections.filter((p) => p.role === 'strategy').length,
        hasLetItSeed: projections.some((p) => p.role === 'let-it-seed'),
      };
    })
    .sort((a, b) => (a.queuedAt < b.queuedAt ? 1 : -1));
}
