import { Link } from 'react-router-dom';
import { buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useSweeps } from './api';
import { designSummary, statusNames } from './display';
import { ProgressBar } from './ProgressBar';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** /w/:workspaceId/sweeps — every sweep of the workspace with where it stands. */
export function SweepsPage() {
  const workspace = useCurrentWorkspace();
  const query = useSweeps(workspace.id);
  const editor = workspace.role !== 'viewer';

  return (
    <div className="flex flex-col gap-8">
      <title>{`Sweeps · ${workspace.name} · Seedwake`}</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow="Sensitivity"
          title="Sweeps"
          lead="Vary uncertain parameters of a strategy over their ranges and see which one drives the outcome."
        />
        {editor ? (
          <Link to="new" className={buttonClasses()}>
            New sweep
          </Link>
        ) : null}
      </div>
      {query.isPending ? (
        <LoadingNotice>Loading the sweeps…</LoadingNotice>
      ) : query.isError ? (
        <ErrorNotice
          title="The sweeps could not be loaded"
          error={query.error}
          onRetry={() => void query.refetch()}
        />
      ) : query.data.length === 0 ? (
        <Panel>
          <p className="text-loam-700">
            No sweeps yet.{' '}
            {editor
              ? 'Start one from a scenario: pick the parameters you are unsure of, and Seedwake runs the projections in the background.'
              : 'When an editor runs a sweep, it appears here.'}
          </p>
        </Panel>
      ) : (
        <ul className="flex list-none flex-col gap-4">
          {query.data.map((sweep) => (
            <li key={sweep.id}>
              <Panel className="flex flex-col gap-3">
                <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
                  <h2 className="text-xl font-semibold">
                    <Link to={sweep.id} className={linkClass}>
                      {sweep.name}
                    </Link>
                  </h2>
                  <span className="text-sm font-semibold tracking-wide text-loam-700 uppercase">
                    {statusNames[sweep.status]}
                  </span>
                </div>
                <p className="text-sm text-loam-700">
                  {sweep.strategyName} · {designSummary(sweep.design)} · {sweep.parameters.length} parameter
                  {sweep.parameters.length === 1 ? '' : 's'} · {sweep.replicatesPerPoint} replicates per point
                  · seed {sweep.seed}
                </p>
                <ProgressBar sweep={sweep} label={`Progress of ${sweep.name}`} compact />
              </Panel>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
