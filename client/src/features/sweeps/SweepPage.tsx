import { Link, useParams } from 'react-router-dom';
import { outcomeLabel } from '../../../../shared/sweeps/outcomes';
import { Button, buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useUnits } from '../../shared/lib/units';
import { AnalysisSection } from './AnalysisSection';
import { downloadUrl, isActive, useControlSweep, useSweep } from './api';
import { Cautions } from './Cautions';
import { designSummary, duration, formatValue, grouped, statusNames } from './display';
import { PointsTable } from './PointsTable';
import { ProgressBar } from './ProgressBar';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** /w/:workspaceId/sweeps/:sweepId — progress and control, then points, charts and downloads. */
export function SweepPage() {
  const { sweepId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const { system } = useUnits();
  const query = useSweep(workspace.id, sweepId);
  const control = useControlSweep(workspace.id, sweepId);

  if (query.isPending) return <LoadingNotice>Loading the sweep…</LoadingNotice>;
  if (query.isError) {
    if (query.error instanceof ApiRequestError && query.error.status === 404)
      return <NotFoundNotice what="sweep" />;
    return (
      <ErrorNotice
        title="The sweep could not be loaded"
        error={query.error}
        onRetry={() => void query.refetch()}
      />
    );
  }
  const sweep = query.data;
  const editor = workspace.role !== 'viewer';
  const finished = sweep.status === 'done' || sweep.status === 'failed' || sweep.status === 'cancelled';

  return (
    <div className="flex flex-col gap-8">
      <title>{`${sweep.name} · Sweep · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="text-sm print:hidden">
        <Link to=".." relative="path" className={linkClass}>
          ← All sweeps
        </Link>
      </nav>
      <PageTitle
        eyebrow="Sweep"
        title={sweep.name}
        lead={
          <>
            {sweep.strategyName} · {designSummary(sweep.design)} · {sweep.replicatesPerPoint} replicates per
            point over {sweep.horizonYears} years · seed {sweep.seed}
          </>
        }
      />
      {sweep.hasChemicalStep ? <Cautions /> : null}

      <Panel className="flex flex-col gap-4">
        <div className="flex flex-wrap items-baseline justify-between gap-3">
          <h2 className="text-xl font-semibold">Progress</h2>
          <p className="font-semibold tracking-wide text-loam-700 uppercase" aria-live="polite">
            {statusNames[sweep.status]}
          </p>
        </div>
        <ProgressBar sweep={sweep} label="Points done" />
        <p className="text-sm text-loam-700">
          {sweep.status === 'running' && sweep.pointsPerSecond !== null ? (
            <>
              {sweep.pointsPerSecond.toFixed(sweep.pointsPerSecond < 10 ? 2 : 0)} points per second over the
              last minute
              {sweep.secondsLeft !== null ? `; about ${duration(sweep.secondsLeft)} left` : ''}.
            </>
          ) : sweep.status === 'queued' ? (
            'Waiting for a worker to take the first chunk of points.'
          ) : sweep.status === 'paused' ? (
            'Paused: no new chunk is started until it is resumed. The points done so far stay.'
          ) : sweep.status === 'running' ? (
            'Working on the first chunks…'
          ) : sweep.finishedAt ? (
            `Finished ${new Date(sweep.finishedAt).toLocaleString('en-US')}.`
          ) : null}
        </p>
        {sweep.error ? (
          <p role="alert" className="text-sm font-medium text-danger-700">
            {sweep.error}
          </p>
        ) : null}
        {editor && !finished ? (
          <div className="flex flex-wrap gap-3">
            {sweep.status === 'paused' ? (
              <Button
                variant="secondary"
                pending={control.isPending && control.variables === 'resume'}
                onClick={() => control.mutate('resume')}
              >
                Resume
              </Button>
            ) : (
              <Button
                variant="secondary"
                pending={control.isPending && control.variables === 'pause'}
                onClick={() => control.mutate('pause')}
              >
                Pause
              </Button>
            )}
            <Button
              variant="danger"
              pending={control.isPending && control.variables === 'cancel'}
              onClick={() => control.mutate('cancel')}
            >
              Cancel sweep
            </Button>
          </div>
        ) : null}
        <FormAlert error={control.error} />
        <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-2">
          {sweep.parameters.map((p) => (
            <div key={p.path}>
              <dt className="font-medium text-humus-900">{p.label}</dt>
              <dd className="text-loam-700">
                {formatValue(p.min, p.unit, system)} to {formatValue(p.max, p.unit, system)}
              </dd>
            </div>
          ))}
          <div>
            <dt className="font-medium text-humus-900">Outcomes</dt>
            <dd className="text-loam-700">
              {sweep.outcomes.map((k) => outcomeLabel(k, sweep.outcomeYear)).join('; ')}
            </dd>
          </div>
          <div>
            <dt className="font-medium text-humus-900">Size</dt>
            <dd className="text-loam-700">{grouped(sweep.replicateYears)} replicate-years</dd>
          </div>
        </dl>
      </Panel>

      {sweep.pointsDone > 0 ? (
        <>
          <div className="flex flex-wrap items-center gap-3 print:hidden">
            <a
              href={downloadUrl(workspace.id, sweep.id, 'csv')}
              download
              className={buttonClasses('secondary', 'sm')}
            >
              Download CSV
            </a>
            <a
              href={downloadUrl(workspace.id, sweep.id, 'json')}
              download
              className={buttonClasses('secondary', 'sm')}
            >
              Download JSON
            </a>
            {isActive(sweep) ? (
              <span className="text-sm text-loam-700">The files hold the points finished so far.</span>
            ) : null}
          </div>
          <AnalysisSection sweep={sweep} workspaceId={workspace.id} />
          <PointsTable sweep={sweep} workspaceId={workspace.id} />
        </>
      ) : null}
    </div>
  );
}
