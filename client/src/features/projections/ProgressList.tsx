import { useId } from 'react';
import { Link } from 'react-router-dom';
import type { ProjectionListItem } from '../../../../shared/api/projections';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { isActive, useCancelProjection } from './api';
import { statusNames } from './result';

const grouped = new Intl.NumberFormat('en-US');

/** Every replicate is done but the run is not: the quantiles, economics and matrix view are being worked out. */
const summarising = (p: ProjectionListItem) => p.status === 'running' && p.replicatesDone >= p.replicates;

/**
 * Where each projection of a launch stands: a progress bar of replicates done, and a
 * Cancel button for editors while it is queued or running. The numbers come from the
 * server, so a reload shows the same state.
 */
export function ProgressList({
  items,
  title = 'Progress',
}: {
  items: readonly ProjectionListItem[];
  title?: string;
}) {
  const workspace = useCurrentWorkspace();
  const canEdit = workspace.role !== 'viewer';
  const cancel = useCancelProjection(workspace.id);
  const titleId = useId();
  return (
    <section
      aria-labelledby={titleId}
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <h2 id={titleId} className="text-xl font-semibold">
        {title}
      </h2>
      <ul className="flex flex-col gap-4">
        {items.map((p) => {
          const share = p.replicates > 0 ? p.replicatesDone / p.replicates : 0;
          const labelId = `progress-${p.id}`;
          return (
            <li
              key={p.id}
              className="grid gap-x-4 gap-y-1.5 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-center"
            >
              <div className="flex min-w-0 flex-col gap-1.5">
                <div className="flex flex-wrap items-baseline justify-between gap-x-3">
                  <span id={labelId} className="font-medium text-humus-900">
                    {p.status === 'done' ? (
                      <Link
                        to={`/w/${workspace.id}/projections/${p.id}`}
                        className="text-russet-700 underline underline-offset-4 hover:text-russet-800"
                      >
                        {p.label}
                      </Link>
                    ) : (
                      p.label
                    )}
                  </span>
                  <span className="text-sm text-loam-700">
                    {summarising(p) ? 'Summarising' : statusNames[p.status]} ·{' '}
                    {grouped.format(p.replicatesDone)} of {grouped.format(p.replicates)} replicates
                  </span>
                </div>
                <div
                  role="progressbar"
                  aria-labelledby={labelId}
                  aria-valuemin={0}
                  aria-valuemax={p.replicates}
                  aria-valuenow={p.replicatesDone}
                  aria-valuetext={`${summarising(p) ? 'Summarising' : statusNames[p.status]}: ${p.replicatesDone} of ${p.replicates} replicates`}
                  className="h-3 overflow-hidden rounded-full bg-silt-200"
                >
                  <div
                    className={`h-full rounded-full transition-[width] duration-500 ${
                      p.status === 'failed' || p.status === 'cancelled'
                        ? 'bg-loam-400'
                        : p.status === 'done'
                          ? 'bg-humus-800'
                          : 'bg-russet-600'
                    }`}
                    style={{ width: `${Math.round(share * 1000) / 10}%` }}
                  />
                </div>
                {p.error ? <p className="text-sm text-danger-700">{p.error}</p> : null}
              </div>
              {canEdit && isActive(p) ? (
                <Button
                  variant="secondary"
                  size="sm"
                  pending={cancel.isPending && cancel.variables === p.id}
                  pendingLabel="Cancelling…"
                  onClick={() => cancel.mutate(p.id)}
                  aria-label={`Cancel ${p.label}`}
                >
                  Cancel
                </Button>
              ) : null}
            </li>
          );
        })}
      </ul>
      <FormAlert error={cancel.error} />
    </section>
  );
}
